import type { Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';

/** A cutting pattern as column generation holds it: copies of each piece type from one stock. */
export interface Pattern {
  stock: number;
  counts: number[];
}

export const patternKey = (pat: Pattern): string => `${pat.stock}:${pat.counts.join(',')}`;

export function binPattern(p: CuttingProblem, b: Bin): Pattern {
  const counts = p.types.map(() => 0);
  for (const i of b.items) counts[i]++;
  return { stock: b.stock, counts };
}

export function patternBin(pat: Pattern): Bin {
  return { stock: pat.stock, items: pat.counts.flatMap((c, i) => Array<number>(c).fill(i)) };
}
