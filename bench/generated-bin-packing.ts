import { lengthBound, type BinPacking } from './bin-packing.ts';

/**
 * Bin-packing instances of Falkenauer's uniform class (item sizes uniform
 * whole numbers 20 to 100, capacity 150) with more items than u250, drawn
 * from a seeded generator so every run and every machine sees the same ones.
 * The target is the length bound ceil(sum / 150), the optimum for almost all
 * such instances.
 */
export function generatedBinPacking(name: string, items: number, count: number, seed: number): BinPacking[] {
  // A linear congruential generator (Numerical Recipes' constants), its high bits used: enough for test data, and the same everywhere.
  let x = seed >>> 0;
  const next = () => (x = (Math.imul(x, 1664525) + 1013904223) >>> 0) / 2 ** 32;
  return Array.from({ length: count }, (_, k) => {
    const sizes = Array.from({ length: items }, () => 20 + Math.floor(next() * 81));
    return { name: `${name}_${String(k).padStart(2, '0')}`, capacity: 150, sizes, target: lengthBound({ capacity: 150, sizes }) };
  });
}
