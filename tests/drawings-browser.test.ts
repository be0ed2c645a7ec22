import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { CHROMIUM, hasChromium, launchChromium } from '../scripts/headless-chromium.ts';
import { drawingsOfSpec, shippedSpecs } from './support/all-drawings.ts';
import { textBoxes } from './support/svg-text-boxes.ts';
import { coordinateDiagram } from '../src/render/drawings/coordinate-diagram.ts';
import type { Box } from '../src/render/drawings/text-box.ts';

// Every drawing of every shipped specification laid out by a real browser:
// the box getBBox() gives each text element (in the drawing's paper mm)
// overlaps no other's, and the estimate the label placer works with is no
// smaller than it, so a placement clear on estimates is clear on the page.
// Each drawing is loaded as its own page, so no style sheet reaches another.
// Skipped, saying why, where no browser is installed.

const browser = hasChromium();
if (!browser) console.warn(`drawings-browser.test: skipped, no browser at ${CHROMIUM}; install Debian's chromium package (apt-get install chromium) to run it.`);

/** A text's box as laid out, paper mm. */
type Measured = { text: string } & Box;

/** Shared area of two boxes less a hundredth of a millimetre each way, for rounding in the layout. */
const overlaps = (a: Measured, b: Measured) => Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x) > 0.01 && Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y) > 0.01;

const drawings = [...shippedSpecs().flatMap(drawingsOfSpec), { spec: 'docs', id: 'coordinates', svg: coordinateDiagram() }];

describe.skipIf(!browser)('drawings in headless Chromium', () => {
  let context: BrowserContext;
  let page: Page;
  const measured = new Map<string, Measured[]>();

  beforeAll(async () => {
    context = await launchChromium();
    page = await context.newPage();
    for (const d of drawings) {
      await page.setContent(`<!DOCTYPE html><html><body style="margin:0">${d.svg}</body></html>`);
      const boxes: Measured[] = await page.evaluate(() =>
        [...document.querySelectorAll('svg text')].map((t) => {
          const b = (t as SVGTextElement).getBBox();
          return { text: t.textContent ?? '', x: b.x, y: b.y, w: b.width, h: b.height };
        }),
      );
      measured.set(`${d.spec} ${d.id}`, boxes);
    }
  }, 120_000);
  afterAll(async () => {
    await context?.close();
  });

  it.each(drawings.map((d) => [`${d.spec} ${d.id}`, d.svg]))('%s: no two texts overlap as laid out', (name, svg) => {
    const boxes = measured.get(name)!;
    expect(boxes.length).toBe(textBoxes(svg).length);
    const clashes = boxes.flatMap((a, i) => boxes.slice(i + 1).filter((b) => overlaps(a, b)).map((b) => `${a.text} | ${b.text}`));
    expect(clashes).toEqual([]);
  });

  it.each(drawings.map((d) => [`${d.spec} ${d.id}`, d.svg]))('%s: the estimated boxes hold the laid-out ones', (name, svg) => {
    const boxes = measured.get(name)!;
    const estimates = textBoxes(svg);
    const short = boxes.flatMap((b, i) => {
      const e = estimates[i].box;
      const holds = e.x <= b.x + 0.05 && e.x + e.w >= b.x + b.w - 0.05 && e.y <= b.y + 0.05 && e.y + e.h >= b.y + b.h - 0.05;
      return holds ? [] : [`${b.text}: laid out ${[b.x, b.y, b.w, b.h].map((v) => v.toFixed(2)).join(" ")}, estimated ${[e.x, e.y, e.w, e.h].map((v) => v.toFixed(2)).join(" ")}`];
    });
    expect(short).toEqual([]);
  });
});
