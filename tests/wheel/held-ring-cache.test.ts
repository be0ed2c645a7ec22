// A scan of a wheel with a tyre's pre-compression solves every load at every
// contact position on the mesh, tyre state, ring and factors kept for that
// position (wheel-ring-scan.ts, HeldRingCache). Against a fresh solve of each
// load at each position (solveWheelRing without a cache: its own mesh,
// assembly and factor every round), every number must be the same to the
// last bit: the kept ring computes nothing differently, it only computes it
// once. (The model itself is checked in tests/wheel/wheel-ring.test.ts.)
// The pre-compressions (200 and 800 N a spoke) and the load multiples are
// test inputs of our own, chosen so spokes go slack; no figure of the trade.
import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { wheelRingSpec, type WheelRingSpec } from '../../src/core/model/wheel/wheel-ring-spec.ts';
import { scanWheelRing } from '../../src/core/model/wheel/wheel-ring-scan.ts';
import { solveWheelRing } from '../../src/core/model/wheel/wheel-ring.ts';

function tyredDemo(C0: number): { ws: WheelRingSpec; P: number } {
  const a = new Analysis(prepared(readDemo('demo-two-crew')), rulesData, undefined, { ride: false });
  const ws = wheelRingSpec(a.spec, rulesData, a.mass.layout);
  return { ws: { ...ws, hinged: false, ring: { ...ws.ring, precompression: C0 } }, P: a.staticCase.axle_load_N / 2 };
}

describe('a pre-compressed wheel scanned with each position kept across loads', () => {
  for (const C0 of [200, 800]) {
    it(`gives every load the fresh solve's result, bit for bit (C0 ${C0} N)`, () => {
      const { ws, P } = tyredDemo(C0);
      // Loads from a light one to a stone's, so the bearing spokes differ between them.
      const loads = [0.5 * P, P, 3.5 * P, 10 * P];
      const around = [-0.05, 0.05];
      const scans = scanWheelRing(ws, loads, around);
      let slackSomewhere = false;
      scans.forEach((scan, l) => {
        for (const p of scan) {
          const fresh = solveWheelRing(ws.ring, p.result.load);
          expect(p.result).toEqual(fresh);
          expect(p.result.load.P).toBe(loads[l]);
          if (p.result.spokes.some((s) => !s.active)) slackSomewhere = true;
        }
      });
      // The heavy loads unload spokes: the kept factors then serve more than one set of bearing spokes.
      expect(slackSomewhere).toBe(true);
    });
  }
});
