// Speed and memory targets live here, never in unit tests.
// Target: each demo specification checks (validate, compute, render every
// output) in under one second on an ordinary laptop.
import { readFileSync, readdirSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { parse } from 'yaml';
import { defaultRulesDir, loadRulesData } from '../src/node/load-rules-data.ts';
import { reportDocument } from '../src/render/model/report-document.ts';
import { renderHtml } from '../src/render/html/render-html.ts';
import { drawReportPlots } from '../src/render/report-plots.ts';
import { renderMarkdown } from '../src/render/markdown/render-markdown.ts';
import { renderWorkbook } from '../src/render/workbook.ts';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { loadLpSolver } from '../src/node/load-lp-solver.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { benchFloor } from './floor-solver.ts';
import { benchStockPlanner } from './stock-planner.ts';
import { benchRide } from './ride.ts';
import { benchStartup } from './startup.ts';

/** The check: validation and every model and rule (the ride model and the stock planner included). */
const TARGET_MS = 1000;
/** The report's model and renderers: Markdown, the plots (vega, about 40 ms each, eleven of them), HTML and the workbook. */
const OUTPUTS_TARGET_MS = 1500;

/** Print the median, first and worst of a set of runs against a target; 1 if it missed. */
function report(label: string, times: number[], target: number): number {
  const sorted = [...times].sort((a, b) => a - b);
  const median = sorted[Math.floor(sorted.length / 2)];
  const ok = median < target;
  console.log(`${label} median ${median.toFixed(1)} ms (first ${times[0].toFixed(1)}, worst ${sorted.at(-1)!.toFixed(1)})  target < ${target} ms  ${ok ? 'met' : 'MISSED'}`);
  return ok ? 0 : 1;
}
const RUNS = 10;
const data = loadRulesData(defaultRulesDir());
// Loaded once, as the CLI does; the time to load it is not part of a check.
const lp = await loadLpSolver();
const specs = new URL('../specs/', import.meta.url);
let missed = 0;

for (const file of readdirSync(specs).filter((f) => f.endsWith('.yaml'))) {
  const raw = parse(readFileSync(new URL(file, specs), 'utf8'));
  const checkTimes: number[] = [];
  const outputTimes: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    const p = prepareSpec(raw, data);
    if (!p.ok) throw new Error(`${file} does not validate`);
    const result = runCheck(p.spec, p.entries, data, { lp: lp });
    const t1 = performance.now();
    const doc = reportDocument(result);
    renderMarkdown(doc);
    renderHtml(doc, await drawReportPlots(result));
    await renderWorkbook(result, doc);
    checkTimes.push(t1 - t0);
    outputTimes.push(performance.now() - t1);
  }
  missed += report(`${file.padEnd(24)} check  `, checkTimes, TARGET_MS);
  missed += report(`${''.padEnd(24)} outputs`, outputTimes, OUTPUTS_TARGET_MS);
  const p = prepareSpec(raw, data);
  if (p.ok) missed += benchFloor(file, p.spec, data);
}
{
  const p = prepareSpec(parse(readFileSync(new URL('demo-two-crew.yaml', specs), 'utf8')), data);
  if (p.ok) missed += benchRide(p.spec, data);
}
console.log('stock planner, OR-Library bin packing:');
missed += await benchStockPlanner();
missed += benchStartup();
console.log(`heap used ${(process.memoryUsage().heapUsed / 2 ** 20).toFixed(1)} MiB`);
process.exitCode = missed ? 1 : 0;
