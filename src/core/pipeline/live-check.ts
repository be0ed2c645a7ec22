import type { RulesData } from '../data/rules-data.ts';
import { recordingData, recordingSpec } from '../decisive/recording-proxy.ts';
import type { CheckResult } from '../result/check-result.ts';
import { RULES } from '../rules/index.ts';
import type { SpecEntry } from '../spec/spec-entry.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { changedKeys, keySteps, valueAtKey } from '../sweep/spec-diff.ts';
import { carriesSpec } from './carries-spec.ts';
import { ModelGraph } from './model-graph.ts';
import type { ModelId } from './model-values.ts';
import { MODELS } from './models.ts';
import { ReadTracer } from './read-tracer.ts';
import { checkOnGraph } from './run-check.ts';

// Checks of one build as it is edited, each reusing the models the edit does
// not reach (the workbench checks at every keystroke). Every check records
// what each model read; a model computed afresh records its reads anew, and
// one reused keeps those of the run that computed it, so the record always
// matches the values kept. An edit that only changes values already there
// reuses every model none of whose reads changed; one that adds or removes
// a key or a list entry (whose readers the record may not show) is checked
// afresh. The answer is the same as runCheck's: tests/pipeline compare them.

interface Kept {
  ride: boolean;
  spec: CheckedSpecification;
  values: ReadonlyMap<ModelId, unknown>;
  tracer: ReadTracer;
  carriers: ReadonlySet<ModelId>;
}

const isLeaf = (v: unknown) => v !== undefined && (typeof v !== 'object' || v === null);

export class LiveChecker {
  #kept: Kept | undefined;
  /** Models reused by the last check, for the tests and the bench. */
  reused: ModelId[] = [];

  constructor(private readonly data: RulesData) {}

  check(spec: CheckedSpecification, entries: SpecEntry[], options: { ride: boolean }): CheckResult {
    const seed = this.#seedFor(spec, options.ride);
    const tracer = new ReadTracer();
    for (const id of seed.keys()) tracer.adopt(`model:${id}`, this.#kept!.tracer);
    const traced = { spec: recordingSpec(spec, tracer), data: recordingData(this.data, tracer), tracer };
    const graph = new ModelGraph(MODELS, { spec: traced.spec, data: traced.data, ride: options.ride }, { tracer, seed });
    const result = checkOnGraph(graph, { spec, entries, data: this.data, rules: RULES, decisive: false, traced });
    const values = graph.values();
    // Only values that hold none of the spec's views can be handed to the next check (a reused one was looked at when it was made).
    const carriers = new Set([...values].filter(([id, v]) => !seed.has(id) && carriesSpec(v, new Set())).map(([id]) => id));
    this.#kept = { ride: options.ride, spec: structuredClone(spec), values, tracer, carriers };
    this.reused = [...seed.keys()];
    return result;
  }

  #seedFor(spec: CheckedSpecification, ride: boolean): Map<ModelId, unknown> {
    const kept = this.#kept;
    if (!kept || kept.ride !== ride) return new Map();
    const changed = changedKeys(kept.spec, spec);
    // A key or a list entry added or removed: checked afresh.
    if ([...changed].some((k) => !isLeaf(valueAtKey(kept.spec, keySteps(k))) || !isLeaf(valueAtKey(spec, keySteps(k))))) return new Map();
    const stale = kept.tracer.staleModels(changed);
    return new Map([...kept.values].filter(([id]) => !stale.has(id) && !kept.carriers.has(id)));
  }
}
