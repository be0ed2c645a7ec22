import { loadLpSolver } from '../io/load-lp-solver.ts';
import { planCutting } from '../src/stock/plan-cutting.ts';
import { planProblems } from '../src/stock/validate-plan.ts';
const lp = await loadLpSolver();
const inst = { kerf_mm: 0, stock: [{ length_mm: 100 }], pieces: [45, 36, 31, 14].map((l, i) => ({ length_mm: l, quantity: [97, 610, 395, 211][i] })) };
for (const method of ['arc flow', 'column generation', 'first-fit decreasing'] as const) {
  const t = performance.now();
  const plan = planCutting(inst, lp, { method, timeLimit_s: 5 });
  console.log(method, (performance.now() - t).toFixed(1), plan.pieces_used, plan.lower_bound, plan.optimal, plan.method, plan.baseline, planProblems(inst, plan));
  console.log(plan.patterns.map((p) => `${p.count} x ${p.cuts.map((c) => c.length_mm).join('+')} off ${p.offcut_mm}`).join('; '));
}
