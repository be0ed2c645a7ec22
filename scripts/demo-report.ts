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
import type { CheckResult } from '../src/core/result/check-result.ts';

/** A demo checked as `axletree check` checks it; `decisive` adds the search for decisive inputs (several seconds). */
export function demoResult(demo: string, decisive = false): CheckResult {
  const data = loadRulesData(defaultRulesDir());
  const p = prepareSpec(parse(readFileSync(new URL(`../specs/${demo}.yaml`, import.meta.url), 'utf8')), data);
  if (!p.ok) throw new Error(p.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('\n'));
  return runCheck(p.spec, p.entries, data, { decisive });
}

export function demoReportHtml(demo: string, decisive = false): string {
  const result = demoResult(demo, decisive);
  return renderHtml(reportDocument(result), drawReportPlots(result));
}
