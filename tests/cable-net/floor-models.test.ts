// Several floor states of one net solved in one go (floorModels): each state
// must be the one the solver finds alone from a cold start, whatever order the
// states are given in, and each must balance the crew's weight (vertical
// equilibrium: the frame's reactions sum to the load on the straps).
import { describe, expect, it } from 'vitest';
import { floorModel, floorModels } from '../../src/core/model/cable-net/floor-model.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { expectSameFloor } from './same-floor.ts';

const FACTORS = [1, 3.5, 1.5, 10, 5.25].map((value) => ({ value, source: 'test' }));

describe('floorModels', () => {
  for (const demo of ['demo-two-crew', 'demo-rear-axle'] as const) {
    it(`${demo}: each state as solved alone, in the order given, each in balance`, () => {
      const spec = prepared(readDemo(demo));
      const together = floorModels(spec, rulesData, FACTORS);
      expect(together.map((m) => m.factor)).toEqual(FACTORS.map((f) => f.value));
      together.forEach((m, i) => {
        const alone = floorModel(spec, rulesData, FACTORS[i]);
        // Statics included: the vertical reactions carry the whole crew load, to the solver's tolerance on every node.
        expectSameFloor(m, alone);
      });
    });
  }

  it('the same states in reverse order give the same results', () => {
    const spec = prepared(readDemo('demo-two-crew'));
    const forward = floorModels(spec, rulesData, FACTORS);
    const reverse = floorModels(spec, rulesData, [...FACTORS].reverse()).reverse();
    forward.forEach((m, i) => expect(Math.abs(reverse[i].maxTension_N / m.maxTension_N - 1)).toBeLessThan(1e-4));
  });

  it('no states asked, none solved', () => {
    expect(floorModels(prepared(readDemo('demo-two-crew')), rulesData, [])).toEqual([]);
  });

  it('a net over max_nodes is declined for every state, with the real node count and no number', () => {
    // 5 mm straps at a 5 mm pitch: far more nodes than the 5000 the solver takes (rules/parameters/floor.yaml).
    const spec = prepared(deepMerge(readDemo('demo-two-crew'), { floor_straps: { width_mm: 5, pitch_mm: 5 } }));
    const states = floorModels(spec, rulesData, FACTORS.slice(0, 2));
    for (const m of states) {
      expect(m.converged).toBe(false);
      expect(m.stopped).toMatch(/^the net would have \d+ nodes, more than the 5000 the solver takes \(max_nodes\)$/);
      expect(m.nodes).toBeGreaterThan(5000);
      expect(m.maxTension_N).toBeNaN();
    }
  });
});
