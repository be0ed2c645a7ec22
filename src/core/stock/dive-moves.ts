import { patternKey, type Pattern } from './pattern.ts';

/** One step of a dive: fix `copies` stock pieces cut to `pattern`. */
export interface DiveMove {
  fixes: { pattern: Pattern; copies: number }[];
  /** Pattern key of the single column this move rounds (none for the move that fixes every integral column). */
  key: string | null;
}

const EPS = 1e-6;

/**
 * The moves from one LP solution, best first. Columns the LP already uses a
 * whole number of times are fixed together (they cost the bound nothing);
 * where none is, each used column rounded to its nearest whole count of at
 * least one, the column closest to it first (the rule of Sadykov, Vanderbeck,
 * Pessoa, Tahiri and Uchoa, "Primal heuristics for branch and price: the
 * assets of diving methods", INFORMS J. Computing 31 (2019)). Ties go to the
 * lower column index, so the order never depends on anything but the LP.
 * Columns in `tabu` (tried already at an ancestor) are left out.
 */
export function diveMoves(patterns: Pattern[], x: Float64Array, tabu: ReadonlySet<string>): DiveMove[] {
  const whole: DiveMove['fixes'] = [];
  const rounded: { j: number; copies: number; off: number }[] = [];
  x.forEach((v, j) => {
    if (v < EPS) return;
    const copies = Math.max(1, Math.round(v));
    const off = Math.abs(v - copies);
    if (off < EPS) whole.push({ pattern: patterns[j], copies });
    else rounded.push({ j, copies, off });
  });
  if (whole.length > 0) return [{ fixes: whole, key: null }];
  rounded.sort((a, b) => a.off - b.off || a.j - b.j);
  return rounded
    .map(({ j, copies }) => ({ fixes: [{ pattern: patterns[j], copies }], key: patternKey(patterns[j]) }))
    .filter((m) => !tabu.has(m.key));
}
