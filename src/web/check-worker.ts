// The check worker: every change of the form is checked here, off the page's
// thread, statics first (the verdict in a few tens of milliseconds) and the
// ride cases after. A newer change waiting when the statics are done skips
// the older full check, so typing never queues up stale work.
import type { RulesData } from '../core/data/rules-data.ts';
import { LiveChecker } from '../core/pipeline/live-check.ts';
import { runCheck } from '../core/pipeline/run-check.ts';
import type { CheckResult } from '../core/result/check-result.ts';
import { parseSpecWorkbook } from '../core/input/parse-spec-workbook.ts';
import { pathText } from '../core/spec/input-issue.ts';
import { prepareSpec } from '../core/spec/prepare.ts';
import { renderHtml } from '../render/html/render-html.ts';
import { reportDocument } from '../render/model/report-document.ts';
import { drawingsOf } from '../render/report-drawings.ts';
import { drawReportPlots } from '../render/report-plots.ts';
import { plotSvg } from '../render/plots/plot-svg.ts';
import { renderWorkbook } from '../render/workbook.ts';
import { viewOf, type FromWorker, type Picture, type ToWorker } from './messages.ts';
import { LIVE_PLOTS } from './live-plots.ts';
import rulesData from 'axletree:rules-data';

const data = rulesData as RulesData;
const post = (m: FromWorker) => (self as unknown as { postMessage(m: FromWorker): void }).postMessage(m);
const clock = () => self.performance.now();

// One for each stage: each reuses what the last check of its own kind computed.
const staticsChecker = new LiveChecker(data);
const fullChecker = new LiveChecker(data);

let pending: Extract<ToWorker, { type: 'check' }> | undefined;
let running = false;
let lastValid: { spec: Parameters<typeof runCheck>[0]; entries: Parameters<typeof runCheck>[1]; raw: unknown } | undefined;
let lastFull: CheckResult | undefined;

const yieldToMessages = () => new Promise<void>((r) => setTimeout(r, 0));

function pictures(result: CheckResult): { drawings: Picture[]; plots: Picture[] } {
  const drawings = drawingsOf(result).map((d) => ({ id: d.id, title: d.title, svg: d.svg }));
  const plots = (result.plots ?? []).filter((p) => LIVE_PLOTS.includes(p.id)).map((p) => ({ id: p.id, title: p.title, svg: plotSvg(p) }));
  return { drawings, plots };
}

async function checkLatest(): Promise<void> {
  if (running) return;
  running = true;
  try {
    while (pending) {
      const job = pending;
      pending = undefined;
      const prepared = prepareSpec(job.raw, data);
      if (!prepared.ok) {
        post({ type: 'invalid', id: job.id, issues: prepared.issues });
        continue;
      }
      lastValid = { spec: prepared.spec, entries: prepared.entries, raw: job.raw };
      const t0 = clock();
      const statics = staticsChecker.check(prepared.spec, prepared.entries, { ride: false });
      const ms = clock() - t0;
      post({ type: 'result', id: job.id, stage: 'statics', result: viewOf(statics), ms });
      await yieldToMessages();
      if (pending) continue;
      post({ type: 'pictures', id: job.id, stage: 'statics', ...pictures(statics) });
      await yieldToMessages();
      if (pending) continue;
      const t1 = clock();
      const full = fullChecker.check(prepared.spec, prepared.entries, { ride: true });
      lastFull = full;
      post({ type: 'result', id: job.id, stage: 'full', result: viewOf(full), ms: clock() - t1 });
      post({ type: 'pictures', id: job.id, stage: 'full', ...pictures(full) });
      await yieldToMessages();
    }
  } catch (e) {
    post({ type: 'fault', id: -1, message: e instanceof Error ? e.message : String(e) });
  } finally {
    running = false;
  }
}

async function answer(m: ToWorker): Promise<void> {
  if (m.type === 'check') {
    pending = m;
    return checkLatest();
  }
  if (m.type === 'decisive') {
    const p = prepareSpec(m.raw, data);
    if (!p.ok) return post({ type: 'fault', id: m.id, message: `the build has ${p.issues.length} problem${p.issues.length === 1 ? '' : 's'} to mend before its decisive inputs can be searched` });
    const r = runCheck(p.spec, p.entries, data, { decisive: true });
    return post({ type: 'decisive', id: m.id, inputs: r.decisive_inputs ?? [], search: r.decisive_search! });
  }
  if (m.type === 'open-workbook') {
    const read = await parseSpecWorkbook(m.bytes, m.name);
    return post(read.ok ? { type: 'opened', id: m.id, name: m.name, raw: read.raw } : { type: 'not-opened', id: m.id, name: m.name, problems: read.issues.map((i) => `${pathText(i.path)}: ${i.message}`) });
  }
  if (!lastFull) return post({ type: 'fault', id: m.id, message: 'the full check has not finished yet' });
  const result = { ...lastFull, input: lastValid?.raw };
  const doc = reportDocument(result);
  if (m.kind === 'report') {
    const plots = drawReportPlots(result);
    return post({ type: 'file', id: m.id, name: 'report.html', mime: 'text/html', data: renderHtml(doc, plots) });
  }
  const bytes = await renderWorkbook(result, doc);
  post({ type: 'file', id: m.id, name: 'result.xlsx', mime: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', data: bytes });
}

self.onmessage = (e: MessageEvent<ToWorker>) => {
  answer(e.data).catch((err: unknown) => post({ type: 'fault', id: e.data.id, message: err instanceof Error ? err.message : String(err) }));
};
