import type { CuttingPattern } from '../core/stock/cutting-types.ts';
import type { StockPlan } from '../core/cutlist/cutting-result.ts';

// The bar drawn for one stock piece: where each part lies along it and where
// the offcut begins. Kerfs are not drawn; they are shared out between the parts
// so that the parts and the offcut sit at their true positions.

export interface BarSegment {
  /** The part's label; null for the offcut. */
  label: string | null;
  from_mm: number;
  length_mm: number;
}

export function barSegments(p: CuttingPattern): BarSegment[] {
  const partsLength = p.cuts.reduce((s, c) => s + c.length_mm, 0);
  const kerfs = Math.max(0, p.stock_length_mm - partsLength - p.offcut_mm);
  const gap = p.cuts.length > 1 ? kerfs / (p.cuts.length - 1) : 0;
  const segments: BarSegment[] = [];
  let at = 0;
  for (const c of p.cuts) {
    segments.push({ label: c.label, from_mm: at, length_mm: c.length_mm });
    at += c.length_mm + gap;
  }
  if (p.offcut_mm > 0) segments.push({ label: null, from_mm: p.stock_length_mm - p.offcut_mm, length_mm: p.offcut_mm });
  return segments;
}

/** Round lengths a bar cell or character may stand for, mm. */
const STEPS_MM = [10, 20, 25, 50, 100, 200, 250, 500, 1000, 2000, 2500, 5000];

/** The smallest round length per cell that fits the longest stock in at most maxCells cells. */
export function barScale(longest_mm: number, maxCells: number): number {
  return STEPS_MM.find((s) => Math.ceil(longest_mm / s) <= maxCells) ?? Math.ceil(longest_mm / maxCells);
}

export interface BarCell {
  /** Index into the segments; -1 where the cell lies in no segment (a kerf). */
  segment: number;
  /** True on the first cell of a segment, where its label is written. */
  first: boolean;
}

/**
 * One cell per `scale` mm of the stock, each given to the segment that covers
 * most of it. A part much shorter than a cell may get no cell; the cuts are
 * also listed in words beside the bar.
 */
export function barCells(segments: readonly BarSegment[], stock_mm: number, scale: number): BarCell[] {
  const cells: BarCell[] = [];
  for (let i = 0; i * scale < stock_mm; i++) {
    const lo = i * scale;
    const hi = Math.min(stock_mm, lo + scale);
    let best = -1;
    let bestOverlap = 0;
    segments.forEach((s, k) => {
      const overlap = Math.min(hi, s.from_mm + s.length_mm) - Math.max(lo, s.from_mm);
      if (overlap > bestOverlap) [best, bestOverlap] = [k, overlap];
    });
    cells.push({ segment: best, first: best >= 0 && cells.at(-1)?.segment !== best });
  }
  return cells;
}

/** Labels of a stock plan's parts in order of first appearance, so each part keeps one colour throughout. */
export function partLabels(plan: StockPlan): string[] {
  const labels = new Set<string>();
  for (const g of plan.groups) for (const p of g.plan.patterns) for (const c of p.cuts) labels.add(c.label);
  return [...labels];
}
