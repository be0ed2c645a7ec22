import type { CoupledSolution } from './coupled-solve.ts';
import { strapSpans } from './coupled-solve.ts';
import { coupledTangent, couplingPreconditioner, type CouplingPreconditioner } from './coupled-tangent.ts';
import type { CableNet } from './net.ts';
import { coupledPairs, nodeOrder } from './node-order.ts';
import { segmentState } from './segment.ts';
import { SkylineCholesky } from './skyline.ts';
import { SLACK_TENSION } from './solve-net.ts';

/** The coupled tangent's response to a unit load pattern at a solved state: the sags it adds (frame included). */
export function coupledCompliance(net: CableNet, sol: CoupledSolution, F: ArrayLike<number>, K = new SkylineCholesky(net.nodes.length, coupledPairs(net), nodeOrder(net)), coupling: CouplingPreconditioner = couplingPreconditioner()): ((p: Float64Array) => Float64Array) | null {
  const states = net.segments.map((seg, i) => segmentState(seg, seg.a < 0 ? 0 : sol.sag[seg.a], seg.b < 0 ? 0 : sol.sag[seg.b], sol.flats[i]));
  const spans = strapSpans(net);
  // Only a net without pretension can have a slack strap with no stiffness at all; give it the solver's stand-in.
  const T = coupledTangent(net, F, spans, states, K, 0, 0, coupling) ?? coupledTangent(net, F, spans, states, K, SLACK_TENSION, 0, coupling);
  if (!T) return null;
  const zero = new Float64Array(net.straps.length);
  return (p) => T.solve(p, zero)?.du ?? new Float64Array(p.length).fill(NaN);
}
