import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { BrowserContext, Page } from 'playwright-core';
import { CHROMIUM, hasChromium, launchChromium } from '../scripts/headless-chromium.ts';
import { demoResult } from '../scripts/demo-report.ts';
import { reportDocument } from '../src/render/model/report-document.ts';
import { summaryDocument } from '../src/render/model/summary-document.ts';
import { withoutAppendix } from '../src/render/model/parts.ts';
import { renderHtml } from '../src/render/html/render-html.ts';
import { drawReportPlots } from '../src/render/report-plots.ts';

// The demo's HTML report laid out and printed by a real browser: every figure
// is there with a size, no text runs outside its figure, the first printed
// page carries the verdict, what each severity means and what decides the
// verdict, the report before its appendix prints on at most twelve A4 pages
// and the summary on at most two. Skipped, saying why, only where no browser
// is installed (.ci/run installs Debian's chromium).

/** The most A4 pages the report may take before its appendix, and the summary in all. */
const BODY_PAGES = 12;
const SUMMARY_PAGES = 2;

/** A4 less the page margins of the style sheet (15 mm top and bottom, 12 mm each side), in CSS pixels at 96 to the inch. */
const MM = 96 / 25.4;
const PRINTED = { width: Math.floor((210 - 2 * 12) * MM), height: Math.floor((297 - 2 * 15) * MM) };

/** The pages of a PDF as Chromium writes it: one page object each (the page tree's own object is /Pages). */
function pageCount(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-z])/g) ?? []).length;
}

const browser = hasChromium();
if (!browser) console.warn(`report-browser.test: skipped, no browser at ${CHROMIUM}; install Debian's chromium package (apt-get install chromium) to run it.`);

interface Laid {
  cls: string;
  width: number;
  height: number;
  /** Text that pokes out of the figure's box, by more than half a pixel. */
  overflow: string[];
}

