// A floor state started from another solved state of a net of the same shape
// (a decisive-input trial starts from the check's standing floor): the same
// answer as a cold start, to the solver's tolerance (each solve stops when no
// node is out of balance by more than a millionth of the load), in fewer
// Newton steps where the load changed little; and a start of another shape is
// not taken.
import { describe, expect, it } from 'vitest';
import { floorModel, floorSetup } from '../../src/core/model/cable-net/floor-model.ts';
import { floorStaticDef } from '../../src/core/pipeline/models.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { expectSameFloor } from './same-floor.ts';

const STANDING = { value: 1, source: 'test' };

describe('a floor state started from another', () => {
  const raw = readDemo('demo-two-crew') as { crew: { mass_kg: number }[]; floor_straps: { pretension_N: number } };
  const base = floorModel(prepared(raw), rulesData, STANDING);

  it('keeps its solution where it converged', () => {
    expect(base.converged).toBe(true);
    expect(base.solution?.sag.length).toBe(base.nodes);
  });

  for (const [label, change] of [
    ['the crew 10 % heavier', { crew: raw.crew.map((c) => ({ ...c, mass_kg: c.mass_kg * 1.1 })) }],
    ['the straps pulled 20 % tighter', { floor_straps: { pretension_N: raw.floor_straps.pretension_N * 1.2 } }],
  ] as const) {
    it(`${label}: the cold start's answer, in fewer steps`, () => {
      const spec = prepared(deepMerge(raw, change));
      const cold = floorModel(spec, rulesData, STANDING);
      const warm = floorModel(spec, rulesData, STANDING, { start: base.solution });
      expect(warm.iterations).toBeLessThan(cold.iterations);
      expectSameFloor(warm, cold);
    });
  }

  it('the standing floor model starts from the varied check only for a net of the same shape', () => {
    const finer = prepared(deepMerge(raw, { floor_straps: { pitch_mm: 40 } }));
    const setup = floorSetup(finer, rulesData);
    const startFrom = new Map<string, unknown>([['floorStatic', base]]);
    const inputs = { spec: finer, data: rulesData, ride: false, startFrom } as Parameters<typeof floorStaticDef.compute>[1];
    // Another node count: the start is not taken, and the answer is the cold one to the last bit.
    const m = floorStaticDef.compute({ floorSetup: setup }, inputs);
    expect(m.nodes).not.toBe(base.nodes);
    expect(m.history).toEqual(floorModel(finer, rulesData, { value: 1, source: 'the crew standing, no dynamic factor' }, {}, setup).history);
  });
});
