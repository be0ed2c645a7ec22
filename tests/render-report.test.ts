import { describe, expect, it } from 'vitest';
import { renderMarkdown } from '../src/render/report-md.ts';
/** The sample result has neither ride nor plots: nothing to draw. */
const NO_PLOTS = new Map<string, string>();
import { renderHtml } from '../src/render/report-html.ts';
import { sampleResult } from './fixtures/sample-result.ts';
import type { CheckResult } from '../src/core/result/check-result.ts';
import { SHORT_CAUTION } from '../src/core/cautions.ts';
import { formatNumber, formatPercent } from '../src/render/number-format.ts';
import { sectionText } from '../src/render/cutting-text.ts';
import { inlineSvg, scopeClass } from '../src/render/inline-svg.ts';
import { settingOutSvg } from '../src/render/report-figures.ts';

/** The body lines of every fenced block in a Markdown text. */
function fencedBlocks(md: string): string[] {
  return [...md.matchAll(/^(`{3,})text\n([\s\S]*?)\n\1$/gm)].map((m) => m[2]);
}

/** Data rows of the first Markdown table after a heading. */
function tableAfter(md: string, heading: string): string[] {
  const start = md.indexOf(`\n${heading}\n`);
  const lines = md.slice(start).split('\n');
  const first = lines.findIndex((l) => l.startsWith('|'));
  const rows: string[] = [];
  for (let i = first + 2; i < lines.length && lines[i].startsWith('|'); i++) rows.push(lines[i]);
  return rows;
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
  result.sources.push({ id: 'demo-note', citation: '12. not an ordered item', kind: 'from-memory' });
  return result;
}

describe('renderMarkdown', () => {
  const result = sampleResult();
  const md = renderMarkdown(result);

  it('opens with the title, the verdict and every caution before the findings table', () => {
    const tableStart = md.indexOf('| # | Severity');
    expect(tableStart).toBeGreaterThan(0);
    expect(md.startsWith(`# Design-rule check: ${result.spec_name}`)).toBe(true);
    expect(md.indexOf('Verdict: **FAIL**')).toBeLessThan(tableStart);
    for (const caution of result.cautions) {
      const at = md.indexOf(caution);
      expect(at, caution).toBeGreaterThan(0);
      expect(at).toBeLessThan(tableStart);
    }
  });

  it('ends with the one-line caution', () => {
    expect(md.trimEnd().endsWith(`*${SHORT_CAUTION}*`)).toBe(true);
  });

  it('lists findings worst first', () => {
    const rows = tableAfter(md, '## Findings');
    expect(rows.map((r) => r.split('|')[2].trim())).toEqual(['**FAIL**', '**WARNING**', '**ADVICE**', '**PASS**']);
  });

  it('shows the working of every flagged finding in a fenced block, and not of passes', () => {
    const blocks = fencedBlocks(md);
    const workingStart = md.indexOf('## Working of flagged findings');
    for (const f of result.findings) {
      const heading = md.indexOf(`**${f.severity.toUpperCase()}** ${f.rule}: ${f.subject}`, workingStart);
      if (f.severity === 'pass') {
        expect(heading, f.rule).toBe(-1);
        expect(blocks).not.toContain(f.working_text);
      } else {
        expect(heading, f.rule).toBeGreaterThan(workingStart);
        const fence = md.indexOf('```text\n', heading);
        expect(md.slice(fence + '```text\n'.length).startsWith(f.working_text)).toBe(true);
        expect(md.indexOf(f.fix, heading)).toBeGreaterThan(heading);
      }
    }
  });

  it('tables parts, load cases and the spec with defaults marked', () => {
    const parts = tableAfter(md, '### Parts');
    expect(parts).toHaveLength(result.mass.parts.length + 3);
    expect(parts[0]).toContain(result.mass.parts[0].mass_kg.toFixed(3));
    const cases = tableAfter(md, '### Load cases');
    expect(cases).toHaveLength(result.balance.cases.length);
    result.balance.cases.forEach((c, i) => expect(cases[i]).toContain(c.pole_load_N.toFixed(1)));
    const spec = tableAfter(md, '## Spec as checked');
    result.spec_as_checked.forEach((e, i) => expect(spec[i].includes('*default*')).toBe(e.defaulted));
  });

  it('escapes pipes inside table cells', () => {
    const spec = tableAfter(md, '## Spec as checked');
    const row = spec.find((r) => r.includes('axle.x\\_mm'))!;
    expect(row).toContain('measured \\| estimated');
    // Five cells: six unescaped pipes.
    expect(row.match(/(?<!\\)\|/g)).toHaveLength(6);
  });

  it('lists the sources by id with their citations', () => {
    result.sources.forEach((s) => expect(md).toContain(`\n- **${s.id}**: ${s.citation}`));
  });

  it('keeps a working fence closed even when the working holds backticks', () => {
    const r = sampleResult();
    r.findings[1].working_text = 'step 1\n```\nnot the end';
    const blocks = fencedBlocks(renderMarkdown(r));
    expect(blocks).toContain(r.findings[1].working_text);
  });
});

