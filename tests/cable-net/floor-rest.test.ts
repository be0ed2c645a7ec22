// The pretension-alone solve kept by a floor setup (floor-rest.ts): whatever
// order the tolerances are asked in, each answer must be, to the last bit,
// the solve a fresh setup makes at that tolerance, and the floor states built
// on a shared setup must equal those built on a fresh one.
import { describe, expect, it } from 'vitest';
import { floorModel, floorModels, floorSetup } from '../../src/core/model/cable-net/floor-model.ts';
import { RestMemo } from '../../src/core/model/cable-net/floor-rest.ts';
import { SkylineCholesky } from '../../src/core/model/cable-net/skyline.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';

const STANDING = { value: 1, source: 'test' };
const LOADED = [3.5, 10, 1.5, 5.25].map((value) => ({ value, source: 'test' }));

describe('the kept pretension-alone solve', () => {
  it('floor states on a shared setup equal those on a fresh setup, bit for bit', () => {
    const spec = prepared(readDemo('demo-rear-axle'));
    const shared = floorSetup(spec, rulesData);
    const standing = floorModel(spec, rulesData, STANDING, {}, shared);
    const loaded = floorModels(spec, rulesData, LOADED, {}, shared);
    expect(standing).toEqual(floorModel(spec, rulesData, STANDING));
    expect(loaded).toEqual(floorModels(spec, rulesData, LOADED));
  });

  it('serves another tolerance only where it would stop at the same step, and otherwise solves again', () => {
    const spec = prepared(readDemo('demo-two-crew'));
    const { built } = floorSetup(spec, rulesData);
    if (!built) throw new Error('the demo floor is solved');
    const inputs = { net: built.floor.net, F: built.F, frame: built.frame };
    const matrix = () => new SkylineCholesky(built.floor.net.nodes.length, built.pairs, built.order);
    const fresh = (tolerance_N: number) => new RestMemo().solve(inputs, tolerance_N, 50, matrix());
    const memo = new RestMemo();
    const first = memo.solve(inputs, 1, 50, matrix());
    const h = first.sol.history;
    expect(first.sol.converged).toBe(true);
    expect(h.length).toBeGreaterThan(2);
    // Between the last residual and the one before it: the same solve, kept.
    const between = (h[h.length - 1] + h[h.length - 2]) / 2;
    expect(memo.solve(inputs, between, 50, matrix())).toBe(first);
    expect(first.sol).toEqual(fresh(between).sol);
    // Looser than the step before the last: a fresh solve stops a step earlier.
    const looser = h[h.length - 2] * 1.5;
    const early = memo.solve(inputs, looser, 50, matrix());
    expect(early).not.toBe(first);
    expect(early.sol.iterations).toBeLessThan(first.sol.iterations);
    expect(early.sol).toEqual(fresh(looser).sol);
    // Tighter than it stopped at: solved again, as far as that tolerance asks.
    const tighter = memo.solve(inputs, h[h.length - 1] / 10, 50, matrix());
    expect(tighter).not.toBe(early);
    expect(tighter.sol).toEqual(fresh(h[h.length - 1] / 10).sol);
  });
});
