// A demo specification checked and rendered as the HTML report, for the
// browser test and the README's screenshot.
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { defaultRulesDir, loadRulesData } from '../src/node/load-rules-data.ts';
import { reportDocument } from '../src/render/model/report-document.ts';
import { renderHtml } from '../src/render/html/render-html.ts';
import { drawReportPlots } from '../src/render/report-plots.ts';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';

export async function demoReportHtml(demo: string): Promise<string> {
  const data = loadRulesData(defaultRulesDir());
  const p = prepareSpec(parse(readFileSync(new URL(`../specs/${demo}.yaml`, import.meta.url), 'utf8')), data);
  if (!p.ok) throw new Error(p.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('\n'));
  const result = runCheck(p.spec, p.entries, data);
  return renderHtml(reportDocument(result), await drawReportPlots(result));
}