describe('renderHtml', () => {
  const result = sampleResult();
  const html = renderHtml(result, NO_PLOTS);

  it('is one self-contained file', () => {
    expect(html).toMatch(/^<!doctype html>/);
    expect(html).toContain('<style>');
    expect(html).not.toContain('<link');
    expect(html).not.toMatch(/src="http/);
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/url\((?!#)/); // only references inside the page (SVG markers)
  });

  it('puts the verdict and the cautions before the first table', () => {
    const firstTable = html.indexOf('<table');
    expect(firstTable).toBeGreaterThan(0);
    expect(html.indexOf('Verdict:')).toBeLessThan(firstTable);
    for (const caution of result.cautions) {
      const escaped = caution.replace(/"/g, '&quot;');
      const at = html.indexOf(escaped);
      expect(at, caution).toBeGreaterThan(0);
      expect(at).toBeLessThan(firstTable);
    }
  });

  it('shows severity as a coloured badge with the word', () => {
    expect(html).toContain('<h2 class="verdict">Verdict: <strong class="badge badge-fail">FAIL</strong></h2>');
    for (const s of ['fail', 'warning', 'advice', 'pass']) {
      expect(html).toContain(`<strong class="badge badge-${s}">${s.toUpperCase()}</strong>`);
      expect(html).toMatch(new RegExp(`\\.badge-${s} \\{ background: #[0-9A-F]{6}`));
    }
  });

  it('prints on A4 with big sections on new pages', () => {
    expect(html).toContain('size: A4');
    expect(html).toContain('@media print');
    expect(html).toContain('<h2 class="new-page">Working of flagged findings</h2>');
    expect(html).toContain('<h2 class="new-page">Sources</h2>');
    expect(html).toContain('<h2 class="cautions">Cautions</h2>');
  });

  it('escapes HTML and Markdown in user text', () => {
    const hostile = renderHtml(withHostileText(), NO_PLOTS);
    expect(hostile).not.toMatch(/<script/i);
    expect(hostile).not.toContain('<img');
    expect(hostile).not.toContain('<b>');
    expect(hostile).not.toMatch(/src="http/);
    expect(hostile).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;');
    expect(hostile).toContain('<title>Design-rule check: Mine &lt;script&gt;');
    expect(hostile).toContain('![p](http://example.com/p.png)');
    expect(hostile).toContain('&lt;b&gt;bold&lt;/b&gt;');
    expect(hostile).toContain('<p>- not a list, &lt;i&gt;not&lt;/i&gt; italic</p>');
    expect(hostile).toContain('12. not an ordered item');
    expect(hostile).not.toMatch(/<ol[^>]*>\s*<li>not an ordered item/);
  });

  it('renders an escaped pipe as a literal pipe inside its cell', () => {
    expect(html).toContain('<td>measured | estimated from drawing</td>');
  });

  it('refuses a result without cautions', () => {
    expect(() => renderHtml({ ...result, cautions: ['  '] }, NO_PLOTS)).toThrow(/cautions/);
  });
});

describe('report, cutting sections', () => {
  const result = sampleResult();
  const md = renderMarkdown(result);
  const html = renderHtml(result, NO_PLOTS);
  const { cut_list, leather, setting_out, stock_plan } = result.cutting;

  it('has the cut list, leather, setting-out and stock plan sections in order, before the spec', () => {
    const at = ['## Cut list', '## Leather and rawhide', '## Wheel setting-out', '## Stock plan', '## Spec as checked'].map((h) => md.indexOf(`\n${h}\n`));
    expect(at.every((i) => i > 0)).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    expect(html).toContain('<h2 class="new-page">Stock plan</h2>');
  });

  it('tables every part with its rough size, and every strap and hide', () => {
    const rows = tableAfter(md, '## Cut list');
    expect(rows).toHaveLength(cut_list.length);
    const axle = cut_list.find((c) => c.part === 'axle')!;
    expect(rows.find((r) => r.startsWith('| axle |'))).toContain(`${axle.rough.length_mm.toFixed(1)} x ${axle.rough.width_mm.toFixed(1)} x ${axle.rough.thickness_mm.toFixed(1)}`);
    expect(tableAfter(md, '### Straps and lashings')).toHaveLength(leather.items.length);
    expect(tableAfter(md, '### Hides to buy')[0]).toContain(`| ${leather.hides[0].hides} |`);
  });

  it('links the setting-out drawing in Markdown and puts it inline in HTML', () => {
    expect(md).toContain('![Wheel setting-out drawing](wheel-setting-out.svg)');
    expect(html).toContain(`<span class="setting-out"><svg class="${scopeClass(settingOutSvg(result))}"`);
    expect(html).not.toContain('<img');
    expect(tableAfter(md, '## Wheel setting-out').find((r) => r.includes('between shoulders'))).toContain(setting_out.spoke_length_shoulders_mm.toFixed(1));
  });

  it('does not inline a drawing that holds a script or an outside link', () => {
    for (const svg of ['<svg><script>alert(1)</script></svg>', '<svg><image href="http://example.com/x.png"/></svg>', '<svg onload="alert(1)"></svg>', 'not svg']) {
      expect(inlineSvg(svg), svg).toBeNull();
    }
    expect(inlineSvg('<svg><circle r="1"/></svg>')).toMatch(/^<svg class="axletree-/);
  });

  it('shows each group with its bound and gap, and each pattern as a text bar in Markdown', () => {
    const groups = tableAfter(md, '## Stock plan');
    expect(groups).toHaveLength(stock_plan.groups.length);
    stock_plan.groups.forEach((g, i) => {
      expect(groups[i]).toContain(formatNumber(g.plan.lower_bound, 'currency'));
      expect(groups[i]).toContain(formatPercent(g.plan.gap));
      expect(tableAfter(md, `### Group ${i + 1}: ${g.species}, ${sectionText(g.section)} mm`)).toHaveLength(g.plan.patterns.length);
    });
    const bars = [...md.matchAll(/^```stock-bars (\d+)\n([\s\S]*?)\n```$/gm)];
    expect(bars.map((m) => Number(m[1]))).toEqual(stock_plan.groups.map((_g, i) => i));
    // One bar line per pattern, with as many part runs as cuts.
    const first = stock_plan.groups[0].plan.patterns;
    const lines = bars[0][2].split('\n').filter((l) => /^\d+\.\d+ /.test(l));
    expect(lines).toHaveLength(first.length);
    lines.forEach((l, k) => expect(l.split('|').length - 2).toBe(first[k].cuts.length));
    expect(tableAfter(md, '### Parts no listed stock serves')[0]).toContain(stock_plan.unserved[0].part);
  });

  it('draws each pattern as an inline SVG bar in HTML, one rectangle per cut and one for the offcut', () => {
    const svgs = [...html.matchAll(/<svg [^>]*class="stock-bar"[\s\S]*?<\/svg>/g)].map((m) => m[0]);
    const patterns = stock_plan.groups.flatMap((g) => g.plan.patterns);
    expect(svgs).toHaveLength(patterns.length);
    svgs.forEach((svg, i) => {
      const p = patterns[i];
      expect(svg.match(/<rect /g)).toHaveLength(p.cuts.length + (p.offcut_mm > 0 ? 1 : 0));
      expect(svg).toContain(`<title>offcut: ${formatNumber(p.offcut_mm, 'mm')} mm</title>`);
    });
    expect(html).not.toContain('```stock-bars');
  });

  it('escapes part labels inside the SVG bars', () => {
    const r = sampleResult();
    r.cutting.stock_plan.groups[0].plan.patterns[0].cuts[0].label = '<script>x</script> & "q"';
    const out = renderHtml(r, NO_PLOTS);
    expect(out).not.toMatch(/<script/i);
    expect(out).toContain('&#60;script&#62;x&#60;/script&#62; &#38; &#34;q&#34;');
  });
});
