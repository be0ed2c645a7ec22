import { loadLpSolver } from '../io/load-lp-solver.ts';
import type { CuttingInstance } from '../src/stock/cutting-types.ts';
import { planCutting } from '../src/stock/plan-cutting.ts';
import { bruteForceOptimum, seeded } from '../tests/support/brute-force-cutting.ts';
const MAX_PIECES = 8;
function randomInstance(rand: () => number): CuttingInstance {
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
  let total = int(1, MAX_PIECES);
  while (total > 0) {
    const quantity = int(1, total);
    // Pieces of a sixth to three fifths of the stock make packing matter.
    pieces.push({ length_mm: int(Math.round(longest / 6), Math.round((longest * 3) / 5)), quantity, label: `part ${pieces.length + 1}` });
    total -= quantity;
  }
  return { kerf_mm: int(0, 3), stock, pieces };
}
const lp = await loadLpSolver();
const rand = seeded(20240611);
const tally: Record<string, number> = {};
for (let n = 0; n < 30; n++) { const inst = randomInstance(rand); const o = bruteForceOptimum(inst); let m = 'infeasible';
  if (o !== Infinity) { const pl = planCutting(inst, lp); m = pl.method + (pl.baseline.pieces_used !== pl.pieces_used ? ' [beats ffd count]' : '') + (pl.cost !== null && pl.baseline.cost !== pl.cost ? ' [beats ffd cost]' : ''); }
  tally[m] = (tally[m] ?? 0) + 1; }
console.log(tally);
{
const r2 = seeded(7);
let tries = 0, hard = 0, inf = 0;
const t0 = performance.now();
while (hard < 30 && tries < 20000) { tries++; const inst = randomInstance(r2); const o = bruteForceOptimum(inst); if (o === Infinity) { inf++; continue; }
  const f = planCutting(inst, undefined); if ((f.cost ?? f.pieces_used) > o + 1e-9) hard++; }
console.log({ tries, hard, inf, ms: performance.now() - t0 });
}
