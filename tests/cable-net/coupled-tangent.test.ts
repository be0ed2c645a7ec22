import { describe, expect, it } from 'vitest';
import { strapSpans } from '../../src/core/model/cable-net/coupled-solve.ts';
import { coupledTangent, couplingPreconditioner } from '../../src/core/model/cable-net/coupled-tangent.ts';
import { buildNet, type StrapLine } from '../../src/core/model/cable-net/net.ts';
import { coupledPairs, nodeOrder } from '../../src/core/model/cable-net/node-order.ts';
import { segmentState } from '../../src/core/model/cable-net/segment.ts';
import { SkylineCholesky } from '../../src/core/model/cable-net/skyline.ts';

// The coupled tangent's step two ways: with this state's Schur complement
// formed and factored (the direct solve), and by GMRES on the strap system
// preconditioned with the factor kept from another state (Saad & Schultz
// 1986). Both solve the same linear system, so they must give the same step
// to the solver's tolerance. The direct path is the one the closed-form tests
// of the coupled floor check (tests/floor-frame/coupled-strap.test.ts).

const EA = 300 * 30 * 10;
const SIDE = 600;
const COUNT = 4;

/** A square two-way weave of COUNT straps each way, nodes at the crossings and midway between. */
function weave() {
  const at = (k: number) => ((k + 1) * SIDE) / (COUNT + 1);
  const lines: StrapLine[] = [];
  for (const family of ['front-to-back', 'side-to-side'] as const) {
    for (let k = 0; k < COUNT; k++) {
      lines.push({
        family,
        number: k + 1,
        of: COUNT,
        cross: at(k),
        start: 0,
        end: SIDE,
        rails: family === 'front-to-back' ? ['rear', 'front'] : ['right', 'left'],
        stations: Array.from({ length: COUNT }, (_, j) => ({ s: at(j), key: family === 'front-to-back' ? `${j},${k}` : `${k},${j}` })),
        EA,
        pretension: 60,
        refine: 2,
      });
    }
  }
  return buildNet(lines);
}

describe('coupled tangent: GMRES with a kept preconditioner against the formed Schur complement', () => {
  const net = weave();
  const n = net.nodes.length;
  const m = net.straps.length;
  const spans = strapSpans(net);
  // A symmetric positive-definite flexibility, mm/N: each strap's own give and a share of its neighbours'.
  const F = new Float64Array(m * m);
  for (let s = 0; s < m; s++) for (let t = 0; t < m; t++) F[s * m + t] = 0.004 * Math.exp(-Math.abs(s - t));
  const bowl = (depth: number) => Float64Array.from(net.nodes, (p) => depth * Math.sin((Math.PI * p.x) / SIDE) * Math.sin((Math.PI * p.y) / SIDE));
  const statesAt = (u: Float64Array) => net.segments.map((seg) => segmentState(seg, seg.a < 0 ? 0 : u[seg.a], seg.b < 0 ? 0 : u[seg.b]));
  const K = () => new SkylineCholesky(n, coupledPairs(net), nodeOrder(net));
  const ru = Float64Array.from(net.nodes, (p, i) => 10 + 5 * Math.sin(i));
  const rH = Float64Array.from({ length: m }, (_, s) => 3 * Math.cos(s));

  it('the same step both ways, with GMRES doing the work on the second state', () => {
    const kept = couplingPreconditioner();
    // The kept factor from a shallow state, then a deep one solved with it.
    coupledTangent(net, F, spans, statesAt(bowl(5)), K(), 0, 0, kept)!.solve(ru, rH);
    expect(kept.formed).toBe(1);
    const viaGmres = coupledTangent(net, F, spans, statesAt(bowl(40)), K(), 0, 0, kept)!.solve(ru, rH)!;
    expect(kept.formed).toBe(1);
    expect(kept.products).toBeGreaterThan(0);
    const fresh = couplingPreconditioner();
    const direct = coupledTangent(net, F, spans, statesAt(bowl(40)), K(), 0, 0, fresh)!.solve(ru, rH)!;
    expect(fresh.formed).toBe(1);
    const scale = (v: Float64Array) => Math.max(...v.map(Math.abs));
    viaGmres.du.forEach((v, i) => expect(Math.abs(v - direct.du[i])).toBeLessThan(1e-8 * scale(direct.du)));
    viaGmres.dl.forEach((v, s) => expect(Math.abs(v - direct.dl[s])).toBeLessThan(1e-8 * scale(direct.dl)));
  });

  it('rigid anchors (F = 0): the pulls step by their own residual, the sags as the net alone', () => {
    const zero = new Float64Array(m * m);
    const u = bowl(30);
    const step = coupledTangent(net, zero, spans, statesAt(u), K(), 0, 0)!.solve(ru, rH)!;
    // With e = F·λ = 0 the net does not see λ: Δu = K_uu⁻¹·r_u, and (S·0 + I)·Δλ = r_λ − K_ueᵀ·Δu.
    const Kuu = K();
    const T = coupledTangent(net, zero, spans, statesAt(u), Kuu, 0, 0)!;
    const alone = T.solve(ru, new Float64Array(m))!;
    step.du.forEach((v, i) => expect(v).toBeCloseTo(alone.du[i], 9));
    // Δλ is linear in r_λ with unit slope when F = 0.
    const shifted = T.solve(ru, rH.map((v) => v + 1))!;
    shifted.dl.forEach((v, s) => expect(v - step.dl[s]).toBeCloseTo(1, 9));
  });
});
