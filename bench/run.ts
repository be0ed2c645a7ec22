// Speed and memory targets live here, never in unit tests.
// Target: each demo specification checks (validate, compute, render every
// output) in under one second on an ordinary laptop.
import { readFileSync, readdirSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { parse } from 'yaml';
import { defaultRulesDir, loadRulesData } from '../io/load-rules-data.ts';
import { renderHtml } from '../io/render/report-html.ts';
import { drawReportPlots } from '../io/render/report-plots.ts';
import { renderMarkdown } from '../io/render/report-md.ts';
import { renderWorkbook } from '../io/render/workbook.ts';
import { checkSpecification } from '../src/check.ts';
import { RULES } from '../src/engine/registry.ts';
import { loadLpSolver } from '../io/load-lp-solver.ts';
import { prepareSpec } from '../src/spec/prepare.ts';
import { benchFloor } from './floor-solver.ts';
import { benchStockPlanner } from './stock-planner.ts';
import { benchRide } from './ride.ts';

const TARGET_MS = 1000;
const RUNS = 10;
const data = loadRulesData(defaultRulesDir());
// Loaded once, as the CLI does; the time to load it is not part of a check.
const lp = await loadLpSolver();
const specs = new URL('../specs/', import.meta.url);
let missed = 0;

for (const file of readdirSync(specs).filter((f) => f.endsWith('.yaml'))) {
  const raw = parse(readFileSync(new URL(file, specs), 'utf8'));
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    const p = prepareSpec(raw, data);
    if (!p.ok) throw new Error(`${file} does not validate`);
    const result = checkSpecification(p.spec, p.entries, data, RULES, lp);
    renderMarkdown(result);
    renderHtml(result, await drawReportPlots(result));
    await renderWorkbook(result);
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const median = times[Math.floor(RUNS / 2)];
  const ok = median < TARGET_MS;
  if (!ok) missed++;
  console.log(`${file.padEnd(24)} median ${median.toFixed(1)} ms (first ${times[0].toFixed(1)}, worst ${times[RUNS - 1].toFixed(1)})  target < ${TARGET_MS} ms  ${ok ? 'met' : 'MISSED'}`);
  const p = prepareSpec(raw, data);
  if (p.ok) missed += benchFloor(file, p.spec, data);
}
{
  const p = prepareSpec(parse(readFileSync(new URL('demo-two-crew.yaml', specs), 'utf8')), data);
  if (p.ok) missed += benchRide(p.spec, data);
}
console.log('stock planner, OR-Library bin packing:');
missed += await benchStockPlanner();
console.log(`heap used ${(process.memoryUsage().heapUsed / 2 ** 20).toFixed(1)} MiB`);
process.exitCode = missed ? 1 : 0;
