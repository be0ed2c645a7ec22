import { describe, expect, it } from 'vitest';
import { sampleResult } from './fixtures/sample-result.ts';
import type { CheckResult } from '../src/core/result/check-result.ts';
import type { Finding } from '../src/core/findings/finding.ts';
import { SEVERITY_MEANING } from '../src/core/findings/severity.ts';
import { SHORT_CAUTION } from '../src/core/cautions.ts';
import { formatNumber, formatPercent, formatQuantity } from '../src/core/format/number-format.ts';
import { reportDocument } from '../src/render/model/report-document.ts';
import { sectionText } from '../src/render/cutting-text.ts';
import { inlineSvg, scopeClass } from '../src/render/inline-svg.ts';
import { settingOutSvg } from '../src/render/report-figures.ts';
import { htmlOf, markdownOf } from './support/report-outputs.ts';

/** The body lines of every fenced text block in a Markdown text. */
function fencedBlocks(md: string): string[] {
  return [...md.matchAll(/^(`{3,})text\n([\s\S]*?)\n\1$/gm)].map((m) => m[2]);
}

/** Data rows of the first Markdown table after a heading (or the nth, counting from 0). */
function tableAfter(md: string, heading: string, nth = 0): string[] {
  const start = md.indexOf(`\n${heading}\n`);
  expect(start, heading).toBeGreaterThan(0);
  const lines = md.slice(start).split('\n');
  let first = lines.findIndex((l) => l.startsWith('|'));
  for (let k = 0; k < nth; k++) {
    while (lines[first]?.startsWith('|')) first++;
    first = lines.findIndex((l, i) => i > first && l.startsWith('|'));
  }
  const rows: string[] = [];
  for (let i = first + 2; i < lines.length && lines[i].startsWith('|'); i++) rows.push(lines[i]);
  return rows;
}

/** The cells of a Markdown table row, escaped pipes kept inside their cell. */
const cellsOf = (row: string) => row.slice(2, -2).split(/ (?<!\\)\| /).map((c) => c.trim());

/** A note (info finding) added to the sample, which has none. */
function withNote(): CheckResult {
  const r = sampleResult();
  const note: Finding = {
    ...r.findings[0],
    rule: 'balance.axle-position',
    code: 2021,
    severity: 'info',
    subject: 'case.static',
    subject_label: 'standing, crew as placed',
    message: 'The loaded centre of mass stands forward of the axle.',
    utilisation: null,
    limit: null,
    working: [{ formula: 'x_g - x_a', substituted: '356 - 280', result: 76, unit: 'mm' }],
    working_text: 'x_g - x_a = 356 - 280 = 76 mm',
  };
  r.findings.push(note);
  return r;
}

function withHostileText(): CheckResult {
  const result = sampleResult();
  result.spec_name = 'Mine <script>alert("x")</script> ![p](http://example.com/p.png)';
  result.spec_as_checked.push({
    path: 'box.<img src="http://example.com/x.png" onerror="alert(1)">',
    value: '<b>bold</b>',
    unit: '',
    defaulted: false,
  });
  result.findings[1].message = '- not a list, <i>not</i> italic';
  result.findings[1].subject_label = '*crew* <u>aft</u> | braking';
  result.sources.push({ id: 'demo-note', citation: '12. not an ordered item', kind: 'from-memory' });
  return result;
}

describe('the report model', () => {
  it('keeps the parts in order: the summary (verdict and cautions first), the body, then the appendix with the sources last', () => {
    const sections = reportDocument(sampleResult()).sections;
    const ids = sections.map((s) => s.id);
    expect(ids.slice(0, 7)).toEqual(['verdict', 'cautions', 'utilisation', 'decisiveBrief', 'openQuestions', 'build', 'costs']);
    expect(sections.slice(0, 7).every((s) => s.part === 'summary')).toBe(true);
    const body = ['findings', 'figures', 'massBalance', 'cutList', 'leather', 'settingOut', 'stockPlan'];
    const appendix = ['working', 'notes', 'loadWorking', 'loads', 'cutListBasis', 'spec', 'sources'];
    const at = [...body, ...appendix].map((id) => ids.indexOf(id));
    expect(at.every((i) => i > 6)).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    for (const id of body) expect(sections[ids.indexOf(id)].part, id).toBeUndefined();
    for (const id of appendix) expect(sections[ids.indexOf(id)].part, id).toBe('appendix');
    expect(ids.at(-1)).toBe('sources');
  });

  it('refuses a result without cautions', () => {
    expect(() => reportDocument({ ...sampleResult(), cautions: ['  '] })).toThrow(/cautions/);
  });
});

describe('renderMarkdown', () => {
  const result = sampleResult();
  const md = markdownOf(result);

  it('opens with the title, the verdict and every caution before the findings table', () => {
    const tableStart = md.indexOf('| No. | Severity | Rule | Subject');
    expect(tableStart).toBeGreaterThan(0);
    expect(md.startsWith(`# Design-rule check: ${result.spec_name}`)).toBe(true);
    expect(md.indexOf('## Verdict: **FAIL**')).toBeLessThan(tableStart);
    for (const caution of result.cautions) {
      const at = md.indexOf(caution);
      expect(at, caution).toBeGreaterThan(0);
      expect(at).toBeLessThan(tableStart);
    }
  });

  it('ends with the one-line caution', () => {
    expect(md.trimEnd().endsWith(`*${SHORT_CAUTION}*`)).toBe(true);
  });

  it('says in one line what each severity means', () => {
    const rows = tableAfter(md, '## Verdict: **FAIL**');
    for (const [s, meaning] of Object.entries(SEVERITY_MEANING)) {
      expect(rows.find((r) => r.startsWith(`| **${s.toUpperCase()}** |`)), s).toContain(`| ${meaning} |`);
    }
  });

  it('lists graded findings by rule family in one table, numbered worst first, each with its subject in words, combination, load case and sources by number', () => {
    const rows = tableAfter(md, '## Findings by rule family').map(cellsOf);
    expect(rows).toHaveLength(4);
    const bySeverity = Object.fromEntries(rows.map((r) => [r[1], r[0]]));
    expect(bySeverity).toEqual({ '**FAIL**': '1', '**WARNING**': '2', '**ADVICE**': '3', '**PASS**': '4' });
    const warning = result.findings.find((f) => f.severity === 'warning')!;
    const numbers = warning.sources.map((id) => result.sources.findIndex((s) => s.id === id) + 1).sort((a, b) => a - b);
    expect(rows.find((r) => r[0] === '2')).toEqual([
      '2', '**WARNING**', warning.rule, warning.subject_label, formatQuantity(warning.value, warning.unit), formatQuantity(warning.limit, warning.unit),
      formatPercent(warning.utilisation), warning.combination ?? '', warning.load_case ?? '', numbers.join(', '),
    ]);
    // Within the table, a family's rows stand together.
    const families = rows.map((r) => r[2].split('.')[0]);
    expect(families.filter((f, i) => i === 0 || families[i - 1] !== f)).toEqual([...new Set(families)]);
  });

  it('shows notes apart and never counts them in the verdict line', () => {
    const r = withNote();
    const text = markdownOf(r);
    expect(text).toContain('\n4 graded findings: 0 error, 1 fail, 1 warning, 1 advice, 1 pass. 1 note informs without grading the build.');
    expect(tableAfter(text, '## Findings by rule family')).toHaveLength(4);
    const notes = tableAfter(text, '## Notes and their working').map(cellsOf);
    expect(notes).toHaveLength(1);
    expect(notes[0].slice(0, 5)).toEqual(['N1', '**INFO**', 'balance.axle-position', '2021', 'standing, crew as placed']);
    expect(text.indexOf('### N1. **INFO** balance.axle-position: standing, crew as placed')).toBeGreaterThan(text.indexOf('\n## Notes and their working\n'));
  });

  it('shows the working of every check, passes included, step by step, with its fix and its sources by id, in the appendix', () => {
    const appendix = md.indexOf('\n# Appendix: the working and the evidence\n');
    const workingStart = md.indexOf('\n## Working of every check\n');
    expect(appendix).toBeGreaterThan(md.indexOf('\n## Stock plan\n'));
    expect(workingStart).toBeGreaterThan(appendix);
    for (const f of result.findings) {
      const heading = md.indexOf(`**${f.severity.toUpperCase()}** ${f.rule}: ${f.subject_label}`, workingStart);
      expect(heading, f.rule).toBeGreaterThan(workingStart);
      const fence = md.indexOf('```text\n', heading);
      expect(md.slice(fence + '```text\n'.length).startsWith(f.working_text)).toBe(true);
      expect(md.indexOf(`**Fix:** ${f.fix}`, heading)).toBeGreaterThan(heading);
      expect(md.indexOf(`**Sources:** ${f.sources.join(', ')}`, heading)).toBeGreaterThan(heading);
    }
  });

  it('says under the findings table what each flagged finding says and what to do, and nothing of the passes', () => {
    const body = md.slice(md.indexOf('\n## Findings by rule family\n'), md.indexOf('\n## Key figures\n'));
    for (const f of result.findings) {
      const line = `**${f.severity.toUpperCase()}** ${f.rule}, ${f.subject_label}: ${f.message}`;
      if (f.severity === 'pass') expect(body, f.rule).not.toContain(line);
      else expect(body, f.rule).toContain(`${line} **Fix:** ${f.fix}`);
    }
  });

  it('writes a computed step with its result through the one formatter', () => {
    const r = withNote();
    expect(fencedBlocks(markdownOf(r))).toContain(`x_g - x_a = 356 - 280 = ${formatQuantity(76, 'mm')}`);
  });

  it('tables parts with totals, load cases and the spec with defaults marked, numbers through the one formatter', () => {
    const parts = tableAfter(md, '### Parts');
    expect(parts).toHaveLength(result.mass.parts.length + 3);
    expect(cellsOf(parts[0])[2]).toBe(formatNumber(result.mass.parts[0].mass_kg, 'kg'));
    expect(cellsOf(parts.at(-1)!)).toEqual(['**Total**', '', `**${formatNumber(result.mass.total_mass_kg, 'kg')}**`, '', '', '', '', '']);
    const cases = tableAfter(md, '### Load cases');
    expect(cases).toHaveLength(result.balance.cases.length);
    result.balance.cases.forEach((c, i) => expect(cellsOf(cases[i])[4]).toBe(formatNumber(c.pole_load_N, 'N')));
    const spec = tableAfter(md, '## Spec as checked');
    result.spec_as_checked.forEach((e, i) => expect(spec[i].includes('*default*')).toBe(e.defaulted));
  });

  it('puts the load cases\' working in the appendix', () => {
    const at = md.indexOf('\n## Working of the load cases\n');
    expect(at).toBeGreaterThan(md.indexOf('\n# Appendix: the working and the evidence\n'));
    for (const c of result.balance.cases) expect(md.indexOf(`#### Load case ${c.id}: ${c.title}`), c.id).toBeGreaterThan(at);
  });

  it('escapes pipes inside table cells', () => {
    const spec = tableAfter(md, '## Spec as checked');
    const row = spec.find((r) => r.includes('axle.x\\_mm'))!;
    expect(row).toContain('measured \\| estimated');
    // Five cells: six unescaped pipes.
    expect(row.match(/(?<!\\)\|/g)).toHaveLength(6);
  });

  it('lists every cited source by number and id with its catalogue entry, and says where the design basis is', () => {
    const rows = tableAfter(md, '## Sources').map(cellsOf);
    expect(rows.map((r) => r[0])).toEqual(result.sources.map((_s, i) => String(i + 1)));
    expect(rows.map((r) => r[1].replace(/\\/g, ''))).toEqual(result.sources.map((s) => s.id));
    result.sources.forEach((s, i) => expect(rows[i][2]).toContain(s.citation.slice(0, 20)));
    const section = md.slice(md.indexOf('\n## Sources\n'));
    expect(section).toContain('`docs/design-basis.md`');
  });

  it('keeps a working fence closed even when the working holds backticks', () => {
    const r = sampleResult();
    r.findings[1].working = [{ formula: 'step 1\n```\nnot the end', substituted: '', result: null, unit: '' }];
    expect(fencedBlocks(markdownOf(r))).toContain('step 1\n```\nnot the end');
  });

  it('escapes Markdown in user text, so it shows literally', () => {
    const hostile = markdownOf(withHostileText());
    expect(hostile).toContain('\n\\- not a list, \\<i\\>not\\</i\\> italic\n');
    expect(hostile).toContain('\\*crew\\* \\<u\\>aft\\</u\\> \\| braking');
    expect(hostile).toContain('\\!\\[p\\](http://example.com/p.png)');
    expect(hostile).not.toContain('![p](');
  });
});

