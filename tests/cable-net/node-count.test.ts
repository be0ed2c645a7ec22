// The floor solver's node limit compares the net's real node count, counted
// from its strap lines before the net is built: the count must equal the
// nodes the built net has, for every weave and refinement.
import { describe, expect, it } from 'vitest';
import { floorLines, floorNet, floorNodeCount } from '../../src/core/model/cable-net/floor-net.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';

describe('floorNodeCount', () => {
  for (const weave of ['two-way', 'front-to-back', 'side-to-side'] as const) {
    for (const refine of [1, 2, 3]) {
      it(`${weave}, refined ${refine}: the count is the built net's`, () => {
        const spec = prepared(deepMerge(readDemo('demo-two-crew'), { floor_straps: { weave } }));
        expect(floorNodeCount(floorLines(spec, rulesData, refine).lines)).toBe(floorNet(spec, rulesData, refine).net.nodes.length);
      });
    }
  }

  it('counts a two-way crossing once and each refinement node: 3 x 2 straps, 6 crossings', () => {
    const line = (family: 'front-to-back' | 'side-to-side', cross: number, keys: string[], refine: number) => ({
      family, number: 1, of: 1, cross, start: 0, end: 10, rails: ['rear', 'front'] as ['rear', 'front'], EA: 1, pretension: 0, refine,
      stations: keys.map((key, k) => ({ s: 1 + k, key })),
    });
    // Front-to-back strap j holds crossings (i, j) for i < 2; side-to-side strap i holds (i, j) for j < 3.
    const lines = (refine: number) => [
      ...[0, 1, 2].map((j) => line('front-to-back', j, [0, 1].map((i) => `${i},${j}`), refine)),
      ...[0, 1].map((i) => line('side-to-side', i, [0, 1, 2].map((j) => `${i},${j}`), refine)),
    ];
    expect(floorNodeCount(lines(1))).toBe(6);
    // Refined twice, each interval gains a node: 3 straps x 3 intervals + 2 straps x 4 intervals = 17, plus the 6 crossings.
    expect(floorNodeCount(lines(2))).toBe(23);
  });
});
