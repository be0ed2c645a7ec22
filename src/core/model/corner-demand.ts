import { formatNumber } from '../format/number-format.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { FloorResult, RailPull } from './floor-result.ts';
import { jointForceWith, type JointForce } from './joint-force.ts';

// The force on each jointed corner of the floor frame from the strap pull on
// the rails (strap-floor model, bump case). Each rail's total pull is shared
// by its two ends; a corner carries half the pull of each rail that meets
// there, one fore-and-aft and one sideways. A front rail steam-bent round the
// front corners leaves only the rear corners jointed.

export type CornerDemand = { cases: JointForce[]; unknown: null } | { cases: []; unknown: string };

const f1 = (v: number) => v.toFixed(1);

/** The jointed corners, in words. */
export function jointedCorners(spec: CheckedSpecification): string {
  return spec.box.floor.frame.bend_radius_mm !== undefined
    ? 'each of the two rear corners of the floor frame (the front rail is bent round the front ones)'
    : 'each of the four corners of the floor frame';
}

export function cornerDemand(spec: CheckedSpecification, floor: FloorResult | undefined, force: ReturnType<typeof jointForceWith>): CornerDemand {
  if (!floor) return { cases: [], unknown: 'the strap-floor model gave no result' };
  if (!floor.converged) {
    const how = Number.isFinite(floor.residual_N) ? `residual ${formatNumber(floor.residual_N)} N against ${formatNumber(floor.tolerance_N)} N` : 'the net was not solved: see floor.convergence';
    return { cases: [], unknown: `the strap-floor model did not converge in the bump case (${how})` };
  }
  const rail = (name: RailPull['rail']) => floor.rails.find((r) => r.rail === name)?.total_N ?? 0;
  const bent = spec.box.floor.frame.bend_radius_mm !== undefined;
  const ends: ('rear' | 'front')[] = bent ? ['rear'] : ['rear', 'front'];
  const cases: JointForce[] = [];
  for (const end of ends) {
    for (const side of ['left', 'right'] as const) {
      const along = rail(end) / 2;
      const across = rail(side) / 2;
      cases.push(force(`${end}-${side}`, `${end}-${side} corner, crew weight × ${formatNumber(floor.factor)} on the strap floor`, { along, across }, [
        `along = T_${end} / 2 = ${f1(rail(end))} / 2 = ${f1(along)} N (half the strap pull on the ${end} rail)`,
        `across = T_${side} / 2 = ${f1(rail(side))} / 2 = ${f1(across)} N (half the strap pull on the ${side} rail)`,
      ]));
    }
  }
  return { cases, unknown: null };
}
