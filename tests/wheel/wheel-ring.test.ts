import { describe, expect, it } from 'vitest';
import { solveWheelRing, type WheelRing, type WheelRingResult } from '../../src/core/model/wheel/wheel-ring.ts';
import { RING_ELEMENTS_PER_SPAN } from '../../src/core/model/wheel/wheel-ring-spec.ts';

// The wheel's ring frame: the felloe on spokes that push, the ground load at
// the contact. Checked by statics (the spokes carry the ground load), against
// the thin-ring closed form where it applies (the tyre's pre-compression
// alone), against hand statics of a ring hinged at its joints (a determinate
// case), by mesh convergence, and against the figures of the design notes.

const E = 12000; // MPa, demo data (white ash about 12 GPa)
const b = 42;
const h = 46;
const wheel = (over: Partial<WheelRing> = {}): WheelRing => ({
  radius: 447,
  spokes: 6,
  EI: (E * b * h ** 3) / 12,
  EA: E * b * h,
  spokeStiffness: (E * 36 * 30) / 310,
  spokeLength: 310,
  precompression: 0,
  elementsPerSpan: 32,
  ...over,
});
const P = 1000;
const between = (r: WheelRing) => Math.PI / r.spokes;

/** The vertical and horizontal sums of the spokes' pushes on the rim. */
function spokeSums(r: WheelRingResult) {
  return {
    up: r.spokes.reduce((s, sp) => s + sp.force * Math.cos(sp.angle), 0),
    across: r.spokes.reduce((s, sp) => s + sp.force * Math.sin(sp.angle), 0),
  };
}

describe('wheel ring: statics', () => {
  for (const n of [4, 6, 8, 12]) {
    for (const where of ['between', 'under'] as const) {
      it(`${n} spokes, contact ${where === 'between' ? 'midway between two' : 'under one'}: the spokes only push and carry P (vertical sum P, across 0)`, () => {
        const ring = wheel({ spokes: n });
        const r = solveWheelRing(ring, { P, spokeOffset: where === 'between' ? between(ring) : 0 });
        const s = spokeSums(r);
        // Hand statics of the rim: P + Σ F_i·e_r,i = 0, so Σ F_i cos θ_i = P and Σ F_i sin θ_i = 0.
        // Up to the token stiffness across the spokes, far below a millionth of P.
        expect(Math.abs(s.up / P - 1)).toBeLessThan(1e-6);
        expect(Math.abs(s.across / P)).toBeLessThan(1e-6);
        for (const sp of r.spokes) expect(sp.force).toBeGreaterThanOrEqual(0);
        expect(r.tokenForce).toBeLessThan(1e-6 * P);
      });
    }
  }

  it('contact under a spoke: that spoke takes nearly all of P and the rim hardly bends', () => {
    const r = solveWheelRing(wheel(), { P, spokeOffset: 0 });
    expect(r.spokes[0].force / P).toBeGreaterThan(0.99);
    expect(r.coefficient).toBeLessThan(0.01);
  });
});

describe('wheel ring: against the design notes (design-basis-members)', () => {
  it('push-only spokes, contact midway: c = M/(P·span) within 0.18-0.20, the peak under the contact', () => {
    const r = solveWheelRing(wheel(), { P, spokeOffset: Math.PI / 6 });
    expect(r.coefficient).toBeGreaterThan(0.18);
    expect(r.coefficient).toBeLessThan(0.2);
    expect(r.peak.angle).toBe(0);
    // Inner face in tension under the contact: the rim flattens there.
    expect(r.peak.moment).toBeGreaterThan(0);
  });

  it('every spoke bearing (a large pre-compression, its own state taken off): c about 0.17', () => {
    // The ground load's share, by superposition: the same ring with and without P.
    const ring = wheel({ precompression: 50 * P });
    const withP = solveWheelRing(ring, { P, spokeOffset: Math.PI / 6 });
    const alone = solveWheelRing(ring, { P: 0, spokeOffset: Math.PI / 6 });
    expect(withP.spokes.every((s) => s.active)).toBe(true);
    const c = (withP.moment[0] - alone.moment[0]) / (P * withP.span);
    expect(c).toBeGreaterThan(0.16);
    expect(c).toBeLessThan(0.18);
  });

  it('both below the simple beam, P·span/4', () => {
    const r = solveWheelRing(wheel(), { P, spokeOffset: Math.PI / 6 });
    expect(r.coefficient).toBeLessThan(0.25);
  });
});

