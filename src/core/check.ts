import pkg from '../../package.json' with { type: 'json' };
import { CAUTIONS } from './cautions.ts';
import { choicesOf } from './data/choices.ts';
import type { RulesData } from './data/rules-data.ts';
import { Analysis } from './engine/analysis.ts';
import { RULES } from './engine/registry.ts';
import type { Rule } from './engine/rule.ts';
import { runRules } from './engine/run-rules.ts';
import { figures } from './figures.ts';
import { buildScene } from './result/scene-of.ts';
import { reportPlots } from './plots/report-plots.ts';
import { collectLoads } from './loads/collect-loads.ts';
import { severityRank, worstSeverity } from './findings/finding.ts';
import type { CheckResult } from './result/check-result.ts';
import type { SpecEntry } from './spec/spec-entry.ts';
import type { CheckedSpecification } from './spec/spec.types.ts';
import type { LpSolver } from './stock/cutting-types.ts';
import { usedSources } from './sources.ts';
import { rideSummary } from './result/ride-summary.ts';
import { floorDampingOf } from './ride/ride-build.ts';
import { rideInput } from './engine/analysis.ts';

/**
 * The whole check of a prepared specification: pure, no I/O. The LP solver is
 * loaded at the edge and handed in; without it the stock plan is first-fit
 * decreasing.
 */
export function checkSpecification(spec: CheckedSpecification, entries: SpecEntry[], data: RulesData, rules: readonly Rule[] = RULES, lp?: LpSolver): CheckResult {
  const analysis = new Analysis(spec, data, lp);
  const findings = runRules(rules, spec, data, analysis);
  // Worst first, keeping rule order within a severity.
  const ordered = findings.map((f, i) => ({ f, i })).sort((a, b) => severityRank(b.f.severity) - severityRank(a.f.severity) || a.i - b.i).map((x) => x.f);
  return {
    tool: { name: pkg.name, version: pkg.version },
    spec_name: spec.name,
    verdict: worstSeverity(findings.map((f) => f.severity)),
    figures: figures(analysis),
    findings: ordered,
    mass: { parts: analysis.mass.parts, rolling_mass_kg: analysis.mass.rolling.mass_kg, yoke_mass_kg: analysis.mass.yoke.mass_kg, total_mass_kg: analysis.mass.total.mass_kg },
    balance: { cases: analysis.loadCases },
    loads: collectLoads(analysis),
    cutting: analysis.cutting,
    scene: buildScene(analysis),
    plots: reportPlots(analysis),
    ...(spec.crew.length > 0 ? { ride: rideSummary(analysis.ride, analysis.floorDampingNeeded.ratio, floorDampingOf(rideInput(analysis)), analysis.floorDampingNeeded.working) } : {}),
    spec_as_checked: entries,
    choices: choicesOf(data),
    sources: usedSources(spec, data, findings),
    cautions: [...CAUTIONS],
  };
}
