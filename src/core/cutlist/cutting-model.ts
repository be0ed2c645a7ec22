import type { RulesData } from '../data/rules-data.ts';
import type { Layout } from '../model/layout.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { LpSolver } from '../stock/cutting-types.ts';
import { cutList } from './cut-list.ts';
import type { CuttingResult } from './cutting-result.ts';
import { groupParts } from './group-parts.ts';
import { leatherList } from './leather-list.ts';
import { stockPlan } from './stock-plan.ts';
import { wheelGeometry } from './wheel-geometry.ts';
import { wheelSettingOut } from './wheel-setting-out.ts';

/** Cut list, leather list, wheel setting-out and stock plan of a checked specification. */
export function cuttingResult(spec: CheckedSpecification, data: RulesData, lay: Layout, lp: LpSolver | undefined): CuttingResult {
  const wheel = wheelGeometry(spec, data, lay);
  const cut_list = cutList(spec, data, lay, wheel);
  const { groups, unserved } = groupParts(cut_list, spec.stock);
  return {
    cut_list,
    leather: leatherList(spec, data, lay, wheel),
    setting_out: wheelSettingOut(wheel),
    stock_plan: stockPlan(groups, unserved, lp),
  };
}
