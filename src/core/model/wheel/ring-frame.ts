import { RingSystem } from './ring-system.ts';
import type { RingFrame, RingSolution } from './ring-frame-types.ts';

// A closed plane ring of straight beam elements through nodes on a circle,
// held by springs at some nodes and loaded by point forces at nodes, solved
// by the direct stiffness method (the inputs in ring-frame-types.ts, the
// assembly in ring-system.ts). A ring solved for many sets of springs keeps
// its RingSystem; this is the one-off solve.

export { directionAt, RingNotHeld } from './ring-frame-types.ts';
export type { RingElementForces, RingFrame, RingLoad, RingShape, RingSolution, RingSpring, RingStrut, SpringDirection } from './ring-frame-types.ts';

export function solveRingFrame(f: RingFrame): RingSolution {
  const system = new RingSystem(f);
  const u = system.factorWith(f.springs).solve(system.loadVector(f.loads, f.pressure));
  return system.solution(u, f.springs);
}
