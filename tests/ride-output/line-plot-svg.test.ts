import { describe, expect, it } from 'vitest';
import { axisRange, linePlotSvg, niceStep } from '../../io/render/line-plot-svg.ts';
import { inlineSvg } from '../../io/render/inline-svg.ts';

describe('linePlotSvg', () => {
  it('steps of 1, 2 and 5 times a power of ten', () => {
    expect([0.013, 0.17, 0.3, 4, 7, 12].map(niceStep)).toEqual([0.02, 0.2, 0.5, 5, 10, 20]);
    expect(axisRange([-3.2, 17])).toEqual({ lo: -5, hi: 20, step: 5 });
    // A flat line still gets an axis with room.
    const flat = axisRange([2, 2, 2]);
    expect(flat.lo).toBeLessThan(2);
    expect(flat.hi).toBeGreaterThan(2);
  });

  it('draws each line, escapes text, and can go inline in the report', () => {
    const x = Array.from({ length: 50 }, (_, i) => i / 10);
    const svg = linePlotSvg({ title: 'a <b> & c', xLabel: 't', yLabel: 'y', lines: [{ label: 'sin', x, y: x.map(Math.sin) }, { label: 'dots', x, y: x, dots: true }] });
    expect(svg.match(/<polyline/g)).toHaveLength(1);
    expect(svg.match(/<circle/g)!.length).toBe(50 + 1); // the dots and the legend's key
    expect(svg).toContain('a &#60;b&#62; &#38; c');
    expect(inlineSvg(svg)).not.toBeNull();
  });

  it('thins a long line to two points per pixel column and keeps its extremes', () => {
    const n = 100_000;
    const x = Array.from({ length: n }, (_, i) => i);
    const y = x.map((i) => (i === 77_777 ? 1000 : Math.sin(i / 1000)));
    const svg = linePlotSvg({ title: 't', xLabel: 'x', yLabel: 'y', lines: [{ label: 'spike', x, y }], width: 500 });
    const points = /points="([^"]*)"/.exec(svg)![1].split(' ');
    expect(points.length).toBeLessThanOrEqual(2 * 500 + 2);
    // The spike reaches the top of the axis range (1000), the highest point drawn.
    const ys = points.map((p) => Number(p.split(',')[1]));
    expect(Math.min(...ys)).toBe(34); // the plot's top margin: y = 1000 is the axis top
  });
});
