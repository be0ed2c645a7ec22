import type { CuttingInstance } from './cutting-types.ts';
import { chooseGrid, pieceSteps, stockSteps, type Grid } from './grid.ts';
import { objectiveStep } from './objective-step.ts';

// The instance as the solvers see it: pieces of one length merged into one
// type (labels kept in a queue), sizes and capacities in grid steps with the
// kerf added to both, so a pattern fits when its sizes sum to the capacity.

export interface PieceType {
  length_mm: number;
  size: number;
  demand: number;
  labels: { label: string; quantity: number }[];
}

export interface StockType {
  length_mm: number;
  capacity: number;
  /** Objective coefficient: the price where every stock is priced, else 1. */
  weight: number;
  price: number | null;
  available: number;
}

export interface CuttingProblem {
  kerf_mm: number;
  grid: Grid;
  /** Longest first. */
  types: PieceType[];
  stocks: StockType[];
  /** True when the objective is cost; false when it is the count of stock pieces. */
  priced: boolean;
  /** Every plan's objective is a multiple of this (0 when it is not known). */
  step: number;
}

/** The instance cannot be planned as given; `path` names the entry. */
export class CuttingInputError extends Error {
  constructor(
    message: string,
    readonly path: (string | number)[],
  ) {
    super(message);
  }
}

export function prepareProblem(instance: CuttingInstance): CuttingProblem {
  const { kerf_mm } = instance;
  const grid = chooseGrid([...instance.stock.map((s) => s.length_mm), ...instance.pieces.map((p) => p.length_mm)], kerf_mm);
  const priced = instance.stock.length > 0 && instance.stock.every((s) => s.cost !== undefined);
  const seen = new Map<number, number>();
  const stocks = instance.stock.map((s, i): StockType => {
    if (seen.has(s.length_mm)) throw new CuttingInputError(`stock length ${s.length_mm} mm is listed twice`, ['stock', i, 'length_mm']);
    seen.set(s.length_mm, i);
    return { length_mm: s.length_mm, capacity: stockSteps(s.length_mm, kerf_mm, grid), weight: priced ? s.cost! : 1, price: priced ? s.cost! : null, available: s.available ?? Infinity };
  });
  const byLength = new Map<number, PieceType>();
  instance.pieces.forEach((p, i) => {
    const size = pieceSteps(p.length_mm, kerf_mm, grid);
    if (!stocks.some((s) => s.capacity >= size)) throw new CuttingInputError(`a piece of ${p.length_mm} mm is longer than every stock length`, ['pieces', i, 'length_mm']);
    if (p.quantity <= 0) return;
    const t = byLength.get(p.length_mm) ?? { length_mm: p.length_mm, size, demand: 0, labels: [] };
    t.demand += p.quantity;
    t.labels.push({ label: p.label ?? `${p.length_mm} mm`, quantity: p.quantity });
    byLength.set(p.length_mm, t);
  });
  const types = [...byLength.values()].sort((a, b) => b.size - a.size || b.length_mm - a.length_mm);
  return { kerf_mm, grid, types, stocks, priced, step: objectiveStep(stocks.map((s) => s.weight)) };
}
