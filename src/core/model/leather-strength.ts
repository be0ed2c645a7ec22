import { param } from '../data/param.ts';
import type { RulesData } from '../data/rules-data.ts';
import type { Combination, WorkingStep } from '../findings/finding.ts';
import { num, step } from '../findings/working.ts';

// One strength chain for leather and rawhide (design basis, section 1):
//   f_d = f_k x eta_joint x k_wet / gamma_M
// f_k the material's tensile strength as held (rules/materials/leathers.yaml),
// eta_joint the strength kept where the end is laced (1 for a strand that
// only wraps round), k_wet the wet strength factor where the strap works wet
// (else 1), gamma_M by the combination. The dynamic factor belongs to the
// action and is never folded in here.

export const LEATHER_PARAMS = ['leather-strength.joint_efficiency', 'leather-strength.gamma_M', 'leather-strength.gamma_M_accidental'] as const;

export interface LeatherStrength {
  value: number;
  steps: WorkingStep[];
  sources: string[];
}

export function leatherDesignStrength(data: RulesData, material: string, o: { joint: boolean; wet: boolean; combination: Combination }): LeatherStrength {
  const l = data.leathers[material];
  const ft = l.tensile_strength_MPa;
  const eta = o.joint ? param(data, 'leather-strength', 'joint_efficiency') : null;
  const wet = o.wet ? l.wet_strength_factor : null;
  const gamma = param(data, 'leather-strength', o.combination === 'accidental' ? 'gamma_M_accidental' : 'gamma_M');
  const value = (ft.value * (eta?.value ?? 1) * (wet?.value ?? 1)) / gamma.value;
  return {
    value,
    steps: [
      step(`f_d = f_k${eta ? '·η_joint' : ''}${wet ? '·k_wet' : ''}/γ_M (${l.name})`, `${num(ft.value)}${eta ? ` × ${num(eta.value)}` : ''}${wet ? ` × ${num(wet.value)}` : ''} / ${num(gamma.value)}`, value, 'MPa'),
    ],
    sources: [...new Set([...ft.sources, ...(eta?.sources ?? []), ...(wet?.sources ?? []), ...gamma.sources])],
  };
}