describe('renderHtml', () => {
  const result = sampleResult();
  const html = htmlOf(result);

  it('is one self-contained file', () => {
    expect(html).toMatch(/^<!doctype html>/);
    expect(html).toContain('<style>');
    expect(html).toContain(`<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'">`);
    expect(html).not.toContain('<link');
    expect(html).not.toMatch(/src="http/);
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/url\((?!#)/); // only references inside the page (SVG markers)
    expect(html).not.toMatch(/href="(?!#)/); // links only to anchors in the page
  });

  it('puts the verdict, what each severity means and the cautions before the first table of findings', () => {
    const firstTable = html.indexOf('<table class="highest-utilisations">');
    expect(html.indexOf('<table class="severities">')).toBeLessThan(firstTable);
    expect(firstTable).toBeGreaterThan(0);
    expect(html.indexOf('Verdict:')).toBeLessThan(firstTable);
    for (const caution of result.cautions) {
      const escaped = caution.replace(/"/g, '&quot;');
      const at = html.indexOf(escaped);
      expect(at, caution).toBeGreaterThan(0);
      expect(at).toBeLessThan(firstTable);
    }
  });

  it('shows severity as a coloured badge with the word, and what each severity means', () => {
    expect(html).toContain('<h2 class="verdict">Verdict: <strong class="badge badge-fail">FAIL</strong></h2>');
    for (const s of ['fail', 'warning', 'advice', 'pass']) {
      expect(html).toContain(`<strong class="badge badge-${s}">${s.toUpperCase()}</strong>`);
      expect(html).toMatch(new RegExp(`\\.badge-${s} \\{ background: #[0-9A-F]{6}`));
    }
    for (const meaning of Object.values(SEVERITY_MEANING)) expect(html).toContain(`<td>${meaning}</td>`);
  });

  it('prints on A4 with big sections on new pages', () => {
    expect(html).toContain('size: A4');
    expect(html).toContain('@media print');
    // The body and the appendix each start a printed page, under their titles; the summary before them stands alone.
    expect(html).toContain('.part-body, .part-appendix { break-before: page; }');
    expect(html).toContain('<div class="part part-summary">\n<section>\n<h2 class="verdict">');
    expect(html).toContain('<div class="part part-body">\n<h1 class="part">The check in detail</h1>\n<section>\n<h2>Findings by rule family</h2>');
    expect(html).toContain('<div class="part part-appendix">\n<h1 class="part">Appendix: the working and the evidence</h1>\n<section>\n<h2>Working of every check</h2>');
    expect(html).toContain('<h2 class="cautions">Cautions</h2>');
    // Table heads repeat on every printed page; no table is kept whole on one page.
    expect(html).toContain('thead { display: table-header-group; }');
    expect(html).not.toMatch(/(^|[\s,])(table|tbody)\s*\{[^}]*break-inside: avoid/m);
  });

  it('shows the working as steps, and links a finding\'s sources to their entries', () => {
    const r = withNote();
    const out = htmlOf(r);
    expect(out).toContain(`<li><span>x_g - x_a</span> = <span>356 - 280</span> = <span class="result">${formatQuantity(76, 'mm')}</span></li>`);
    for (const [i, s] of r.sources.entries()) {
      expect(out).toContain(`<tr id="source-${s.id}">`);
      // By id in the working, by number in the findings table.
      expect(out).toContain(`<a href="#source-${s.id}">${s.id}</a>`);
      if (r.findings.some((f) => f.severity !== 'info' && f.sources.includes(s.id))) expect(out).toContain(`<a href="#source-${s.id}">${i + 1}</a>`);
    }
  });

  it('escapes HTML and Markdown in user text', () => {
    const hostile = htmlOf(withHostileText());
    expect(hostile).not.toMatch(/<script/i);
    expect(hostile).not.toContain('<img');
    expect(hostile).not.toContain('<b>');
    expect(hostile).not.toContain('<u>');
    expect(hostile).not.toMatch(/src="http/);
    expect(hostile).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;');
    expect(hostile).toContain('<title>Design-rule check: Mine &lt;script&gt;');
    expect(hostile).toContain('![p](http://example.com/p.png)');
    expect(hostile).toContain('&lt;b&gt;bold&lt;/b&gt;');
    expect(hostile).toContain('<p>- not a list, &lt;i&gt;not&lt;/i&gt; italic</p>');
    expect(hostile).toContain('<td>*crew* &lt;u&gt;aft&lt;/u&gt; | braking</td>');
    expect(hostile).toContain('<td>12. not an ordered item</td>');
    expect(hostile).not.toMatch(/<ol[^>]*>\s*<li>not an ordered item/);
  });

  it('keeps a pipe in a cell as a literal pipe', () => {
    expect(html).toContain('<td>measured | estimated from drawing</td>');
  });

  it('refuses a result without cautions', () => {
    expect(() => htmlOf({ ...result, cautions: ['  '] })).toThrow(/cautions/);
  });
});

describe('report, cutting sections', () => {
  const result = sampleResult();
  const md = markdownOf(result);
  const html = htmlOf(result);
  const { cut_list, leather, setting_out, stock_plan } = result.cutting;

  it('has the cut list, leather, setting-out and stock plan sections in order, before the spec', () => {
    const at = ['## Cut list', '## Leather and rawhide', '## Wheel setting-out', '## Stock plan', '## Spec as checked'].map((h) => md.indexOf(`\n${h}\n`));
    expect(at.every((i) => i > 0)).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    expect(html).toContain('<h2>Stock plan</h2>');
  });

  it('gives the cut list densely, a line a part: sizes, count, the stock it is cut from and its allowances by key, each allowance with its source', () => {
    const rows = tableAfter(md, '## Cut list').map(cellsOf);
    expect(rows).toHaveLength(cut_list.length);
    const keys = tableAfter(md, '## Cut list', 1).map(cellsOf);
    cut_list.forEach((c, i) => {
      const r = rows[i];
      expect(r.slice(0, 4)).toEqual([c.part, c.species, String(c.quantity), String(c.spares)]);
      expect(r[5]).toBe([c.rough.length_mm, c.rough.width_mm, c.rough.thickness_mm].map((v) => formatNumber(v, 'mm')).join(' x '));
      // Each of the part's allowances is in the key under a letter the row names.
      const named = r[7].split(', ').map((k) => keys.find((x) => x[0] === k)!);
      expect(named.map((k) => k[1]).sort()).toEqual(c.allowances.map((a) => a.what).sort());
      // The stock it is cut from: the group and the stock lengths its patterns use.
      const group = stock_plan.groups.findIndex((g) => g.plan.patterns.some((p) => p.cuts.some((x) => x.label === c.part)));
      if (group >= 0) expect(r[6]).toMatch(new RegExp(`^group ${group + 1}: `));
    });
    // A value the specification gives is said to come from it; a data value by its sources' numbers.
    const form = keys.find((k) => k[1] === 'bending-form ends');
    const at = result.sources.findIndex((s) => s.id === 'from-memory');
    // A source the result does not list is named by its id, with no number to find.
    if (form) expect(form[4]).toBe(at < 0 ? 'from-memory' : String(at + 1));
    expect(keys.find((k) => k[1] === 'faces')![4]).toMatch(/^specification/);
  });

  it('tables every part with its rough size and a total in the appendix, and every strap and hide', () => {
    const rows = tableAfter(md, '## Cut list in full: grain, volume, mass and the working of each size');
    expect(rows).toHaveLength(cut_list.length + 1);
    const axle = cut_list.find((c) => c.part === 'axle')!;
    const rough = [axle.rough.length_mm, axle.rough.width_mm, axle.rough.thickness_mm].map((v) => formatNumber(v, 'mm')).join(' x ');
    expect(cellsOf(rows.find((r) => r.startsWith('| axle |'))!)[5]).toBe(rough);
    expect(rows.at(-1)).toContain('**Total: rough volume with spares');
    expect(tableAfter(md, '### Straps and lashings')).toHaveLength(leather.items.length);
    expect(tableAfter(md, '### Hides to buy')[0]).toContain(`| ${leather.hides[0].hides} |`);
  });

  it('links the setting-out drawing in Markdown and puts it inline in HTML', () => {
    expect(md).toContain('![Wheel setting-out drawing](wheel-setting-out.svg)');
    expect(html).toContain(`<figure class="setting-out"><svg class="${scopeClass(settingOutSvg(result))}"`);
    expect(html).not.toContain('<img');
    const row = tableAfter(md, '## Wheel setting-out').find((r) => r.includes('between shoulders'))!;
    expect(cellsOf(row)).toEqual(['Spoke length between shoulders', formatNumber(setting_out.spoke_length_shoulders_mm, 'mm'), 'mm']);
  });

  it('does not inline a drawing that holds a script or an outside link', () => {
    for (const svg of ['<svg><script>alert(1)</script></svg>', '<svg><image href="http://example.com/x.png"/></svg>', '<svg onload="alert(1)"></svg>', 'not svg']) {
      expect(inlineSvg(svg), svg).toBeNull();
    }
    expect(inlineSvg('<svg><circle r="1"/></svg>')).toMatch(/^<svg class="axletree-/);
  });

  it('shows each group with its bound and gap, and each pattern as a text bar in Markdown', () => {
    const groups = tableAfter(md, '## Stock plan');
    expect(groups).toHaveLength(stock_plan.groups.length + 1);
    expect(groups.at(-1)).toContain('**All groups**');
    stock_plan.groups.forEach((g, i) => {
      expect(groups[i]).toContain(formatNumber(g.plan.lower_bound, 'currency'));
      expect(groups[i]).toContain(formatPercent(g.plan.gap));
      const heading = `### Group ${i + 1}: ${g.species}, ${sectionText(g.section)} mm`;
      expect(tableAfter(md, heading)).toHaveLength(g.plan.patterns.length);
      // One bar line per pattern, with as many part runs as cuts, in the block after the patterns.
      const bars = fencedBlocks(md.slice(md.indexOf(heading)))[0];
      const lines = bars.split('\n').filter((l) => /^\d+\.\d+ /.test(l));
      expect(lines).toHaveLength(g.plan.patterns.length);
      lines.forEach((l, k) => expect(l.split('|').length - 2).toBe(g.plan.patterns[k].cuts.length));
    });
    expect(tableAfter(md, '### Parts no listed stock serves')[0]).toContain(stock_plan.unserved[0].part);
  });

  it('draws each pattern as an inline SVG bar in HTML, one rectangle per cut and one for the offcut', () => {
    const svgs = [...html.matchAll(/<svg [^>]*class="axletree-drawing-[0-9a-z]+ stock-bar"[\s\S]*?<\/svg>/g)].map((m) => m[0]);
    const patterns = stock_plan.groups.flatMap((g) => g.plan.patterns);
    expect(svgs).toHaveLength(patterns.length);
    svgs.forEach((svg, i) => {
      const p = patterns[i];
      expect(svg.match(/<rect /g)).toHaveLength(p.cuts.length + (p.offcut_mm > 0 ? 1 : 0));
      expect(svg).toContain(`<title>offcut: ${formatNumber(p.offcut_mm, 'mm')} mm</title>`);
    });
    expect(html).not.toContain('```');
  });

  it('escapes part labels inside the SVG bars', () => {
    const r = sampleResult();
    r.cutting.stock_plan.groups[0].plan.patterns[0].cuts[0].label = '<script>x</script> & "q"';
    const out = htmlOf(r);
    expect(out).not.toMatch(/<script/i);
    expect(out).toContain('&#60;script&#62;x&#60;/script&#62; &#38; &#34;q&#34;');
  });
});

describe('what the result cannot vouch for', () => {
  it('a provisional verdict says why before the findings, and figures not reached are named with their reason', () => {
    const r: CheckResult = {
      ...sampleResult(),
      provisional: ["the stone's dynamic factors are the data's bound, not the ride model's"],
      figures_not_applicable: { ride_decay_cycles: 'the motion never falls below 10 % within the run' },
    };
    const md = markdownOf(r);
    const verdictAt = md.indexOf('Provisional verdict.');
    expect(verdictAt).toBeGreaterThan(0);
    expect(verdictAt).toBeLessThan(md.indexOf("the stone's dynamic factors are the data's bound"));
    expect(md.indexOf("the stone's dynamic factors")).toBeLessThan(md.indexOf('\n## Findings'));
    expect(md).toContain('| ride\\_decay\\_cycles | the motion never falls below 10 % within the run |');
    expect(htmlOf(r)).toContain('Provisional verdict.');
  });

  it('a verdict resting on the models says nothing provisional', () => {
    const r: CheckResult = { ...sampleResult(), provisional: [], figures_not_applicable: {} };
    expect(markdownOf(r)).not.toContain('Provisional');
    expect(markdownOf(r)).not.toContain('Figure not given');
  });
});

describe('numbers a model could not reach', () => {
  it('a table cell holds none, never NaN or Infinity', async () => {
    const { numberCell } = await import('../src/render/model/cells.ts');
    expect(numberCell(Number.NaN, 'mm')).toMatchObject({ value: null });
    expect(numberCell(Number.POSITIVE_INFINITY, 'N')).toMatchObject({ value: null });
    expect(numberCell(12.5, 'mm')).toMatchObject({ value: 12.5 });
  });
});
