import { describe, expect, it } from 'vitest';
import { runPoints, workOrder } from '../../src/node/sweep/run-sweep.ts';
import type { Lane } from '../../src/node/sweep/sweep-pool.ts';
import type { SweepPoint } from '../../src/core/sweep/sweep-points.ts';
import type { WorkReply, WorkRequest } from '../../src/node/sweep/sweep-work.ts';

/** A lane that answers each point with its index as its worst utilisation, after `delay` turns of the event loop per point. */
function fakeLane(delay: number, seen: number[][]): Lane {
  return {
    request: async (req: WorkRequest): Promise<WorkReply> => {
      if (req.kind !== 'points') throw new Error('points only');
      seen.push(req.points.map((p) => p.index));
      for (let i = 0; i < delay * req.points.length; i++) await new Promise((r) => setImmediate(r));
      return { outcomes: req.points.map((p) => ({ index: p.index, values: p.values, verdict: 'pass', worst_utilisation: p.index, worst: null, figures: [] })) };
    },
  };
}

const points = (n: number): SweepPoint[] => Array.from({ length: n }, (_, index) => ({ index, values: [Math.floor(index / 10), index % 10] }));

describe('handing points to threads', () => {
  it('checks every point exactly once, a fast thread taking over the slow one\'s share', async () => {
    const fast: number[][] = [];
    const slow: number[][] = [];
    const { outcomes, stopped } = await runPoints([fakeLane(0, fast), fakeLane(3, slow)], points(137));
    expect(stopped).toBe(false);
    expect(outcomes.map((o) => o.index).sort((a, b) => a - b)).toEqual(points(137).map((p) => p.index));
    // Each run of points is contiguous in value order.
    for (const run of [...fast, ...slow]) run.slice(1).forEach((ix, i) => expect(ix).toBe(run[i] + 1));
    expect(fast.flat().length).toBeGreaterThan(slow.flat().length);
  });

  it('stops handing out points once stopped, keeping those finished', async () => {
    const stop = new AbortController();
    const seen: number[][] = [];
    const { outcomes, stopped } = await runPoints([fakeLane(1, seen)], points(50), { stop: stop.signal, step: () => stop.abort() });
    expect(stopped).toBe(true);
    expect(outcomes).toHaveLength(seen[0].length);
  });

  it('orders the work by the values, first value slowest', () => {
    const order = workOrder([
      { index: 0, values: [2, 1] },
      { index: 1, values: [1, 5] },
      { index: 2, values: [1, 2], line: 1 },
      { index: 3, values: [2, 1], design: true },
    ]);
    expect(order.map((p) => p.index)).toEqual([2, 1, 0, 3]);
  });
});
