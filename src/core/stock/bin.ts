import type { CuttingProblem } from './cutting-problem.ts';

/** One stock piece and the piece types cut from it (indices into problem.types). */
export interface Bin {
  stock: number;
  items: number[];
}

export function binLoad(p: CuttingProblem, b: Bin): number {
  let sum = 0;
  for (const i of b.items) sum += p.types[i].size;
  return sum;
}

/** Stock pieces of each stock type that the bins use. */
export function stockUse(p: CuttingProblem, bins: Bin[]): number[] {
  const use = p.stocks.map(() => 0);
  for (const b of bins) use[b.stock]++;
  return use;
}

export function binsObjective(p: CuttingProblem, bins: Bin[]): number {
  let sum = 0;
  for (const b of bins) sum += p.stocks[b.stock].weight;
  return sum;
}
