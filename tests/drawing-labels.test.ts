import { describe, expect, it } from 'vitest';
import { drawingsOfSpec, shippedSpecs } from './support/all-drawings.ts';
import { overlappingTexts, textBoxes } from './support/svg-text-boxes.ts';
import { coordinateDiagram } from '../src/render/drawings/coordinate-diagram.ts';
import { LabelPlacer } from '../src/render/drawings/label-placer.ts';
import { boxesOverlap, textBox, textWidth } from '../src/render/drawings/text-box.ts';
import { hits, type Obstacle } from '../src/render/drawings/obstacles.ts';

// No label of any drawing overprints another: every text element's box,
// estimated from its attributes and its class's font (the estimate errs
// large; tests/drawings-browser.test.ts measures the real boxes in a
// browser), shares no area with any other's, for every drawing of every
// specification the project ships, and stays on its sheet.

const viewBox = (svg: string) => /viewBox="0 0 ([\d.]+) ([\d.]+)"/.exec(svg)!.slice(1).map(Number);

const drawings = [...shippedSpecs().flatMap(drawingsOfSpec), { spec: 'docs', id: 'coordinates', svg: coordinateDiagram() }];

describe.each(drawings.map((d) => [`${d.spec} ${d.id}`, d.svg]))('%s', (_name, svg) => {
  const texts = textBoxes(svg);

  it('has no two texts overlapping', () => {
    expect(texts.length).toBeGreaterThan(3);
    expect(overlappingTexts(texts)).toEqual([]);
  });

  it('keeps every text on the sheet', () => {
    const [w, h] = viewBox(svg);
    const off = texts.filter(({ box: b }) => b.x < 0 || b.y < 0 || b.x + b.w > w || b.y + b.h > h).map((t) => t.text);
    expect(off).toEqual([]);
  });
});

describe('the label placer', () => {
  const font = { size: 3 };
  const sheet = { x: 0, y: 0, w: 200, h: 100 };

  it('keeps a label at its first position when that is clear', () => {
    const p = new LabelPlacer(sheet).place({ text: 'axle', at: [50, 50], font, cls: 'label', first: { x: 52, y: 51, anchor: 'start' } });
    expect(p.lines[0]).toMatchObject({ x: 52, y: 51 });
    expect(p.leader).toBeUndefined();
  });

  it('moves a label off a text already there, and off a line through its first position', () => {
    const placer = new LabelPlacer(sheet);
    const taken = placer.fixed(52, 51, 'dimension 2715', font, 'start', 'label');
    const line: Obstacle = { kind: 'segment', p: [40, 40], q: [40, 60], pad: 0.4 };
    placer.avoid(line);
    const p = placer.place({ text: 'axle load 2075 N', at: [50, 50], font, cls: 'label', first: { x: 52, y: 51, anchor: 'start' } });
    expect(boxesOverlap(p.box, taken.box)).toBe(false);
    expect(hits(p.box, line)).toBe(false);
    expect(p.forced).toBe(false);
  });

  it('places many labels round one point without overlap, with leaders to those that moved far', () => {
    const placer = new LabelPlacer(sheet);
    const labels = Array.from({ length: 12 }, (_, i) => placer.place({ text: `crew member ${i + 1}`, at: [100, 50], font, cls: 'label' }));
    labels.forEach((a, i) => labels.slice(i + 1).forEach((b) => expect(boxesOverlap(a.box, b.box)).toBe(false)));
    expect(labels.some((l) => l.leader)).toBe(true);
    // Each leader runs from near the anchor to the edge of its label's box.
    for (const l of labels.filter((x) => x.leader)) {
      const [p, q] = l.leader!;
      expect(Math.hypot(p[0] - 100, p[1] - 50)).toBeLessThan(1);
      const onEdge = Math.abs(q[0] - l.box.x) < 1e-9 || Math.abs(q[0] - l.box.x - l.box.w) < 1e-9 || Math.abs(q[1] - l.box.y) < 1e-9 || Math.abs(q[1] - l.box.y - l.box.h) < 1e-9;
      expect(onEdge).toBe(true);
    }
  });

  it('keeps a label out of a circle\'s line but lets it sit inside a large circle', () => {
    const placer = new LabelPlacer(sheet);
    placer.avoid({ kind: 'ring', c: [100, 50], r: 30, pad: 0.4 });
    const inside = placer.place({ text: 'hub', at: [100, 50], font, cls: 'label' });
    const across = placer.place({ text: 'rim', at: [130, 50], font, cls: 'label', first: { x: 130, y: 51, anchor: 'middle' } });
    expect(Math.hypot(inside.box.x - 100, inside.box.y - 50)).toBeLessThan(30);
    expect(across.lines[0].x === 130 && across.lines[0].y === 51).toBe(false);
    expect(placer.obstacles.some((o) => hits(across.box, o))).toBe(false);
  });
});

describe('text box estimate', () => {
  it('grows with the characters and the font size, wide letters wider than narrow ones', () => {
    expect(textWidth('WWW', { size: 3 })).toBeGreaterThan(textWidth('iii', { size: 3 }));
    expect(textWidth('axle', { size: 6 })).toBeCloseTo(2 * textWidth('axle', { size: 3 }), 9);
    expect(textWidth('axle', { size: 3, bold: true })).toBeGreaterThan(textWidth('axle', { size: 3 }));
  });

  it('puts the box by the anchor: start to the right of x, end to its left, middle across it', () => {
    const w = textWidth('yoke', { size: 3 });
    const [start, end, middle] = (['start', 'end', 'middle'] as const).map((a) => textBox(10, 20, 'yoke', { size: 3 }, a));
    // Each box a little wider than the advance, by the same at both ends.
    const side = (start.w - w) / 2;
    expect(side).toBeGreaterThan(0);
    expect(start.x).toBeCloseTo(10 - side, 9);
    expect(end.x + end.w).toBeCloseTo(10 + side, 9);
    expect(middle.x + middle.w / 2).toBeCloseTo(10, 9);
    // Above the baseline by the ascent and below it by the descent.
    const b = textBox(10, 20, 'yoke', { size: 3 }, 'start');
    expect(b.y).toBeLessThan(20 - 2);
    expect(b.y + b.h).toBeGreaterThan(20);
  });
});
