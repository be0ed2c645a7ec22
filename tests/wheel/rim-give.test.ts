// The rim's give at many contact positions, computed on one ring assembled in
// the wheel's frame with a factor kept for each set of bearing spokes
// (rim-give.ts), against a direct solve of the ring at each position
// (solveWheelRing: its own mesh, its own assembly and factor every round).
// Both are the same model, so they agree to rounding: this checks the
// sharing, not the model (tests/wheel/wheel-ring.test.ts checks that).
import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { wheelRingSpec, type WheelRingSpec } from '../../src/core/model/wheel/wheel-ring-spec.ts';
import { RimGiveScan } from '../../src/core/model/wheel/rim-give.ts';
import { solveWheelRing } from '../../src/core/model/wheel/wheel-ring.ts';
import { wheelStiffness } from '../../src/core/model/wheel/wheel-stiffness.ts';

function demoWheel(raw: Record<string, unknown>): { ws: WheelRingSpec; P: number } {
  const a = new Analysis(prepared(raw), rulesData, undefined, { ride: false });
  return { ws: wheelRingSpec(a.spec, rulesData, a.mass.layout), P: a.staticCase.axle_load_N / 2 };
}

const twoCrew = demoWheel(readDemo('demo-two-crew'));
const wheels: [string, { ws: WheelRingSpec; P: number }][] = [
  ['demo-two-crew (dowelled halves, hinged)', twoCrew],
  ['demo-rear-axle', demoWheel(readDemo('demo-rear-axle'))],
  ['teaching-flawed', demoWheel(readDemo('teaching-flawed'))],
  // Five joints on six spokes fall off the spokes' mesh: positions whose mesh differs get rings of their own.
  ['demo-two-crew in five pieces', demoWheel(deepMerge(readDemo('demo-two-crew'), { wheels: { felloe: { pieces: 5 } } }))],
  // A tyre's pre-compression ties the joints: no hinges, and a slack spoke's C0 comes off the rim.
  ['demo-two-crew with 800 N pre-compression', { ...twoCrew, ws: { ...twoCrew.ws, hinged: false, ring: { ...twoCrew.ws.ring, precompression: 800 } } }],
];

/** The stiffnesses from a direct solve at every position, as wheelStiffness samples them (eight a span round the rim). */
function direct(ws: WheelRingSpec, P: number) {
  const count = 8 * ws.ring.spokes;
  const scan = new RimGiveScan(ws, P);
  const c = Array.from({ length: count }, (_, i) => solveWheelRing(ws.ring, scan.load(((2 * Math.PI) / count) * i)).contactDeflection / 1000 / P);
  return { rolling: count / c.reduce((s, x) => s + x, 0), strike: 1 / Math.min(...c), softest: 1 / Math.max(...c) };
}

describe('the rim give shared across positions against a direct solve at each', () => {
  for (const [name, { ws, P }] of wheels) {
    it(`${name}: the same give and the same settling at every position`, () => {
      const scan = new RimGiveScan(ws, P);
      const count = 8 * ws.ring.spokes;
      for (let i = 0; i < count; i++) {
        const at = ((2 * Math.PI) / count) * i;
        const fast = scan.at(at);
        const slow = solveWheelRing(ws.ring, scan.load(at));
        expect(fast.deflection).toBeGreaterThan(0);
        expect(Math.abs(fast.deflection / slow.contactDeflection - 1), `position ${i}`).toBeLessThan(1e-9);
        expect(fast.unsettled, `position ${i}`).toEqual(slow.unsettled);
      }
    });
  }

  for (const [name, { ws, P }] of wheels.filter(([, w]) => w.ws.hinged || w.ws.ring.precompression > 0)) {
    it(`${name}: wheelStiffness gives the direct solve's rolling, strike and softest stiffness`, () => {
      const k = wheelStiffness(ws, P);
      const d = direct(ws, P);
      for (const key of ['rolling', 'strike', 'softest'] as const) expect(Math.abs(k[key] / d[key] - 1), key).toBeLessThan(1e-9);
    });
  }
});
