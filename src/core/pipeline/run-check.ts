import pkg from '../../../package.json' with { type: 'json' };
import { CAUTIONS } from '../cautions.ts';
import { choicesOf } from '../data/choices.ts';
import type { RulesData } from '../data/rules-data.ts';
import { SEVERITY_MEANING, severityRank, verdictOf } from '../findings/severity.ts';
import type { CheckResult } from '../result/check-result.ts';
import { rideSummary } from '../result/ride-summary.ts';
import { floorDampingOf } from '../ride/ride-build.ts';
import { dampingFigure } from '../ride/damping-figure.ts';
import { splitFigures } from '../result/figure.ts';
import { RULES } from '../rules/index.ts';
import { usedSources } from '../sources.ts';
import type { SpecEntry } from '../spec/spec-entry.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { LpSolver } from '../stock/cutting-types.ts';
import type { Rule } from './define-rule.ts';
import { ModelGraph } from './model-graph.ts';
import { MODELS } from './models.ts';
import type { ReadTracer } from './read-tracer.ts';
import { runRules } from './run-rules.ts';
import { decisiveInputs } from '../decisive/decisive-inputs.ts';
import type { DecisiveInput, DecisiveSearch } from '../decisive/decisive-input.ts';

export interface RunOptions {
  /** The rules to run (all by default). */
  rules?: readonly Rule[];
  /** The LP solver for the stock plan, loaded at the edge; without it the plan is first-fit decreasing. */
  lp?: LpSolver;
  /** False for a statics-only run: the ride model is not started. */
  ride?: boolean;
  /** True to find the inputs each decisive finding hangs on and their break-even values (many partial re-runs). */
  decisive?: boolean;
  /** The decisive-input search's work limit (decisive-inputs.ts WORK_LIMIT by default; a batch gives a smaller one). */
  decisiveWorkLimit?: number;
}

/**
 * The whole check of a prepared specification: pure, no I/O. Every command
 * and every front end calls this and hands the result to the renderers.
 * Each model is computed once, when a rule or an output first needs it.
 */
export function runCheck(spec: CheckedSpecification, entries: SpecEntry[], data: RulesData, options: RunOptions = {}): CheckResult {
  return checkWith(checkModels(spec, data, options), spec, entries, data, options);
}

/** The models of a check, each computed when first read (a caller may read some first: the stock plan, to learn whether it needs the LP solver). */
export function checkModels(spec: CheckedSpecification, data: RulesData, options: Pick<RunOptions, 'lp' | 'ride'> = {}): ModelGraph {
  return new ModelGraph(MODELS, { spec, data, lp: options.lp, ride: options.ride ?? true });
}

/** runCheck on models from checkModels with the same specification, data and options. */
export function checkWith(graph: ModelGraph, spec: CheckedSpecification, entries: SpecEntry[], data: RulesData, options: RunOptions = {}): CheckResult {
  return checkOnGraph(graph, { spec, entries, data, rules: options.rules ?? RULES, decisive: options.decisive ?? false, decisiveWorkLimit: options.decisiveWorkLimit });
}

export interface GraphCheck {
  spec: CheckedSpecification;
  entries: SpecEntry[];
  data: RulesData;
  rules: readonly Rule[];
  decisive: boolean;
  decisiveWorkLimit?: number;
  /** The rules read the spec and data through these where a tracer records their reads (the graph's inputs are the same views). */
  traced?: { spec: CheckedSpecification; data: RulesData; tracer: ReadTracer };
}

/** The check on a graph of models made by the caller: seeded with values an earlier check computed, or traced. */
export function checkOnGraph(graph: ModelGraph, c: GraphCheck): CheckResult {
  const { spec, entries, data, rules } = c;
  const inputs = { lp: graph.inputs.lp, ride: graph.inputs.ride };
  const findings = c.traced ? runRules(rules, c.traced.spec, c.traced.data, graph, c.traced.tracer) : runRules(rules, spec, data, graph);
  // Worst first, keeping rule order within a severity.
  const ordered = findings.map((f, i) => ({ f, i })).sort((a, b) => severityRank(b.f.severity) - severityRank(a.f.severity) || a.i - b.i).map((x) => x.f);
  // The floor-damping tuner runs only where a ride rule asked for it (the motion decays too slowly).
  const damping = graph.peek('floorDampingNeeded') ?? null;
  const ride = graph.get('ride');
  const mass = graph.get('mass');
  // A verdict that rests on the data's bounds for the dynamic factors, not on the ride model, is provisional.
  const provisional = [graph.peek('bumpFactors'), graph.peek('stoneFactors')].flatMap((g, i) =>
    g?.provisional ? [`the ${i === 0 ? 'routine rough ground' : 'stone'}'s dynamic factors are the data's bound, not the ride model's: ${g.wheel.source}`] : [],
  );
  return {
    tool: { name: pkg.name, version: pkg.version },
    spec_name: spec.name,
    verdict: verdictOf(findings.map((f) => f.severity)),
    provisional,
    severity_meanings: { ...SEVERITY_MEANING },
    ...splitFigures({ ...graph.get('figures'), floor_damping_ratio_needed: dampingFigure(damping) }),
    findings: ordered,
    ...(c.decisive ? decisiveSection(decisiveInputs({ spec, entries, data, rules, findings: ordered, computed: graph.values(), inputs, workLimit: c.decisiveWorkLimit })) : {}),
    mass: { parts: mass.parts, rolling_mass_kg: mass.rolling.mass_kg, yoke_mass_kg: mass.yoke.mass_kg, total_mass_kg: mass.total.mass_kg },
    balance: { cases: graph.get('loadCases') },
    loads: graph.get('loads'),
    cutting: graph.get('cutting'),
    scene: graph.get('scene'),
    plots: graph.get('plots'),
    ...(ride ? { ride: rideSummary(ride, damping, floorDampingOf(graph.get('rideInput'))) } : {}),
    spec_as_checked: entries,
    choices: choicesOf(data),
    sources: usedSources(spec, data, findings),
    cautions: [...CAUTIONS],
  };
}

function decisiveSection(d: { inputs: DecisiveInput[]; search: DecisiveSearch }): { decisive_inputs: DecisiveInput[]; decisive_search: DecisiveSearch } {
  return { decisive_inputs: d.inputs, decisive_search: d.search };
}
