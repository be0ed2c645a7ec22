import type { RulesData } from '../../src/core/data/rules-data.ts';
import type { CheckedSpecification } from '../../src/core/spec/spec.types.ts';
import type { LpSolver } from '../../src/core/stock/cutting-types.ts';
import type { RideInput } from '../../src/core/ride/ride-build.ts';
import { ModelGraph } from '../../src/core/pipeline/model-graph.ts';
import { MODELS } from '../../src/core/pipeline/models.ts';
import type { BumpFactors, ModelValues } from '../../src/core/pipeline/model-values.ts';

export type { BumpFactors };

/**
 * The models of one check behind named getters, for tests that look at
 * several models of one build. The pipeline, the rules and the outputs read
 * models through the graph instead, each naming what it reads.
 */
export class Analysis {
  readonly graph: ModelGraph;
  constructor(
    readonly spec: CheckedSpecification,
    readonly data: RulesData,
    /** The LP solver for the stock plan, loaded at the edge; without it the plan is first-fit decreasing. */
    readonly lp?: LpSolver,
    options: { ride?: boolean; graph?: ModelGraph } = {},
  ) {
    this.graph = options.graph ?? new ModelGraph(MODELS, { spec, data, lp, ride: options.ride ?? true });
  }
  get mass(): ModelValues['mass'] {
    return this.graph.get('mass');
  }
  get loadCases(): ModelValues['loadCases'] {
    return this.graph.get('loadCases');
  }
  get staticCase(): ModelValues['staticCase'] {
    return this.graph.get('staticCase');
  }
  get turn(): ModelValues['turn'] {
    return this.graph.get('turn');
  }
  get floorStatic(): ModelValues['floorStatic'] {
    return this.graph.get('floorStatic');
  }
  get floorBump(): ModelValues['floorBump'] {
    return this.graph.get('floorBump');
  }
  get floorStone(): ModelValues['floorStone'] {
    return this.graph.get('floorStone');
  }
  get floorDesign(): ModelValues['floorDesign'] {
    return this.graph.get('floorDesign');
  }
  get floorDesignRough(): ModelValues['floorDesignRough'] {
    return this.graph.get('floorDesignRough');
  }
  /** The ride model's three cases; throws where it was not run (check `hasRide` first). */
  get ride(): NonNullable<ModelValues['ride']> {
    const r = this.graph.get('ride');
    if (!r) throw new Error('the ride model was not run (no crew, or a statics-only run)');
    return r;
  }
  get hasRide(): boolean {
    return this.graph.get('ride') !== null;
  }
  get floorDampingNeeded(): NonNullable<ModelValues['floorDampingNeeded']> {
    const d = this.graph.get('floorDampingNeeded');
    if (!d) throw new Error('the floor-damping tuner was not run (no crew, or a statics-only run)');
    return d;
  }
  get bumpFactors(): BumpFactors {
    return this.graph.get('bumpFactors');
  }
  get stoneFactors(): BumpFactors {
    return this.graph.get('stoneFactors');
  }
  get memberCases(): ModelValues['memberCases'] {
    return this.graph.get('memberCases');
  }
  get cutting(): ModelValues['cutting'] {
    return this.graph.get('cutting');
  }
  get lashingDemands(): ModelValues['lashingDemands'] {
    return this.graph.get('lashingDemands');
  }
}

/** What the ride model reads from the other models of a check. */
export const rideInput = (a: Analysis): RideInput => a.graph.get('rideInput');
