import type { CoupledSolution } from './coupled-solve.ts';
import { netStates, strapSpans } from './coupled-solve.ts';
import { coupledTangent, couplingPreconditioner, type CouplingPreconditioner } from './coupled-tangent.ts';
import type { CableNet } from './net.ts';
import { coupledPairs, nodeOrder } from './node-order.ts';
import { SkylineCholesky } from './skyline.ts';
import { SLACK_TENSION } from './solve-net.ts';

/** The strap system's relative residual: the sags to about six figures, past the three reported. */
const ACCURACY = 1e-6;

/** The coupled tangent's response to a unit load pattern at a solved state: the sags it adds (frame included). */
export function coupledCompliance(net: CableNet, sol: CoupledSolution, F: ArrayLike<number>, K = new SkylineCholesky(net.nodes.length, coupledPairs(net), nodeOrder(net)), coupling: CouplingPreconditioner = couplingPreconditioner()): ((p: Float64Array) => Float64Array) | null {
  const states = netStates(net, sol.sag, sol.flats);
  const spans = strapSpans(net);
  // Only a net without pretension can have a slack strap with no stiffness at all; give it the solver's stand-in.
  const T = coupledTangent(net, F, spans, states, K, 0, 0, coupling) ?? coupledTangent(net, F, spans, states, K, SLACK_TENSION, 0, coupling);
  if (!T) return null;
  const zero = new Float64Array(net.straps.length);
  return (p) => T.solve(p, zero, ACCURACY)?.du ?? new Float64Array(p.length).fill(NaN);
}