describe('wheel ring: the tyre pre-compression state against the thin-ring closed form (roark-thin-ring)', () => {
  it('alone (P = 0) it is n outward loads C0 against an even pressure: M midway = (C0 R/2)(1/sin α − 1/α), at a spoke −(C0 R/2)(1/α − cot α)', () => {
    const C0 = 500;
    const ring = wheel({ precompression: C0 });
    const a = Math.PI / 6;
    const mid = solveWheelRing(ring, { P: 0, spokeOffset: a });
    const at = solveWheelRing(ring, { P: 0, spokeOffset: 0 });
    // Outward loads: the sign of the inward-load case turned over (inner face in tension midway).
    expect(mid.moment[0] / (((C0 * ring.radius) / 2) * (1 / Math.sin(a) - 1 / a))).toBeCloseTo(1, 2);
    expect(at.moment[0] / (((-C0 * ring.radius) / 2) * (1 / a - 1 / Math.tan(a)))).toBeCloseTo(1, 2);
    // Every spoke keeps exactly C0 without the ground.
    for (const s of mid.spokes) expect(s.force).toBeCloseTo(C0, 6);
  });

  it('with P the spokes carry C0 + their share, the sums still give P', () => {
    const r = solveWheelRing(wheel({ precompression: 2 * P }), { P, spokeOffset: Math.PI / 6 });
    expect(Math.abs(spokeSums(r).up / P - 1)).toBeLessThan(1e-6);
    expect(r.spokes.every((s) => s.active)).toBe(true);
  });
});

describe('wheel ring: a ring hinged at its joints against hand statics', () => {
  // Four spokes at ±45° from the contact, hinges at the contact and opposite:
  // the spokes beside the contact bear, the far two go slack, and each half is
  // determinate. Right half: at the bottom hinge P/2 up and H_b across, at the
  // top hinge H_t across, the spoke F along its radius. ΣF_y: F = P/(2 cos α);
  // moments about the hub: H_b = H_t; ΣF_x: H_b = −F sin α/2 = −(P/4) tan α.
  // At the spoke: M = (P R/2) sin α + (P R/4) tan α (1 − cos α).
  it('4 spokes: the moment at the spokes beside the contact and the spoke forces', () => {
    const ring = wheel({ spokes: 4, radius: 423 });
    const r = solveWheelRing(ring, { P, spokeOffset: Math.PI / 4, hinges: [0, Math.PI] });
    const a = Math.PI / 4;
    const hand = ((P * ring.radius) / 2) * Math.sin(a) + ((P * ring.radius) / 4) * Math.tan(a) * (1 - Math.cos(a));
    const atSpoke = r.nodes.findIndex((x) => Math.abs(x - a) < 1e-9);
    expect(Math.abs(r.moment[atSpoke]) / hand).toBeCloseTo(1, 3);
    expect(r.spokes[0].force).toBeCloseTo(P / (2 * Math.cos(a)), 3);
    expect(r.spokes[1].force).toBe(0);
    expect(Math.abs(r.moment[0])).toBeLessThan(1e-6 * P * ring.radius);
    // The peak is at the spokes: c = M/(P·span), span = 2πR/4.
    expect(r.coefficient).toBeCloseTo(hand / (P * r.span), 3);
  });
});

describe('wheel ring: the token stiffness across the spokes', () => {
  it('does not change the answer, continuous or hinged at every joint (where the spokes hold the rim sideways)', () => {
    const six = Array.from({ length: 6 }, (_, k) => (2 * Math.PI * k) / 6);
    for (const hinges of [[], six]) {
      const c = [1e-6, 1e-7, 1e-8].map((token) => solveWheelRing(wheel({ token }), { P, spokeOffset: Math.PI / 6, hinges }));
      for (const r of c) expect(Math.abs(r.coefficient / c[1].coefficient - 1)).toBeLessThan(1e-4);
      // A continuous ring takes nothing from it; six hinged segments lean on it.
      if (hinges.length === 0) expect(c[1].tokenForce).toBeLessThan(1e-6 * P);
      else expect(c[1].tokenForce).toBeGreaterThan(0.01 * P);
    }
  });
});

describe('wheel ring: mesh convergence', () => {
  it(`c settles as the square of the element length; ${RING_ELEMENTS_PER_SPAN} elements a span are within 0.1 % of 128`, () => {
    const c = [8, 16, 32, 64, 128].map((m) => solveWheelRing(wheel({ elementsPerSpan: m }), { P, spokeOffset: Math.PI / 6 }).coefficient);
    const d = c.slice(1).map((v, i) => Math.abs(v - c[i]));
    expect(d[0] / d[1]).toBeGreaterThan(3);
    expect(d[1] / d[2]).toBeGreaterThan(3);
    const used = solveWheelRing(wheel({ elementsPerSpan: RING_ELEMENTS_PER_SPAN }), { P, spokeOffset: Math.PI / 6 }).coefficient;
    expect(Math.abs(used / c[4] - 1)).toBeLessThan(1e-3);
  });
});
