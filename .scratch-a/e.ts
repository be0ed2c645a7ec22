import { loadLpSolver } from '../io/load-lp-solver.ts';
import { planCutting } from '../src/stock/plan-cutting.ts';
const lp = await loadLpSolver();
console.log(planCutting({ kerf_mm: 0, stock: [], pieces: [] }, lp));
console.log(planCutting({ kerf_mm: 0, stock: [{ length_mm: 10 }], pieces: [] }, lp).lower_bound);
const p = planCutting({ kerf_mm: 0, stock: [{ length_mm: 10 }], pieces: [6,5,4,3,2].map((l) => ({ length_mm: l, quantity: 1 })) }, lp); console.log(p.lower_bound, p.optimal, p.method);
