import type { RulesData } from '../data/rules-data.ts';
import type { LoadCaseResult } from '../result/check-result.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { loadCases } from '../model/load-cases.ts';
import { massModel, type MassModel } from '../model/mass-model.ts';
import { turnModel, type TurnModel } from '../model/turn.ts';

/** Models computed at most once per check, on first use by any rule. */
export class Analysis {
  #mass?: MassModel;
  #cases?: LoadCaseResult[];
  #turn?: TurnModel;
  constructor(
    readonly spec: CheckedSpecification,
    readonly data: RulesData,
  ) {}
  get mass(): MassModel {
    return (this.#mass ??= massModel(this.spec, this.data));
  }
  get loadCases(): LoadCaseResult[] {
    return (this.#cases ??= loadCases(this.spec, this.data));
  }
  /** The static case with the crew as placed. */
  get staticCase(): LoadCaseResult {
    return this.loadCases.find((c) => c.id === 'static')!;
  }
  /** The design turn at the design speed, crew as placed. */
  get turn(): TurnModel {
    return (this.#turn ??= turnModel(this.spec, this.data, this.mass, this.staticCase.axle_load_N));
  }
}
