// A wheel's ring scan is kept by the values it reads (wheel-ring-scan.ts): a
// later scan of an equal wheel (another object, as a re-run check builds it)
// with other loads takes what was computed, and gives what a fresh solve at
// each position gives, bit for bit; a wheel that differs in any value gets a
// scan of its own. The pre-compression (300 N a spoke), the doubled felloe
// stiffness and the load multiples are test inputs of our own, not figures of
// the trade; the model itself is checked in tests/wheel/wheel-ring.test.ts.
import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { wheelRingSpec, type WheelRingSpec } from '../../src/core/model/wheel/wheel-ring-spec.ts';
import { scanWheelRing } from '../../src/core/model/wheel/wheel-ring-scan.ts';
import { solveWheelRing } from '../../src/core/model/wheel/wheel-ring.ts';

function demoWheel(): { ws: WheelRingSpec; P: number } {
  const a = new Analysis(prepared(readDemo('demo-two-crew')), rulesData, undefined, { ride: false });
  return { ws: wheelRingSpec(a.spec, rulesData, a.mass.layout), P: a.staticCase.axle_load_N / 2 };
}

describe('the ring scan kept by value', () => {
  it('serves an equal wheel with other loads (spokes that only push: the unit scan, scaled)', () => {
    const { ws, P } = demoWheel();
    const [first] = scanWheelRing(ws, [P]);
    const [later] = scanWheelRing(structuredClone(ws), [2 * P]);
    // Taken from the kept scan: the same mesh, not a new one.
    expect(later.map((p) => p.result.nodes)).toEqual(first.map((p) => p.result.nodes));
    later.forEach((p, i) => expect(p.result.nodes).toBe(first[i].result.nodes));
    // Scaled from the unit scan, as the check has always scaled it: twice the load, twice every moment.
    later.forEach((p, i) => p.result.moment.forEach((m, j) => expect(m).toBe(first[i].result.moment[j] * 2)));
    // A stiffer felloe is another wheel: its own scan, other moments.
    const stiffer = { ...ws, ring: { ...ws.ring, EI: ws.ring.EI * 2 } };
    const [own] = scanWheelRing(stiffer, [P]);
    expect(own[0].result.nodes).not.toBe(first[0].result.nodes);
    expect(own.some((p, i) => p.result.peak.moment !== first[i].result.peak.moment)).toBe(true);
  });

  it('serves an equal pre-compressed wheel with other loads: each load solved afresh on the kept rings, bit for bit', () => {
    const { ws: base, P } = demoWheel();
    const ws = { ...base, hinged: false, ring: { ...base.ring, precompression: 300 } };
    scanWheelRing(ws, [P, 3.5 * P]);
    const loads = [0.7 * P, 6 * P];
    const scans = scanWheelRing(structuredClone(ws), loads);
    scans.forEach((scan, l) =>
      scan.forEach((p) => {
        expect(p.result.load.P).toBe(loads[l]);
        expect(p.result).toEqual(solveWheelRing(ws.ring, p.result.load));
      }),
    );
  });
});
