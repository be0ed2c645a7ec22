import { describe, expect, it } from 'vitest';
import { gridPoints, latinHypercube, shardRange, sweepPoints } from '../../src/core/sweep/sweep-points.ts';
import type { SweepAxis } from '../../src/core/sweep/sweep-axis.ts';

const axis = (path: string, from: number, to: number, count: number): SweepAxis => ({ path, steps: path.split('.'), from, to, count, unit: 'mm' });

describe('the points of a sweep', () => {
  it('lays a grid with the last value varying fastest, then each value\'s line through the design point, then the design point', () => {
    const axes = [axis('a', 0, 10, 3), axis('b', 1, 2, 2)];
    expect(gridPoints(axes)).toEqual([[0, 1], [0, 2], [5, 1], [5, 2], [10, 1], [10, 2]]);
    const pts = sweepPoints({ axes, mode: { kind: 'grid' }, design: [4, 1.5] });
    expect(pts.slice(6).map((p) => [p.values, p.line, p.design])).toEqual([
      [[0, 1.5], 0, undefined],
      [[5, 1.5], 0, undefined],
      [[10, 1.5], 0, undefined],
      [[4, 1], 1, undefined],
      [[4, 2], 1, undefined],
      [[4, 1.5], undefined, true],
    ]);
    expect(pts.map((p) => p.index)).toEqual(pts.map((_, i) => i));
  });

  it('draws a Latin hypercube from its seed: each of the n strata of each value used once, the same points for the same seed', () => {
    const axes = [axis('a', 100, 300, 5), axis('b', -1, 1, 5)];
    const n = 50;
    const pts = latinHypercube(axes, n, 7);
    expect(latinHypercube(axes, n, 7)).toEqual(pts);
    expect(latinHypercube(axes, n, 8)).not.toEqual(pts);
    axes.forEach((a, j) => {
      // The stratum of each value: floor((v - from) / ((to - from) / n)); every one of 0..n-1 exactly once.
      const strata = pts.map((p) => Math.floor(((p[j] - a.from) * n) / (a.to - a.from))).sort((x, y) => x - y);
      expect(strata).toEqual(Array.from({ length: n }, (_, i) => i));
    });
  });

  it('splits the points into contiguous shards that cover every point once', () => {
    for (const [total, n] of [[10, 3], [7, 7], [5, 8], [10_000, 3]]) {
      const ranges = Array.from({ length: n }, (_, i) => shardRange(total, i + 1, n));
      expect(ranges[0].start).toBe(0);
      expect(ranges.at(-1)!.end).toBe(total);
      ranges.slice(1).forEach((r, i) => expect(r.start).toBe(ranges[i].end));
    }
  });
});
