import type { CuttingProblem } from './cutting-problem.ts';

/** No plan cuts every piece from the stock available. */
export class StockShortfallError extends Error {
  readonly uncut: { length_mm: number; quantity: number }[];
  constructor(p: CuttingProblem, unplaced: number[]) {
    const counts = new Map<number, number>();
    for (const i of unplaced) counts.set(p.types[i].length_mm, (counts.get(p.types[i].length_mm) ?? 0) + 1);
    const uncut = [...counts].map(([length_mm, quantity]) => ({ length_mm, quantity }));
    super(`no plan was found that cuts every piece from the stock available; first-fit decreasing leaves ${uncut.map((u) => `${u.quantity} × ${u.length_mm} mm`).join(', ')} uncut`);
    this.uncut = uncut;
  }
}
