import { formatNumber as fmt } from '../../format/number-format.ts';
import { RimGiveScan } from './rim-give.ts';
import type { WheelRingSpec } from './wheel-ring-spec.ts';
import { keptByRing, ringMemo } from './kept-by-ring.ts';

// The wheel's own radial stiffness from its ring frame (design basis,
// section 8): the felloe bending between the spokes and the spokes' axial
// give, joints rigid, the nave held. It depends on where the rim meets the
// ground: stiff under a spoke, soft midway between two, the more so with few
// spokes and hinged felloe joints. A ridge of routine rough ground is longer
// than a spoke span, so the wheel rolls over it through every position: the
// compliance averaged over the rim stands for it. A short stone, or the drop,
// may meet the rim anywhere: the stiffest position, the safe side.
//
// With spokes that can only push and no pre-compression the ring's give is
// proportional to the ground load (which spokes go slack does not depend on
// its size), so its stiffness does not depend on the load: it is found for a
// unit load and kept by the ring it was found for (kept-by-ring.ts), so a
// re-run that changes only the load (a crew member's weight or place, the
// axle's position) takes it again. With a tyre's pre-compression it is found
// at the load itself.

/** Positions sampled across each spoke span. */
const PER_SPAN = 8;

export interface WheelStiffness {
  /** Averaged over the rim, N/m. */
  rolling: number;
  /** The stiffest position, N/m. */
  strike: number;
  /** The softest position, N/m (for the working). */
  softest: number;
  working: string;
}

/** Stiffnesses of the last few wheels without pre-compression (found at a unit load), by their rings. */
const unitStiffness = ringMemo<WheelStiffness>(16);

/** `P` the ground load on the wheel, N (the standing one): with a tyre's pre-compression the ring's give depends on it. */
export function wheelStiffness(ws: WheelRingSpec, P: number): WheelStiffness {
  return ws.ring.precompression === 0 ? keptByRing(unitStiffness, ws, null, () => stiffnessAt(ws, 1)) : stiffnessAt(ws, P);
}

/** The stiffness from the rim's give under the ground load P, N, at every position scanned. */
function stiffnessAt(ws: WheelRingSpec, P: number): WheelStiffness {
  const n = ws.ring.spokes;
  const count = ws.hinged || ws.ring.precompression > 0 ? n * PER_SPAN : PER_SPAN;
  const compliances: number[] = [];
  let unsettled = 0;
  // One ring assembled for the positions that share a mesh, a factor for each set of bearing spokes.
  const scan = new RimGiveScan(ws, P);
  for (let i = 0; i < count; i++) {
    const r = scan.at(((2 * Math.PI) / n / PER_SPAN) * i);
    if (!Number.isFinite(r.deflection)) return unknownStiffness(r.unsettled ?? 'the ring model gave no deflection');
    compliances.push(r.deflection / 1000 / P); // m/N
    if (r.unsettled) unsettled++;
  }
  const mean = compliances.reduce((s, c) => s + c, 0) / compliances.length;
  const rolling = 1 / mean;
  const strike = 1 / Math.min(...compliances);
  const softest = 1 / Math.max(...compliances);
  return {
    rolling,
    strike,
    softest,
    working: `wheel ring (felloe bending and spoke compression, joints rigid${ws.hinged ? ', the dowelled felloe joints hinged' : ''}): radial stiffness ${fmt(strike / 1e3)} kN/m under a spoke, ${fmt(softest / 1e3)} kN/m at its softest, ${fmt(rolling / 1e3)} kN/m averaged over ${count} positions round the rim${unsettled ? `; at ${unsettled} of them the search for slack spokes did not settle and its last state stands (see member.felloe)` : ''}`,
  };
}

/** A wheel whose ring could not be solved: its stiffness not known (NaN), the reason in the working. */
function unknownStiffness(why: string): WheelStiffness {
  return { rolling: NaN, strike: NaN, softest: NaN, working: `wheel ring: its radial stiffness is not known: ${why}` };
}
