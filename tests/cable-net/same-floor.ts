// Two solves of one floor state agree: both converged, the same largest
// tension and crew sags and stiffnesses far inside 1e-4 (each solve stops when
// no node is out of balance by a millionth of the load), and the first in
// vertical balance to the solver's tolerance on every node.
import { expect } from 'vitest';
import type { FloorModel } from '../../src/core/model/cable-net/floor-model.ts';

export function expectSameFloor(m: FloorModel, other: FloorModel): void {
  expect(m.converged && other.converged).toBe(true);
  expect(Math.abs(m.maxTension_N / other.maxTension_N - 1)).toBeLessThan(1e-4);
  m.crew.forEach((c, k) => {
    expect(Math.abs(c.sag_mm / other.crew[k].sag_mm - 1)).toBeLessThan(1e-4);
    expect(Math.abs(c.tangentStiffness_N_per_mm / other.crew[k].tangentStiffness_N_per_mm - 1)).toBeLessThan(1e-4);
  });
  expect(Math.abs(m.reactionSum_N - m.appliedLoad_N)).toBeLessThan(m.tolerance_N * m.nodes);
}
