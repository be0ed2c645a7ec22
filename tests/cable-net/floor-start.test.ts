// A floor state started from another solved state of a net of the same shape
// (a decisive-input trial starts from the check's standing floor): the same
// answer as a cold start, to the solver's tolerance (each solve stops when no
// node is out of balance by more than a millionth of the load), in fewer
// Newton steps where the load changed little; and a start of another shape is
// not taken.
import { describe, expect, it } from 'vitest';
import { floorModel, floorModels, floorSetup, nextStart } from '../../src/core/model/cable-net/floor-model.ts';
import { floorStaticDef } from '../../src/core/pipeline/models.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { expectSameFloor } from './same-floor.ts';

const STANDING = { value: 1, source: 'test' };

const raw = readDemo('demo-two-crew') as { crew: { mass_kg: number }[]; floor_straps: { pretension_N: number } };
const base = floorModel(prepared(raw), rulesData, STANDING);

describe('a floor state started from another', () => {
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

// The loaded states in one go (floorModels, as the check solves them): the
// lightest from the standing floor, each heavier one on the line through the
// two below (a secant predictor: Allgower & Georg, Introduction to Numerical
// Continuation Methods, SIAM 2003, ch. 5). The line is checked against its
// closed form, and on the demo floor it must start nearer the answer than
// the state below does, and every state must give the answer of a cold
// start to the solver's tolerance. The load factors (1.5, 2.2, 3) and the
// closed-form case's sags, pulls and loads are test inputs of our own.
describe('the loaded states started on the line through the two below', () => {
  it('is the straight line through the two states below, at the load asked for', () => {
    const state = (sag: number[], pulls: number[]) => ({ sag: Float64Array.from(sag), pulls: Float64Array.from(pulls) });
    const a = { state: state([0, -2], [10, 20]), load: 1000 };
    const b = { state: state([-4, -6], [14, 22]), load: 1500 };
    // 2000 N is one more step of 500 N: each value moves as much again.
    const s = nextStart([a, b], 2000)!;
    expect([...s.sag]).toEqual([-8, -10]);
    expect([...s.pulls]).toEqual([18, 24]);
    // One state below: that state; none: no start; loads not rising: the last state.
    expect(nextStart([a], 2000)).toBe(a.state);
    expect(nextStart([], 2000)).toBeUndefined();
    expect(nextStart([b, { ...a, load: 1500 }], 2000)).toBe(a.state);
  });

  it('starts nearer the answer than the state below, and every state is the cold start’s answer', () => {
    const spec = prepared(readDemo('demo-two-crew'));
    const factors = [1.5, 2.2, 3].map((value) => ({ value, source: 'test' }));
    const chained = floorModels(spec, rulesData, factors, { start: base.solution });
    const solved = [{ state: base.solution!, load: base.appliedLoad_N }, { state: chained[0].solution!, load: chained[0].appliedLoad_N }];
    const line = nextStart(solved, chained[1].appliedLoad_N)!;
    const gap = (s: Float64Array) => Math.max(...s.map((v, i) => Math.abs(v - chained[1].solution!.sag[i])));
    expect(gap(line.sag)).toBeLessThan(0.5 * gap(chained[0].solution!.sag));
    factors.forEach((f, i) => expectSameFloor(chained[i], floorModel(spec, rulesData, f)));
  });
});