describe.skipIf(!browser)('the HTML report in headless Chromium', () => {
  const dir = mkdtempSync(join(tmpdir(), 'axletree-report-browser-'));
  let html = '';
  let bodyHtml = '';
  let summaryHtml = '';
  let context: BrowserContext;
  let page: Page;

  /** A page's A4 PDF, as `check --pdf` prints it. */
  async function printed(source: string): Promise<Buffer> {
    const p = await context.newPage();
    try {
      await p.setContent(source, { waitUntil: 'load' });
      return await p.pdf({ format: 'A4', preferCSSPageSize: true, printBackground: true });
    } finally {
      await p.close();
    }
  }

  beforeAll(async () => {
    // The check as the command runs it, the search for decisive inputs included (several seconds).
    const result = demoResult('demo-two-crew', true);
    const plots = drawReportPlots(result);
    const doc = reportDocument(result);
    html = renderHtml(doc, plots);
    // The report a reviewer prints: everything before the appendix, laid out as in the whole report.
    bodyHtml = renderHtml({ ...doc, sections: withoutAppendix(doc.sections) }, plots);
    summaryHtml = renderHtml(summaryDocument(result), plots);
    const file = join(dir, 'report.html');
    writeFileSync(file, html);
    context = await launchChromium();
    page = await context.newPage();
    await page.goto(pathToFileURL(file).href);
  }, 180_000);
  afterAll(async () => {
    await context?.close();
  });

  it('lays out every figure with a size, no text outside it', async () => {
    const laid: Laid[] = await page.evaluate(() =>
      [...document.querySelectorAll('svg')].map((svg) => {
        const box = svg.getBoundingClientRect();
        const overflow = [...svg.querySelectorAll('text')].flatMap((t) => {
          const r = t.getBoundingClientRect();
          const out = r.left < box.left - 0.5 || r.right > box.right + 0.5 || r.top < box.top - 0.5 || r.bottom > box.bottom + 0.5;
          return out ? [t.textContent ?? ''] : [];
        });
        return { cls: svg.getAttribute('class') ?? '', width: box.width, height: box.height, overflow };
      }),
    );
    // As many figures laid out as the file holds.
    expect(laid).toHaveLength(html.match(/<svg[\s>]/g)!.length);
    expect(laid.length).toBeGreaterThanOrEqual(4); // the three drawings of the build and the wheel setting-out at least
    // The plots: load per horse, the turn over speed, three per ride case.
    expect(laid.filter((f) => /\bchart\b/.test(f.cls))).toHaveLength(2 + 3 * 5); // five ride cases
    for (const f of laid) {
      expect(f.width, f.cls).toBeGreaterThan(0);
      expect(f.height, f.cls).toBeGreaterThan(0);
      expect(f.overflow, f.cls).toEqual([]);
    }
  });

  it("paints every figure as its own SVG says: no drawing's style sheet or the page's reaches another figure", async () => {
    const mismatches: string[] = await page.evaluate(() =>
      [...document.querySelectorAll('svg [stroke], svg text[font-size]')].flatMap((e) => {
        const style = getComputedStyle(e);
        const want = e.getAttribute('stroke');
        // An attribute is a presentation hint: a leaked style rule would override it.
        const probe = document.createElement('span');
        probe.style.color = want ?? '';
        document.body.append(probe);
        const wantColour = getComputedStyle(probe).color;
        probe.remove();
        const bad = (want && want !== 'none' && !want.startsWith('url') && style.stroke !== wantColour) || (e.getAttribute('font-size') && style.fontSize !== e.getAttribute('font-size'));
        return bad ? [`${e.tagName} ${want ?? ''} ${style.stroke} ${e.getAttribute('font-size') ?? ''} ${style.fontSize}`] : [];
      }),
    );
    expect(mismatches.slice(0, 5)).toEqual([]);
  });

  it('opens with the summary: the verdict, the cautions, the nearest findings, what decides the verdict, the open questions, then the side elevation', async () => {
    const order: string[] = await page.evaluate(() =>
      [...document.querySelectorAll('main h2, main svg[data-origin]')].map((e) => (e.tagName.toLowerCase() === 'h2' ? `h2 ${e.textContent}` : `svg ${e.querySelector('text.title')?.textContent}`)),
    );
    expect(order.slice(0, 5)).toEqual([expect.stringMatching(/^h2 Verdict: /), 'h2 Cautions', 'h2 Nearest to their limits', 'h2 What decides the verdict', 'h2 Open questions for the builder']);
    expect(order[5]).toBe('h2 The build');
    expect(order[6]).toMatch(/^svg Side elevation, scale 1:\d+ on A4/);
  });

  it('carries the verdict, what each severity means and the decisive inputs on the first printed page', async () => {
    // Laid out as printed: the page's width and the print style; nothing before these forces a page break.
    const p = await context.newPage();
    try {
      await p.setViewportSize(PRINTED);
      await p.emulateMedia({ media: 'print' });
      await p.setContent(summaryHtml, { waitUntil: 'load' });
      const bottoms: Record<string, number> = await p.evaluate(() => {
        const bottom = (css: string) => {
          const e = document.querySelector(css);
          return e ? e.getBoundingClientRect().bottom + window.scrollY : Infinity;
        };
        return { verdict: bottom('h2.verdict'), legend: bottom('table.severities'), decisive: bottom('table.decisive-brief') };
      });
      for (const [what, at] of Object.entries(bottoms)) expect(at, what).toBeLessThanOrEqual(PRINTED.height);
      // The legend names every severity; the decisive table has rows.
      expect(await p.locator('table.severities tbody tr').count()).toBe(6);
      expect(await p.locator('table.decisive-brief tbody tr').count()).toBeGreaterThan(0);
    } finally {
      await p.close();
    }
  });

  it(`prints the report before its appendix on at most ${BODY_PAGES} A4 pages, the summary on at most ${SUMMARY_PAGES}, and the appendix after them`, async () => {
    const [whole, body, summary] = await Promise.all([printed(html), printed(bodyHtml), printed(summaryHtml)]);
    const pages = { whole: pageCount(whole), body: pageCount(body), summary: pageCount(summary) };
    console.log(`report-browser.test: A4 pages: ${pages.summary} summary, ${pages.body} before the appendix, ${pages.whole} in all`);
    expect(pages.summary).toBeGreaterThanOrEqual(1);
    expect(pages.summary).toBeLessThanOrEqual(SUMMARY_PAGES);
    expect(pages.body).toBeGreaterThan(pages.summary);
    expect(pages.body).toBeLessThanOrEqual(BODY_PAGES);
    expect(pages.whole).toBeGreaterThan(pages.body);
  }, 120_000);

  it('saves a screenshot of the first page', async () => {
    const shot = join(dir, 'report-first-page.png');
    await page.screenshot({ path: shot });
    expect(statSync(shot).size).toBeGreaterThan(10_000);
    console.log(`report-browser.test: screenshot in ${shot}`);
  });
});
