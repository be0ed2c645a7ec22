// `npm run bench`: every speed and memory target of the project, printed with
// the conditions and against a reference measured in the same run (the
// yardstick, bare node, odex, first-fit decreasing). Nothing is timed in the
// tests. The exit code is 1 when a target is missed.
import { defaultRulesDir, loadRulesData } from '../src/node/load-rules-data.ts';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { loadLpSolver } from '../src/node/load-lp-solver.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { benchCore, benchSpecs } from './core.ts';
import { benchFloor } from './floor-solver.ts';
import { benchMemory } from './memory.ts';
import { benchOutputs } from './outputs.ts';
import { benchRide } from './ride.ts';
import { benchStartup } from './startup.ts';
import { benchBatch } from './batch.ts';
import { benchSize } from './size.ts';
import { benchStockPlanner } from './stock-planner.ts';
import { benchSweep } from './sweep.ts';
import { benchWorkbench } from './workbench.ts';
import { yardstickMs } from './yardstick.ts';

const data = loadRulesData(defaultRulesDir());
// Loaded once, as the command does; loading it is not part of a check.
const lp = await loadLpSolver();
const yardstick = yardstickMs();
let missed = benchCore(data, lp, yardstick);

console.log('report outputs, in-process:');
const demos = benchSpecs().filter((s) => s.demo);
for (const { file, raw } of demos) {
  const p = prepareSpec(raw, data);
  if (!p.ok) throw new Error(`${file} does not validate`);
  missed += await benchOutputs(file, () => runCheck(p.spec, p.entries, data, { lp }), yardstick);
}

console.log('strap-floor solver:');
for (const { file, raw } of demos) {
  const p = prepareSpec(raw, data);
  if (p.ok) missed += benchFloor(file, p.spec, data);
}
for (const { raw } of demos.filter((d) => d.file.startsWith('demo-'))) {
  const p = prepareSpec(raw, data);
  if (p.ok) missed += benchRide(p.spec, data);
}
console.log('stock planner (OR-Library and generated bin packing):');
missed += await benchStockPlanner();
missed += benchStartup();
console.log('batch review:');
missed += benchBatch();
console.log('size:');
missed += benchSize(benchSpecs().find((s) => s.file === 'teaching-flawed.yaml')!.raw, data, lp);
missed += benchMemory();
missed += await benchWorkbench(data);
// Last: its worker threads would share the cores with the figures above.
missed += benchSweep();
console.log(`${missed ? `${missed} target${missed > 1 ? 's' : ''} MISSED` : 'every target met'} (yardstick ${yardstick.toFixed(1)} ms this run)`);
process.exitCode = missed ? 1 : 0;
