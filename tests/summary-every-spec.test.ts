// The feasibility summary (summary.html, and the opening of report.html) is
// written for every specification shipped: the demos and the validation set.
// The ride model is left out here to keep the run short; the browser test
// prints the demo's summary with it.
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { summaryDocument } from '../src/render/model/summary-document.ts';
import { reportDocument } from '../src/render/model/report-document.ts';
import { teachDocument } from '../src/render/model/teach-document.ts';
import { renderHtml } from '../src/render/html/render-html.ts';
import { renderMarkdown } from '../src/render/markdown/render-markdown.ts';
import { familyId } from '../src/render/model/rule-families.ts';
import { rulesData } from './support/fixtures.ts';
import { NO_PLOTS } from './support/report-outputs.ts';

const dirs = ['../specs/', '../specs/validation/'].map((d) => new URL(d, import.meta.url));
const specs = dirs.flatMap((d) => readdirSync(d).filter((f) => f.endsWith('.yaml')).map((f) => new URL(f, d)));

describe('the feasibility summary, for every specification shipped', () => {
  it('finds the demos and the validation set', () => {
    expect(specs.length).toBeGreaterThanOrEqual(9);
  });

  for (const url of specs) {
    const name = url.pathname.split('/specs/')[1];
    it(name, () => {
      const p = prepareSpec(parse(readFileSync(url, 'utf8')), rulesData);
      if (!p.ok) throw new Error(`${name} does not prepare`);
      const result = runCheck(p.spec, p.entries, rulesData, { ride: false });
      const doc = summaryDocument(result);
      const html = renderHtml(doc, NO_PLOTS);
      const md = renderMarkdown(doc);
      // The verdict with its badge, what every severity means, every caution, the nearest findings, the drawing, the cost.
      expect(html).toContain(`<h2 class="verdict">Verdict: <strong class="badge badge-${result.verdict}">${result.verdict.toUpperCase()}</strong></h2>`);
      for (const meaning of Object.values(result.severity_meanings)) expect(html).toContain(`<td>${meaning}</td>`);
      for (const c of result.cautions) expect(md).toContain(c.replace(/"/g, '"'));
      expect(doc.sections.map((s) => s.id)).toEqual(['verdict', 'cautions', 'utilisation', 'decisiveBrief', 'openQuestions', 'build', 'costs']);
      expect(html).toContain('<table class="highest-utilisations">');
      expect(html).toMatch(/<figure class="drawing"><svg /);
      expect(html).toContain('<table class="costs">');
      // The search for decisive inputs did not run here, and the summary says so rather than staying silent.
      expect(md).toContain('was not run (check --no-decisive)');
      // Each default the check took is named in the open questions, under its group.
      for (const e of result.spec_as_checked.filter((x) => x.defaulted).slice(0, 1)) expect(md).toContain(e.path.split(/[.[]/)[0]);
      // report.html opens with the same sections.
      expect(reportDocument(result).sections.slice(0, doc.sections.length)).toEqual(doc.sections);
      // The teaching view covers every rule family that gave a finding, each worked from this build.
      const teach = renderMarkdown(teachDocument(result));
      for (const family of new Set(result.findings.map((f) => familyId(f.rule)))) expect(teach, family).toMatch(new RegExp(`### .*\\(${family}\\)\\n`));
      for (const c of result.cautions) expect(teach).toContain(c.replace(/"/g, '"'));
    }, 60_000);
  }
});
