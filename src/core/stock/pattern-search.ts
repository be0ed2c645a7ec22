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
// first, and a later pattern replaces the best only when strictly cheaper,
// so ties always fall the same way; at equal cost the plan with fewer stock
// pieces, then less stock length, wins. Limits are counted in states and steps.

/** Most memo states (residual demands times stock used) a search may take. */
export const PATTERN_SEARCH_MAX_STATES = 100_000;
/** Most enumeration steps (pattern nodes tried) a search may take. */
export const PATTERN_SEARCH_MAX_STEPS = 200_000;

class OutOfWork extends Error {}

interface Space {
  /** Place value of each type's residual, then of each limited stock's use. */
  place: number[];
  /** Stocks whose availability can bind, and their index in `place` after the types. */
  limited: Map<number, number>;
  states: number;
}

/** The memo's layout, or null where it would exceed PATTERN_SEARCH_MAX_STATES. */
function space(p: CuttingProblem): Space | null {
  const pieces = p.types.reduce((n, t) => n + t.demand, 0);
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

/** True where the search's memo fits its limit (the search may still run out of steps). */
export const searchable = (p: CuttingProblem): boolean => space(p) !== null;

/** An optimal plan's bins, or null where there is none or the search ran out of work. */
export function patternSearch(p: CuttingProblem): Bin[] | null {
  const sp = space(p);
  if (!sp) return null;
  const T = p.types.length;
  const { place, limited } = sp;
  const order = p.stocks.map((_, k) => k).sort((a, b) => p.stocks[a].weight - p.stocks[b].weight || p.stocks[a].capacity - p.stocks[b].capacity || a - b);
  // The memo: least cost of each state, and (to break ties) its stock pieces and their total length.
  const cost = new Float64Array(sp.states).fill(NaN);
  const count = new Int32Array(sp.states);
  const length = new Float64Array(sp.states);
  const pickStock = new Int32Array(sp.states).fill(-1);
  const pickCounts = new Int32Array(sp.states);
  const left = p.types.map((t) => t.demand);
  const used = p.stocks.map(() => 0);
  let steps = 0;

  const solve = (state: number): number => {
    if (!Number.isNaN(cost[state])) return cost[state];
    const first = left.findIndex((d) => d > 0);
    if (first < 0) return (cost[state] = 0);
    const best = { cost: Infinity, count: 0, length: 0 };
    // Each state its own pattern under construction: the recursion below builds others.
    const take = new Array<number>(T).fill(0);
    for (const k of order) {
      const s = p.stocks[k];
      if (s.capacity < p.types[first].size || used[k] >= s.available) continue;
      const slot = limited.get(k);
      const fill = (i: number, room: number, delta: number): void => {
        if (++steps > PATTERN_SEARCH_MAX_STEPS) throw new OutOfWork();
        if (i === T) {
          // Only patterns no piece left still fits into.
          for (let j = first; j < T; j++) if (take[j] < left[j] && p.types[j].size <= room) return;
          for (let j = first; j < T; j++) left[j] -= take[j];
          used[k]++;
          const next = state - delta + (slot === undefined ? 0 : place[T + slot]);
          const c = { cost: s.weight + solve(next), count: 1 + count[next], length: s.length_mm + length[next] };
          used[k]--;
          for (let j = first; j < T; j++) left[j] += take[j];
          if (better(c, best)) {
            Object.assign(best, c);
            pickStock[state] = k;
            pickCounts[state] = delta;
          }
          return;
        }
        const most = Math.min(left[i], Math.floor(room / p.types[i].size));
        for (let n = most; n >= (i === first ? 1 : 0); n--) {
          take[i] = n;
          fill(i + 1, room - n * p.types[i].size, delta + n * place[i]);
        }
        take[i] = 0;
      };
      fill(first, s.capacity, 0);
    }
    count[state] = best.count;
    length[state] = best.length;
    return (cost[state] = best.cost);
  };

  const root = p.types.reduce((n, t, i) => n + t.demand * place[i], 0);
  try {
    if (solve(root) === Infinity) return null;
  } catch (e) {
    if (e instanceof OutOfWork) return null;
    throw e;
  }
  return unwind(p, sp, root, pickStock, pickCounts);
}

interface Score {
  cost: number;
  count: number;
  length: number;
}

/** Cheaper; at the same cost (to rounding), fewer stock pieces; then less stock length bought. */
function better(a: Score, b: Score): boolean {
  if (!Number.isFinite(a.cost)) return false;
  if (!Number.isFinite(b.cost)) return true;
  const tol = 1e-9 * Math.max(1, Math.abs(b.cost));
  if (Math.abs(a.cost - b.cost) > tol) return a.cost < b.cost;
  return a.count < b.count || (a.count === b.count && a.length < b.length - 1e-9);
}

/** The bins of the optimal choices, from the whole demand down. */
function unwind(p: CuttingProblem, sp: Space, root: number, pickStock: Int32Array, pickCounts: Int32Array): Bin[] {
  const T = p.types.length;
  const bins: Bin[] = [];
  let state = root;
  while (pickStock[state] >= 0) {
    const k = pickStock[state];
    const delta = pickCounts[state];
    const items: number[] = [];
    for (let i = 0; i < T; i++) {
      const n = Math.floor(delta / sp.place[i]) % (p.types[i].demand + 1);
      for (let c = 0; c < n; c++) items.push(i);
    }
    bins.push({ stock: k, items });
    const slot = sp.limited.get(k);
    state = state - delta + (slot === undefined ? 0 : sp.place[T + slot]);
  }
  return bins;
}
