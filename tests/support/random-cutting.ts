// Small random cutting instances for the exhaustive-search tests: one or two
// stock lengths, priced or not, sometimes limited, pieces of a sixth to three
// fifths of the longest stock, at most `maxPieces` pieces in all.
import type { CuttingInstance } from '../../src/core/stock/cutting-types.ts';

export function randomInstance(rand: () => number, maxPieces: number): CuttingInstance {
  const int = (lo: number, hi: number) => lo + Math.floor(rand() * (hi - lo + 1));
  const nStock = rand() < 0.6 ? 2 : 1;
  const priced = rand() < 0.6;
  const limited = rand() < 0.3;
  const lengths = [...new Set(Array.from({ length: nStock }, () => int(60, 200)))];
  const stock = lengths.map((length_mm) => ({
    length_mm,
    ...(priced ? { cost: int(5, 40) / 2 } : {}),
    ...(limited ? { available: int(1, 4) } : {}),
  }));
  const longest = Math.max(...lengths);
  const pieces: CuttingInstance['pieces'] = [];
  let total = int(1, maxPieces);
  while (total > 0) {
    const quantity = int(1, total);
    // Pieces of a sixth to three fifths of the stock make packing matter.
    pieces.push({ length_mm: int(Math.round(longest / 6), Math.round((longest * 3) / 5)), quantity, label: `part ${pieces.length + 1}` });
    total -= quantity;
  }
  return { kerf_mm: int(0, 3), stock, pieces };
}
