// The wheel's radial stiffness (wheel-stiffness.ts). Where the spokes only
// push and carry no pre-compression, the ring is linear elastic on supports
// that act one way from zero gap, so its give is proportional to the ground
// load (the contact problem is positively homogeneous of degree one: which
// spokes go slack does not depend on the load's size) and the stiffness does
// not depend on the load. It is found at a unit load and kept by the ring.
// Checked against a direct solve of the ring at each position (solveWheelRing,
// its own mesh and factor) at loads far apart; a pre-compressed wheel's
// stiffness does depend on the load, and is found at the load itself. The
// load multiples, the doubled felloe stiffness and the 800 N pre-compression
// are test inputs of our own, not figures of the trade.
import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { wheelRingSpec, type WheelRingSpec } from '../../src/core/model/wheel/wheel-ring-spec.ts';
import { RimGiveScan } from '../../src/core/model/wheel/rim-give.ts';
import { solveWheelRing } from '../../src/core/model/wheel/wheel-ring.ts';
import { wheelStiffness } from '../../src/core/model/wheel/wheel-stiffness.ts';
import { forgetKeptValues } from '../../src/core/pipeline/kept-values.ts';

function demoWheel(name: string): { ws: WheelRingSpec; P: number } {
  const a = new Analysis(prepared(readDemo(name)), rulesData, undefined, { ride: false });
  return { ws: wheelRingSpec(a.spec, rulesData, a.mass.layout), P: a.staticCase.axle_load_N / 2 };
}

/** Rolling and strike stiffness from a direct solve at every position wheelStiffness samples (eight a span), N/m. */
function direct(ws: WheelRingSpec, P: number): { rolling: number; strike: number } {
  const count = ws.hinged || ws.ring.precompression > 0 ? 8 * ws.ring.spokes : 8;
  const scan = new RimGiveScan(ws, P);
  const c = Array.from({ length: count }, (_, i) => solveWheelRing(ws.ring, scan.load(((2 * Math.PI) / ws.ring.spokes / 8) * i)).contactDeflection / 1000 / P);
  return { rolling: count / c.reduce((s, x) => s + x, 0), strike: 1 / Math.min(...c) };
}

const near = (a: number, b: number) => Math.abs(a / b - 1);

describe('the wheel stiffness', () => {
  for (const name of ['demo-two-crew', 'teaching-flawed']) {
    it(`${name}: without pre-compression it does not depend on the load (direct solves at a tenth, once and five times the load)`, () => {
      const { ws, P } = demoWheel(name);
      expect(ws.ring.precompression).toBe(0);
      const k = wheelStiffness(ws, P);
      for (const f of [0.1, 1, 5]) {
        const d = direct(ws, f * P);
        expect(near(k.rolling, d.rolling), `rolling at ${f} P`).toBeLessThan(1e-9);
        expect(near(k.strike, d.strike), `strike at ${f} P`).toBeLessThan(1e-9);
      }
    });
  }

  it('is kept by the ring: an equal wheel under another load takes it, another ring gets its own', () => {
    forgetKeptValues();
    const { ws, P } = demoWheel('demo-two-crew');
    const first = wheelStiffness(ws, P);
    expect(wheelStiffness(structuredClone(ws), 3 * P)).toBe(first);
    const stiffer = wheelStiffness({ ...ws, ring: { ...ws.ring, EI: ws.ring.EI * 2 } }, P);
    expect(stiffer.strike).toBeGreaterThan(first.strike);
    forgetKeptValues();
    const again = wheelStiffness(ws, P);
    expect(again).not.toBe(first);
    expect(again).toEqual(first);
  });

  it('with a pre-compressed tyre depends on the load, each found at its own load', () => {
    const { ws: base, P } = demoWheel('demo-two-crew');
    const ws = { ...base, hinged: false, ring: { ...base.ring, precompression: 800 } };
    const light = wheelStiffness(ws, 0.5 * P), heavy = wheelStiffness(ws, 4 * P);
    expect(near(light.rolling, heavy.rolling)).toBeGreaterThan(1e-3);
    for (const [k, f] of [[light, 0.5], [heavy, 4]] as const) expect(near(k.rolling, direct(ws, f * P).rolling)).toBeLessThan(1e-9);
  });
});
