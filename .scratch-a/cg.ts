import { loadLpSolver } from '../io/load-lp-solver.ts';
import { readOrLibrary, asInstance } from '../bench/stock-planner.ts';
import { prepareProblem } from '../src/stock/cutting-problem.ts';
import { PatternMaster } from '../src/stock/pattern-master.ts';
import { dive } from '../src/stock/dive.ts';
import { firstFit, allItems } from '../src/stock/first-fit.ts';
import { settleBins } from '../src/stock/settle-bins.ts';
const lp = await loadLpSolver();
const names = process.argv.slice(2);
for (const set of ['orlib-binpack1.txt', 'orlib-binpack2.txt']) for (const b of readOrLibrary(set)) {
  if (names.length && !names.includes(b.name)) continue;
  const p = prepareProblem(asInstance(b));
  const f = firstFit(p, [], allItems(p)).bins;
  let t = performance.now();
  const m = new PatternMaster(p, lp, f);
  const root = m.converge(performance.now() + 5000)!;
  const tRoot = performance.now() - t; t = performance.now();
  const cols = m.patterns.length;
  const d = dive(p, m, performance.now() + 5000, Infinity);
  const tDive = performance.now() - t;
  const ds = d ? settleBins(p, d) : null;
  t = performance.now();
  m.restore(); const mip = m.mip(1.0, f);
  const tMip = performance.now() - t;
  console.log(b.name, 'opt', b.optimum, 'lb', root.bound!.toFixed(3), `root ${tRoot.toFixed(0)}ms ${cols} cols`, `dive ${ds?.bins.length} (+${ds?.repaired}) ${tDive.toFixed(0)}ms`, `mip(all cols ${m.patterns.length}) ${mip ? settleBins(p, mip).bins.length : null} ${tMip.toFixed(0)}ms`);
  m.dispose();
}
