import type { RulesData } from '../data/rules-data.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { LpSolver } from '../stock/cutting-types.ts';
import type { ModelId, ModelValues } from './model-values.ts';

/** What every model may read besides other models: the checked spec, the data and the run's options. */
export interface ModelInputs {
  spec: CheckedSpecification;
  data: RulesData;
  /** The LP solver for the stock plan, loaded at the edge; without it the plan is first-fit decreasing. */
  lp?: LpSolver;
  /** False for a statics-only run: the ride model is not started and the bump factors are the data's bound. */
  ride: boolean;
  /** False where no output will draw the ride's time series (a decisive trial): the ride cases keep none. */
  rideSeries?: boolean;
  /**
   * The values of the check this run varies (a decisive-input trial's base check), for a model whose iterative
   * solve may start from its own earlier answer: only where that answer is of the same net, and only as a start.
   */
  startFrom?: ReadonlyMap<ModelId, unknown>;
}

/** The models a function names, with the specification and the data: what an output reads. */
export type ModelView<N extends ModelId> = { readonly [K in N]: ModelValues[K] } & Pick<ModelInputs, 'spec' | 'data'>;

/** The models with the specification and the data beside them, each model still computed on first read. */
export function withInputs<N extends ModelId>(models: { readonly [K in N]: ModelValues[K] }, inputs: ModelInputs): ModelView<N> {
  return new Proxy(models as ModelView<N>, {
    get: (target, key) => (key === 'spec' ? inputs.spec : key === 'data' ? inputs.data : Reflect.get(target, key)),
  });
}

/** A parameter a model reads, as `group.name` of rules/parameters. */
export type ParamKey = `${string}.${string}`;

export interface ModelDef<K extends ModelId = ModelId, N extends ModelId = ModelId> {
  id: K;
  /** The models it reads; the graph computes these first, and only these are visible to it. */
  needs: readonly N[];
  /** The parameters it reads from rules/parameters, checked when the data is loaded. */
  params: readonly ParamKey[];
  compute(models: { readonly [P in N]: ModelValues[P] }, inputs: ModelInputs): ModelValues[K];
}

/** A model: metadata plus one function, typed by what it gives and what it needs. */
export function defineModel<K extends ModelId, N extends ModelId = never>(def: ModelDef<K, N>): ModelDef<K, N> {
  return def;
}
