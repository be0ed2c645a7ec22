import type { Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';

// An exact search for small problems: the least cost of cutting a residual
// demand is, over every pattern that holds the longest piece left (some
// stock piece must cut it), the pattern's stock price plus the least cost of
// what remains; memoised over the residual demands (and the stock pieces of
// each limited length used), a dynamic programme over patterns. Only
// patterns to which no piece left fits any more are tried: filling a pattern
// from a later stock piece never costs more, so some optimal plan is made of
// them. Cheaper, then shorter, stock and more of the longer pieces are tried
// first, and a later pattern replaces the best only when better, so ties
// always fall the same way; at equal cost the plan with fewer stock pieces,
// then less stock length, is better. Limits are counted in states, pieces and
// steps, never in time.

/** Most memo states (residual demands times stock used) a search may take. */
export const PATTERN_SEARCH_MAX_STATES = 100_000;
/** Most pieces a search may cut: the recursion goes one stock piece deep per level. */
export const PATTERN_SEARCH_MAX_PIECES = 1_000;
/**
 * Most enumeration steps (pattern nodes tried) a search may take. A chariot's
 * groups take hundreds (the demo's largest, 20 pieces of 3 lengths from 3
 * stock lengths, about a thousand); at this limit a search that gives up has
 * cost a few ms, less than the LP solver then takes.
 */
export const PATTERN_SEARCH_MAX_STEPS = 30_000;

class OutOfWork extends Error {}

interface Space {
  /** Place value of each type's residual, then of each limited stock's use. */
  place: number[];
  /** Stocks whose availability can bind, and their index in `place` after the types. */
  limited: Map<number, number>;
  states: number;
}

/** The memo's layout, or null where the problem exceeds the limits above. */
function space(p: CuttingProblem): Space | null {
  const pieces = p.types.reduce((n, t) => n + t.demand, 0);
  if (pieces > PATTERN_SEARCH_MAX_PIECES) return null;
  // A stock with at least as many pieces available as there are pieces to cut never binds.
  const limited = new Map<number, number>();
  const radix = p.types.map((t) => t.demand + 1);
  p.stocks.forEach((s, k) => {
    if (s.available >= pieces) return;
    limited.set(k, radix.length - p.types.length);
    radix.push(s.available + 1);
  });
  const place: number[] = [];
  let states = 1;
  for (const r of radix) {
    place.push(states);
    states *= r;
    if (states > PATTERN_SEARCH_MAX_STATES) return null;
  }
  return { place, limited, states };
}

/** True where the problem is within the search's limits of states and pieces (it may still run out of steps). */
export const searchable = (p: CuttingProblem): boolean => space(p) !== null;

/** An optimal plan's bins, or null where there is none or the search ran out of steps. */
export function patternSearch(p: CuttingProblem): Bin[] | null {
  const sp = space(p);
  if (!sp) return null;
  const s = new Search(p, sp);
  const root = p.types.reduce((n, t, i) => n + t.demand * sp.place[i], 0);
  try {
    if (s.solve(root, 0) === Infinity) return null;
  } catch (e) {
    if (e instanceof OutOfWork) return null;
    throw e;
  }
  return s.unwind(root);
}

class Search {
  private readonly T: number;
  private readonly size: Int32Array;
  /** Stocks, cheapest then shortest first. */
  private readonly order: number[];
  /** Place value of each stock's use in the state, 0 where its availability never binds. */
  private readonly usePlace: number[];
  // The memo: least cost of each state, its stock pieces and their total length (to break ties), and the first choice.
  private readonly cost: Float64Array;
  private readonly count: Int32Array;
  private readonly length: Float64Array;
  private readonly pickStock: Int32Array;
  private readonly pickDelta: Int32Array;
  private readonly left: Int32Array;
  private readonly used: Int32Array;
  /** The pattern being built at each depth (one stock piece per depth). */
  private readonly take: Int32Array[] = [];
  private steps = 0;
  // The state being solved at the current leaf's depth, and its best so far.
  private best = { cost: Infinity, count: 0, length: 0 };

  constructor(
    private readonly p: CuttingProblem,
    private readonly sp: Space,
  ) {
    this.T = p.types.length;
    this.size = Int32Array.from(p.types.map((t) => t.size));
    this.order = p.stocks.map((_, k) => k).sort((a, b) => p.stocks[a].weight - p.stocks[b].weight || p.stocks[a].capacity - p.stocks[b].capacity || a - b);
    this.usePlace = p.stocks.map((_, k) => (sp.limited.has(k) ? sp.place[this.T + sp.limited.get(k)!] : 0));
    this.cost = new Float64Array(sp.states).fill(NaN);
    this.count = new Int32Array(sp.states);
    this.length = new Float64Array(sp.states);
    this.pickStock = new Int32Array(sp.states).fill(-1);
    this.pickDelta = new Int32Array(sp.states);
    this.left = Int32Array.from(p.types.map((t) => t.demand));
    this.used = new Int32Array(p.stocks.length);
  }

  /** Least cost of the state (the residual in `left` and `used`), `depth` stock pieces down. */
  solve(state: number, depth: number): number {
    if (!Number.isNaN(this.cost[state])) return this.cost[state];
    const first = this.left.findIndex((d) => d > 0);
    if (first < 0) return (this.cost[state] = 0);
    const outer = this.best;
    this.best = { cost: Infinity, count: 0, length: 0 };
    this.take[depth] ??= new Int32Array(this.T);
    for (const k of this.order) {
      const st = this.p.stocks[k];
      if (st.capacity >= this.size[first] && this.used[k] < st.available) this.fill(state, depth, first, k, first, st.capacity, 0);
    }
    const best = this.best;
    this.best = outer;
    this.count[state] = best.count;
    this.length[state] = best.length;
    return (this.cost[state] = best.cost);
  }

  /** Try every count of type i and on in stock k's room, then each whole pattern. */
  private fill(state: number, depth: number, first: number, k: number, i: number, room: number, delta: number): void {
    if (++this.steps > PATTERN_SEARCH_MAX_STEPS) throw new OutOfWork();
    const { T, left, size } = this;
    const take = this.take[depth];
    if (i < T) {
      const most = Math.min(left[i], Math.floor(room / size[i]));
      for (let n = most; n >= (i === first ? 1 : 0); n--) {
        take[i] = n;
        this.fill(state, depth, first, k, i + 1, room - n * size[i], delta + n * this.sp.place[i]);
      }
      take[i] = 0;
      return;
    }
    // Only patterns no piece left still fits into.
    for (let j = first; j < T; j++) if (take[j] < left[j] && size[j] <= room) return;
    for (let j = first; j < T; j++) left[j] -= take[j];
    this.used[k]++;
    const next = state - delta + this.usePlace[k];
    const st = this.p.stocks[k];
    const cost = st.weight + this.solve(next, depth + 1);
    this.used[k]--;
    for (let j = first; j < T; j++) left[j] += take[j];
    const count = 1 + this.count[next];
    const length = st.length_mm + this.length[next];
    if (better(cost, count, length, this.best)) {
      this.best.cost = cost;
      this.best.count = count;
      this.best.length = length;
      this.pickStock[state] = k;
      this.pickDelta[state] = delta;
    }
  }

  /** The bins of the optimal choices, from the whole demand down. */
  unwind(root: number): Bin[] {
    const { T, p, sp } = this;
    const bins: Bin[] = [];
    for (let state = root; this.pickStock[state] >= 0; ) {
      const k = this.pickStock[state];
      const delta = this.pickDelta[state];
      const items: number[] = [];
      for (let i = 0; i < T; i++) {
        const n = Math.floor(delta / sp.place[i]) % (p.types[i].demand + 1);
        for (let c = 0; c < n; c++) items.push(i);
      }
      bins.push({ stock: k, items });
      state = state - delta + this.usePlace[k];
    }
    return bins;
  }
}

/** Cheaper; at the same cost (to rounding), fewer stock pieces; then less stock length bought. */
function better(cost: number, count: number, length: number, b: { cost: number; count: number; length: number }): boolean {
  if (!Number.isFinite(cost)) return false;
  if (!Number.isFinite(b.cost)) return true;
  const tol = 1e-9 * Math.max(1, Math.abs(b.cost));
  if (Math.abs(cost - b.cost) > tol) return cost < b.cost;
  return count < b.count || (count === b.count && length < b.length - 1e-9);
}
