import { loadLpSolver } from '../io/load-lp-solver.ts';
import { readOrLibrary, asInstance } from '../bench/stock-planner.ts';
import { planCutting } from '../src/stock/plan-cutting.ts';
const lp = await loadLpSolver();
let hit = 0, n = 0, tmax = 0;
for (const b of readOrLibrary(process.argv[2])) { const t = performance.now(); const pl = planCutting(asInstance(b), lp, { method: 'arc flow', timeLimit_s: 5 }); const s = (performance.now() - t) / 1000; tmax = Math.max(tmax, s); n++; if (pl.pieces_used <= b.optimum) hit++; }
console.log(process.argv[2], 'arc flow 5 s:', hit, '/', n, 'worst', tmax.toFixed(2));
