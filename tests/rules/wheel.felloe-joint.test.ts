import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { tenonBearing } from '../../src/core/rules/wheel/felloe-joint.ts';
import { dataWithGround, deepMerge, findingsOf, handSpec, prepared, readDemo } from '../support/fixtures.ts';
import { expectPlainTemplates, expectUtilisationBoundary, governingStep, stepsOf } from '../support/member-support.ts';

const rigid = dataWithGround('hand-rigid', 0);
const RULE = 'wheel.felloe-joint';
const one = async (raw: unknown, limits: Record<string, number> = {}) => (await findingsOf(RULE, raw, limits, rigid))[0];

/** The hand spec's wheel: four spokes, a bent felloe in two halves. */
const fourSpokes = (joint: Record<string, unknown> = {}) => deepMerge(handSpec(), { wheels: { spokes: 4, felloe: { pieces: 2, bend_radius_mm: 405, joint } } });

/** The rim shear the governing case's working reads at the joint, N. */
function jointShear(text: string, caseTitle: string): number {
  const from = text.indexOf(`${caseTitle} [`);
  const m = /rim shear at the joint ([\d.]+) N/.exec(text.slice(from));
  if (!m) throw new Error('no rim shear in the working');
  return Number(m[1]);
}

describe(RULE, () => {
  it('passes the central-axle demo and names its joint', async () => {
    const f = (await findingsOf(RULE, readDemo('demo-two-crew')))[0];
    expect(f.severity).toBe('pass');
    expect(f.subject).toBe('wheel.felloe.joint');
    expect(f.working_text).toContain('each joint is a hinge of the ring');
  });

  it('hand calculation: the dowels share the rim shear, τ = V/(count·π·d²/4)', async () => {
    const f = await one(fourSpokes());
    // The schema's default joint: 2 dowels of 12 mm.
    const V = jointShear(f.working_text, f.params.case as string);
    const tau = governingStep(f, 'τ = V_dowels/(count·π·d²/4)');
    expect(tau.substituted).toMatch(/ \/ \(2 × π × 12²\/4\)$/);
    // V as the working prints it (four significant figures), so the hand value agrees to 1e-3.
    expect(tau.result! / (V / ((2 * Math.PI * 12 ** 2) / 4))).toBeCloseTo(1, 3);
    expect(f.value).toBe(tau.result);
  });

  it('hand statics: the shear across a hinged joint is at least half the wheel load (the contact beside it)', async () => {
    // With the contact on the joint, each half of the ring takes P/2 by symmetry, and the contact just to
    // one side puts that P/2 across the dowels; nearer a spoke more of P crosses.
    const raw = fourSpokes();
    const a = new Analysis(prepared(raw, rigid), rigid);
    const f = await one(raw);
    const gov = a.memberCases.find((c) => c.id === f.load_case)!;
    expect(jointShear(f.working_text, gov.title)).toBeGreaterThanOrEqual(0.5 * gov.wheel_N * (1 - 1e-3));
    expect(jointShear(f.working_text, gov.title)).toBeLessThanOrEqual(gov.wheel_N);
  });

  it('the dowel stress falls as count × d² grows', async () => {
    const base = (await one(fourSpokes({ count: 2, diameter_mm: 12 }))).value!;
    const more = (await one(fourSpokes({ count: 3, diameter_mm: 16 }))).value!;
    expect(more / base).toBeCloseTo((2 * 12 ** 2) / (3 * 16 ** 2), 9);
  });

  it('a tenon keeps the ring continuous and bears: p = (V/l + 6(M + V·l/2)/l²)/d against the strength across the grain', async () => {
    // A rigid tongue of length l in its socket, linear bearing: resultant V at mid-length,
    // moment about mid-length M + V·l/2, peak q = V/l + 6·M_c/l² per length; over a width d.
    expect(tenonBearing(100, 0, 10, 50)).toBeCloseTo(100 / 50 / 10 + (6 * 100 * 25) / 2500 / 10, 12);
    expect(tenonBearing(0, 5000, 20, 50)).toBeCloseTo((6 * 5000) / 2500 / 20, 12);
    const f = await one(fourSpokes({ kind: 'tenon', count: 1, diameter_mm: 20, length_mm: 80 }));
    expect(f.working_text).toContain('the ring is continuous through the joints');
    expect(stepsOf(f, 'p = (V/l + 6·(M + V·l/2)/l²)/d, per tenon').length).toBeGreaterThan(0);
    expect(stepsOf(f, 'σ = (M/count)/(π·d³/32)').length).toBeGreaterThan(0);
    // A 20 mm tenon cannot carry a rim moment midway between spokes: it fails in bending at its mouth.
    expect(f.severity).toBe('fail');
  });

  it('its messages hold no numbers of their own', () => {
    expectPlainTemplates(RULE);
  });

  it('boundary: a stress equal to the design strength passes', async () => {
    await expectUtilisationBoundary(RULE, readDemo('demo-two-crew'), (f) => f[0]);
  });
});
