import type { Model } from 'highs';
import type { Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import type { LpSolver } from './cutting-types.ts';
import { boundedKnapsack } from './knapsack.ts';
import { addColumn, buildModel, feasibleValues, runMip, solveCounted, type LpColumn } from './lp-model.ts';
import { artificialCost, startPatterns } from './master-start.ts';
import { binPattern, patternBin, patternKey, type Pattern } from './pattern.ts';
import type { WorkMeter } from './work-meter.ts';

// The master problem of column generation over cutting patterns, kept in one
// HiGHS model that is re-solved warm as columns are added: "at least the
// demand" rows, "at most the available" rows, one column per pattern, and an
// artificial column per demand row (priced above any plan) so the master is
// feasible from the start. With the artificials the LP is a relaxation still,
// so its optimum bounds every plan.

/** Pricing rounds in one convergence before the LP is taken as it stands (each adds at most one column per stock length). */
export const MAX_PRICING_ROUNDS = 2000;

export class PatternMaster {
  readonly patterns: Pattern[] = [];
  private readonly known = new Set<string>();
  private readonly availRow: number[];
  private readonly model: Model;
  private readonly T: number;
  /** Demand and availability the rows ask for now (reduced while diving). */
  demand: number[];
  /** Column values of the last optimal solve, kept: adding a column leaves the model unsolved. */
  private solved = new Float64Array(0);

  constructor(
    private readonly p: CuttingProblem,
    readonly lp: LpSolver,
    start: Bin[] | null,
    readonly meter: WorkMeter,
  ) {
    this.T = p.types.length;
    this.demand = p.types.map((t) => t.demand);
    this.availRow = p.stocks.map(() => -1);
    const rows = { lower: [...this.demand], upper: p.types.map(() => Infinity) };
    p.stocks.forEach((s, k) => {
      if (s.available === Infinity) return;
      this.availRow[k] = rows.lower.length;
      rows.lower.push(-Infinity);
      rows.upper.push(s.available);
    });
    for (const pat of startPatterns(p, start)) this.remember(pat);
    const big = artificialCost(p);
    const artificial: LpColumn[] = p.types.map((_, i) => ({ cost: big, upper: Infinity, rows: [i], values: [1] }));
    this.model = buildModel(lp, rows, [...artificial, ...this.patterns.map((pat) => this.column(pat))]);
  }

  dispose(): void {
    this.model.dispose();
  }

  /**
   * Price until no pattern has a negative reduced cost, or until the meter
   * runs out. Returns the LP value and a proved bound: the LP value when it
   * converged, else Farley's (the duals scaled down until feasible), or null.
   */
  converge(): { value: number; bound: number | null } | null {
    const { p, lp, model, meter } = this;
    const positive = p.stocks.every((s) => s.weight > 0);
    let bound: number | null = null;
    for (let round = 0; ; round++) {
      solveCounted(model, meter);
      if (model.getModelStatus() !== lp.constants.modelStatus.optimal) return null;
      const value = model.getObjectiveValue();
      const solution = model.getSolution();
      this.solved = Float64Array.from(solution.colValue);
      const dual = solution.rowDual;
      const { best, cells } = boundedKnapsack(
        p.types.map((t, i) => ({ size: t.size, value: dual[i], bound: this.demand[i] })),
        p.stocks.map((s) => s.capacity),
      );
      meter.spend('dpCells', cells);
      let theta = 1;
      let added = false;
      p.stocks.forEach((s, k) => {
        const mu = this.availRow[k] >= 0 ? dual[this.availRow[k]] : 0;
        if (positive) theta = Math.max(theta, (best[k].value + mu) / s.weight);
        if (s.weight - mu - best[k].value < -1e-9 * Math.max(1, s.weight) && this.remember({ stock: k, counts: best[k].counts })) {
          addColumn(lp, model, this.column(this.patterns[this.patterns.length - 1]));
          meter.spend('columns', 1);
          added = true;
        }
      });
      if (!added) return { value, bound: Math.max(bound ?? -Infinity, value) };
      if (positive) bound = Math.max(bound ?? -Infinity, value / theta);
      // Stopped by the meter or the round limit: the values are those of the last solve, the bound Farley's.
      if (meter.exhausted() || round + 1 >= MAX_PRICING_ROUNDS) return { value, bound };
    }
  }

  /** LP values of the patterns at the last optimal solve (columns added since have none). */
  values(): Float64Array {
    return this.solved.subarray(this.T);
  }

  /** Ask the rows for less: what is left after fixing some stock pieces. */
  reduce(demand: number[], used: number[]): void {
    this.demand = demand;
    const { model, T } = this;
    model.changeRowsBounds({ kind: 'range', from: 0, to: T - 1 }, demand, demand.map(() => this.lp.infinity));
    this.p.stocks.forEach((s, k) => {
      const r = this.availRow[k];
      if (r >= 0) model.changeRowBounds(r, -this.lp.infinity, s.available - used[k]);
    });
  }

  /** Ask the rows for the whole demand and availability again. */
  restore(): void {
    this.reduce(
      this.p.types.map((t) => t.demand),
      this.p.stocks.map(() => 0),
    );
  }

  /** A MIP over every pattern generated so far (within the meter's nodes), then back to the LP. */
  mip(start: Bin[] | null): Bin[] | null {
    const { model, T, lp } = this;
    const zeros = new Array<number>(T).fill(0);
    model.changeColsBounds({ kind: 'range', from: 0, to: T - 1 }, zeros, zeros);
    runMip(lp, model, this.meter, this.p.step, start ? [...zeros, ...this.counts(start)] : undefined);
    const x = feasibleValues(lp, model);
    const bins = x ? this.patterns.flatMap((pat, j) => Array.from({ length: Math.round(x[T + j]) }, () => patternBin(pat))) : null;
    model.clearIntegrality();
    model.changeColsBounds({ kind: 'range', from: 0, to: T - 1 }, zeros, Array(T).fill(lp.infinity));
    return bins;
  }

  /** Add the patterns of these bins as columns (a MIP start must be made of columns). */
  include(bins: Bin[]): void {
    for (const b of bins) if (this.remember(binPattern(this.p, b))) addColumn(this.lp, this.model, this.column(this.patterns[this.patterns.length - 1]));
  }

  private counts(bins: Bin[]): number[] {
    const index = new Map(this.patterns.map((pat, j) => [patternKey(pat), j]));
    const x = this.patterns.map(() => 0);
    for (const b of bins) {
      const j = index.get(patternKey(binPattern(this.p, b)));
      if (j !== undefined) x[j]++;
    }
    return x;
  }

  private remember(pat: Pattern): boolean {
    const key = patternKey(pat);
    if (this.known.has(key)) return false;
    this.known.add(key);
    this.patterns.push(pat);
    return true;
  }

  private column(pat: Pattern): LpColumn {
    const rows: number[] = [];
    const values: number[] = [];
    pat.counts.forEach((c, i) => {
      if (c > 0) {
        rows.push(i);
        values.push(c);
      }
    });
    const r = this.availRow[pat.stock];
    if (r >= 0) {
      rows.push(r);
      values.push(1);
    }
    const s = this.p.stocks[pat.stock];
    return { cost: s.weight, upper: s.available, rows, values };
  }
}
