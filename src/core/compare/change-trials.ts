import type { RulesData } from '../data/rules-data.ts';
import type { Finding } from '../findings/finding.ts';
import { recordingData, recordingSpec } from '../decisive/recording-proxy.ts';
import type { ModelInputs } from '../pipeline/define-model.ts';
import type { Rule } from '../pipeline/define-rule.ts';
import { ModelGraph } from '../pipeline/model-graph.ts';
import type { ModelId } from '../pipeline/model-values.ts';
import { MODELS } from '../pipeline/models.ts';
import { ReadTracer, type InputKey } from '../pipeline/read-tracer.ts';
import { runRules } from '../pipeline/run-rules.ts';
import { splitFigures, type Figure } from '../result/figure.ts';
import { crossChecks } from '../spec/cross-checks.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { findingKey } from './finding-diff.ts';
import { withValue } from './set-value.ts';

/** One value of the specification set to another build's value (null: taken out). */
export interface Change {
  path: string;
  value: unknown;
}

/** What a re-run with some changes gives: the rules' findings by rule and subject, and the figures. */
export interface TrialOutcome {
  findings: Map<string, Finding>;
  figures: Record<string, Figure>;
}

/** Does a traced read (`spec:crew.0.x_mm`, `spec:crew.length`) touch the value at a path? */
function touches(key: InputKey, path: string): boolean {
  if (!key.startsWith('spec:')) return false;
  const k = key.slice('spec:'.length);
  if (k === path || k.startsWith(`${path}.`) || path.startsWith(`${k}.`)) return true;
  // Reading a list's length reads how many items it has: adding or taking one out changes it.
  return k.endsWith('.length') && path.startsWith(k.slice(0, -'length'.length));
}

/**
 * The baseline checked once more with a tracer (the given rules and the
 * figures), so that each change of its specification re-runs only the models
 * the change reaches, and only those rules. This is how the account finds
 * which differences between two builds move a finding: by re-running the
 * baseline with them, not by guessing.
 */
export class BaselineTrials {
  readonly findings: Map<string, Finding>;
  readonly figures: Record<string, Figure>;
  /** Re-runs made so far. */
  reruns = 0;
  readonly #tracer = new ReadTracer();
  readonly #reads = new Map<string, Set<InputKey>>();
  readonly #all = new Set<InputKey>();
  readonly #computed: ReadonlyMap<ModelId, unknown>;

  constructor(
    readonly spec: CheckedSpecification,
    readonly data: RulesData,
    readonly inputs: Omit<ModelInputs, 'spec' | 'data'>,
    readonly rules: readonly Rule[],
  ) {
    const traced = { spec: recordingSpec(spec, this.#tracer), data: recordingData(data, this.#tracer) };
    const graph = new ModelGraph(MODELS, { ...inputs, ...traced }, { tracer: this.#tracer });
    this.findings = new Map(runRules(rules, traced.spec, traced.data, graph, this.#tracer).map((f) => [findingKey(f), f]));
    this.figures = splitFigures(graph.get('figures')).figures;
    this.#computed = graph.values();
    for (const r of rules) this.#reads.set(r.id, this.#tracer.closure(`rule:${r.id}`).inputs);
    for (const k of [...this.#reads.values(), this.#tracer.closure('model:figures').inputs].flatMap((s) => [...s])) this.#all.add(k);
  }

  /** Does the rule read the value at the path (through any model it asks for)? */
  reads(rule: string, path: string): boolean {
    return [...(this.#reads.get(rule) ?? [])].some((k) => touches(k, path));
  }

  /** The baseline re-run with the changes made; null where the specification so changed is refused by its cross-field checks. */
  trial(changes: readonly Change[]): TrialOutcome | null {
    const spec = changes.reduce((s, c) => withValue(s, c.path, c.value), this.spec);
    if (crossChecks(spec, this.data).length > 0) return null;
    this.reruns++;
    const keys = new Set([...this.#all].filter((k) => changes.some((c) => touches(k, c.path))));
    const stale = this.#tracer.staleModels(keys);
    const seed = new Map([...this.#computed].filter(([m]) => !stale.has(m)));
    // A trial's ride is judged, never drawn: its cases keep no time series.
    const graph = new ModelGraph(MODELS, { ...this.inputs, spec, data: this.data, rideSeries: false }, { seed });
    return {
      findings: new Map(runRules(this.rules, spec, this.data, graph).map((f) => [findingKey(f), f])),
      figures: splitFigures(graph.get('figures')).figures,
    };
  }
}
