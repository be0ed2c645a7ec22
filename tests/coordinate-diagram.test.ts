import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { COORDINATES_FILE, coordinatesSvgFile } from '../src/render/drawings/coordinate-diagram.ts';
import { inlineSvg } from '../src/render/inline-svg.ts';

// docs/coordinates.svg: the axes the specification's positions are measured
// on (spec.types.ts: x forward from the rear edge of the floor, y to the left
// of the centre line, z up from the ground). Paper y runs down.

const svg = coordinatesSvgFile();
const num = (tag: string, name: string) => Number(new RegExp(`\\s${name}="([^"]+)"`).exec(tag)![1]);
const axes = [...svg.matchAll(/<line class="axis"[^>]*>/g)].map((m) => m[0]);
const axis = (name: string, k = 0) => axes.filter((t) => t.includes(`data-axis="${name}"`))[k];
const lineOf = (name: string) => /<line class="centre"[^>]*>/g.exec(svg.slice(svg.indexOf(`data-line="${name}"`) - 200))![0];

describe('the coordinate diagram', () => {
  it('is committed as drawn now (npx tsx scripts/draw-coordinates.ts redraws it)', () => {
    expect(readFileSync(new URL(`../${COORDINATES_FILE}`, import.meta.url), 'utf8')).toBe(svg);
  });

  it('draws x forward (right) twice, z up in the side view, y up on paper (left) in plan', () => {
    expect(axes).toHaveLength(4);
    for (const x of [axis('x', 0), axis('x', 1)]) {
      expect(num(x, 'x2')).toBeGreaterThan(num(x, 'x1'));
      expect(num(x, 'y2')).toBe(num(x, 'y1'));
    }
    expect(num(axis('z'), 'y2')).toBeLessThan(num(axis('z'), 'y1'));
    expect(num(axis('z'), 'x2')).toBe(num(axis('z'), 'x1'));
    expect(num(axis('y'), 'y2')).toBeLessThan(num(axis('y'), 'y1'));
    expect(num(axis('y'), 'x2')).toBe(num(axis('y'), 'x1'));
  });

  it('starts x at the rear edge of the floor in both views, z on the ground, y on the centre line', () => {
    const [sideX, planX] = [axis('x', 0), axis('x', 1)];
    const floor = /<rect class="outline" x="([\d.]+)" y="([\d.]+)"/.exec(svg)!;
    expect(num(sideX, 'x1')).toBe(Number(floor[1]));
    expect(num(planX, 'x1')).toBe(Number(floor[1]));
    // The side view's x axis lies on the ground line.
    const ground = /<line class="ground"[^>]*>/.exec(svg)![0];
    expect(num(sideX, 'y1')).toBe(num(ground, 'y1'));
    expect(num(lineOf('x0'), 'x1')).toBe(num(sideX, 'x1'));
    expect(num(lineOf('y0'), 'y1')).toBe(num(planX, 'y1'));
    for (const words of ['x forward', 'z up', 'y to the left', 'rear edge of the floor: x = 0', 'ground: z = 0', 'centre line: y = 0']) expect(svg).toContain(`>${words}<`);
  });

  it('can go inline in a page', () => {
    expect(inlineSvg(svg)).not.toBeNull();
  });
});
