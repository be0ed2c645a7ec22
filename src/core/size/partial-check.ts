import type { RulesData } from '../data/rules-data.ts';
import { recordingData, recordingSpec } from '../decisive/recording-proxy.ts';
import type { Finding } from '../findings/finding.ts';
import type { ModelInputs } from '../pipeline/define-model.ts';
import type { Rule } from '../pipeline/define-rule.ts';
import { ModelGraph } from '../pipeline/model-graph.ts';
import type { ModelId } from '../pipeline/model-values.ts';
import { MODELS } from '../pipeline/models.ts';
import { ReadTracer, type InputKey } from '../pipeline/read-tracer.ts';
import { runRules } from '../pipeline/run-rules.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { changedInputs } from './changed-inputs.ts';
import { trialWeight } from '../pipeline/trial-weight.ts';

// The whole check of a changed build at the cost of what the change reaches:
// one traced run of every rule and output records who read what; a trial
// then recomputes only the models a changed input reaches (the rest are
// reused) and re-runs only the rules that read a changed input, taking the
// other rules' findings from the build as checked.

/** What a trial gives: every finding, with the build's mass and the stock plan's cost and unserved parts. */
export interface TrialResult {
  findings: Finding[];
  mass_kg: number;
  /** The stock plan's cost; null where a group is unpriced or nothing is cut from listed stock. */
  cost: number | null;
  /** Parts no listed stock serves. */
  unserved: string[];
}

export interface PartialCheckArgs {
  spec: CheckedSpecification;
  data: RulesData;
  rules: readonly Rule[];
  inputs: Omit<ModelInputs, 'spec' | 'data'>;
}


export class PartialCheck {
  readonly base: TrialResult;
  /** Trials run and their weighted work, so a search can keep to a budget and a reader can judge it. */
  trials = 0;
  work = 0;
  readonly #args: PartialCheckArgs;
  readonly #tracer = new ReadTracer();
  readonly #computed: ReadonlyMap<ModelId, unknown>;
  readonly #readsOf: Map<string, Set<InputKey>>;
  readonly #baseByRule: Map<string, Finding[]>;
  readonly #staleOf = new Map<string, Set<string>>();

  constructor(args: PartialCheckArgs) {
    this.#args = args;
    const traced = { spec: recordingSpec(args.spec, this.#tracer), data: recordingData(args.data, this.#tracer) };
    const graph = new ModelGraph(MODELS, { ...args.inputs, ...traced }, { tracer: this.#tracer });
    const findings = runRules(args.rules, traced.spec, traced.data, graph, this.#tracer);
    this.base = { findings, ...outputsOf(graph) };
    this.#computed = graph.values();
    this.#readsOf = new Map(args.rules.map((r) => [r.id, this.#tracer.closure(`rule:${r.id}`).inputs]));
    this.#baseByRule = byRule(findings);
  }

  /** The specification inputs a rule read, directly or through its models. */
  readsOf(ruleId: string): ReadonlySet<InputKey> {
    return this.#readsOf.get(ruleId) ?? new Set();
  }

  /** The check of `spec` (the build as checked with some inputs changed): every rule's findings, re-run where they read a changed input. */
  run(spec: CheckedSpecification): TrialResult {
    const { graph, keys } = this.#graphFor(spec);
    const reads = (r: Rule) => [...keys].some((k) => this.#readsOf.get(r.id)?.has(k));
    const fresh = byRule(runRules(this.#args.rules.filter(reads), spec, this.#args.data, graph));
    const findings = this.#args.rules.flatMap((r) => (reads(r) ? (fresh.get(r.id) ?? []) : (this.#baseByRule.get(r.id) ?? [])));
    return { findings, ...outputsOf(graph) };
  }

  /** Only the named rules' findings for `spec`: a quick test of one rule, computing only the models it needs. */
  runOnly(spec: CheckedSpecification, ruleIds: ReadonlySet<string>): Finding[] {
    const { graph } = this.#graphFor(spec);
    return runRules(this.#args.rules.filter((r) => ruleIds.has(r.id)), spec, this.#args.data, graph);
  }

  #graphFor(spec: CheckedSpecification): { graph: ModelGraph; keys: Set<InputKey> } {
    const keys = changedInputs(this.#args.spec, spec);
    const id = [...keys].sort().join('|');
    if (!this.#staleOf.has(id)) this.#staleOf.set(id, this.#tracer.staleModels(keys));
    const stale = this.#staleOf.get(id)!;
    this.trials++;
    this.work += trialWeight(stale);
    const seed = new Map([...this.#computed].filter(([m]) => !stale.has(m)));
    // A trial's ride is judged, never drawn: its cases keep no time series.
    return { graph: new ModelGraph(MODELS, { ...this.#args.inputs, spec, data: this.#args.data, rideSeries: false }, { seed }), keys };
  }
}

function byRule(findings: readonly Finding[]): Map<string, Finding[]> {
  const out = new Map<string, Finding[]>();
  for (const f of findings) out.set(f.rule, [...(out.get(f.rule) ?? []), f]);
  return out;
}

function outputsOf(graph: ModelGraph): Omit<TrialResult, 'findings'> {
  const plan = graph.get('cutting').stock_plan;
  return { mass_kg: graph.get('mass').total.mass_kg, cost: plan.cost, unserved: plan.unserved.map((u) => u.part) };
}

