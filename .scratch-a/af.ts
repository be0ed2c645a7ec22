import { loadLpSolver } from '../io/load-lp-solver.ts';
import { readOrLibrary, asInstance } from '../bench/stock-planner.ts';
import { prepareProblem } from '../src/stock/cutting-problem.ts';
import { arcFlowGraph } from '../src/stock/arc-flow-graph.ts';
import { arcFlow } from '../src/stock/arc-flow.ts';
const lp = await loadLpSolver();
for (const name of process.argv.slice(2)) {
  const b = readOrLibrary(name.startsWith('u120') ? 'orlib-binpack1.txt' : 'orlib-binpack2.txt').find((x) => x.name === name)!;
  const p = prepareProblem(asInstance(b));
  let t = performance.now();
  const g = arcFlowGraph(p);
  console.log(name, 'types', p.types.length, 'nodes', g.nodes.length, 'arcs', g.arcs.length, 'graph ms', (performance.now() - t).toFixed(1));
  t = performance.now();
  const o = arcFlow(p, lp, performance.now() + 1500, null);
  console.log(' solve ms', (performance.now() - t).toFixed(0), o.bins?.length, o.lowerBound, o.proved);
}
import { firstFit, allItems } from '../src/stock/first-fit.ts';
for (const name of process.argv.slice(2)) {
  const b = readOrLibrary(name.startsWith('u120') ? 'orlib-binpack1.txt' : 'orlib-binpack2.txt').find((x) => x.name === name)!;
  const p = prepareProblem(asInstance(b));
  const f = firstFit(p, [], allItems(p));
  const t = performance.now();
  const o = arcFlow(p, lp, performance.now() + 1500, f.bins);
  console.log(' with start: solve ms', (performance.now() - t).toFixed(0), o.bins?.length, o.lowerBound, o.proved);
}
