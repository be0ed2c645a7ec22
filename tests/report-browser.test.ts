import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { BrowserContext, Page } from 'playwright-core';
import { CHROMIUM, hasChromium, launchChromium } from '../scripts/headless-chromium.ts';
import { demoReportHtml } from '../scripts/demo-report.ts';

// The demo's HTML report laid out by a real browser: every figure is there
// with a size, no text runs outside its figure, and the first page opens with
// the verdict, the cautions and the side elevation. Skipped, saying why, only
// where no browser is installed (.ci/run installs Debian's chromium).

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
  let context: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    html = await demoReportHtml('demo-two-crew');
    const file = join(dir, 'report.html');
    writeFileSync(file, html);
    context = await launchChromium();
    page = await context.newPage();
    await page.goto(pathToFileURL(file).href);
  }, 60_000);
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
    // The plots drawn by vega: load per horse, the turn over speed, three per ride case.
    expect(laid.filter((f) => /\bmarks\b/.test(f.cls))).toHaveLength(2 + 3 * 5); // five ride cases
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

  it('opens with the verdict, then the cautions, then the side elevation', async () => {
    const order: string[] = await page.evaluate(() =>
      [...document.querySelectorAll('main h2, main svg[data-origin]')].map((e) => (e.tagName.toLowerCase() === 'h2' ? `h2 ${e.textContent}` : `svg ${e.querySelector('text.title')?.textContent}`)),
    );
    expect(order[0]).toMatch(/^h2 Verdict: /);
    expect(order[1]).toBe('h2 Cautions');
    expect(order[2]).toMatch(/^svg Side elevation, scale 1:\d+ on A4/);
    // The side elevation starts within the first A4 page.
    const top = await page.evaluate(() => document.querySelector('svg[data-origin]')!.getBoundingClientRect().top + window.scrollY);
    expect(top).toBeLessThan(1123);
  });

  it('saves a screenshot of the first page', async () => {
    const shot = join(dir, 'report-first-page.png');
    await page.screenshot({ path: shot });
    expect(statSync(shot).size).toBeGreaterThan(10_000);
    console.log(`report-browser.test: screenshot in ${shot}`);
  });
});
