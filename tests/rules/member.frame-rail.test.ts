import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData, withParams } from '../support/fixtures.ts';
import { expectPlainTemplates, expectUtilisationBoundary, stepsOf } from '../support/member-support.ts';
import { ONE_STRAP, oneStrapHand } from '../support/one-strap-floor.ts';

const RULE = 'member.frame-rail';
// The central-axle demo (floor 560 × 1020 mm) with deep 50 × 120 mm rails of selected
// stock and two-way rawhide straps 30 × 10 mm at 32 mm pitch, 60 N (demo data).
const DEEP_RAILS = {
  box: { floor: { depth_mm: 560, width_mm: 1020, frame: { width_mm: 120, thickness_mm: 50, bend_radius_mm: 300 } } },
  floor_straps: { material: 'rawhide', width_mm: 30, thickness_mm: 10, pitch_mm: 32, weave: 'two-way', pretension_N: 60 },
  stock: { grade: 'selected' },
};
const deepRails = (patch: unknown = {}) => deepMerge(deepMerge(readDemo('demo-two-crew'), DEEP_RAILS), patch);
const one = async (raw: unknown, data = rulesData) => (await findingsOf(RULE, raw, {}, data))[0];
// W = t·w²/6 of the 45 mm thick rail bent in plan about its 80 mm width (the rear-axle demo), mm³.
const W = (45 * 80 ** 2) / 6;

describe(RULE, () => {
  it('passes deep rails of selected stock', async () => {
    const f = await one(deepRails());
    expect(f.severity).toBe('pass');
    expect(f.message_key).toBe('within');
    expect(f.subject).toMatch(/^frame\.(front|rear|left|right)-rail$/);
  });

  it('hand calculation: one strap on a rectangular loop, the side rail\'s moment under the strap', async () => {
    // tests/support/one-strap-floor.ts: one side-to-side strap at mid-depth of the rear-axle
    // demo's square frame, solved by hand (compatibility of its stretch with the frame's
    // deflection) for its pull H; the rectangle with rigid corners pulled in at the middle of its
    // sides a = 588 mm (b = 1060 mm) bends most under the pull: M_A = H·a·(a + 2b)/(8·(a + b)),
    // with no axial force there (the rear and front rails carry H/2 in compression).
    const raw = deepMerge(readDemo('demo-rear-axle'), ONE_STRAP);
    const a = new Analysis(prepared(raw), rulesData);
    const f = await one(raw);
    expect(f.subject).toMatch(/^frame\.(left|right)-rail$/);
    // The floor's design states: the crew × 1.5 standing and × 1.5 φ over rough ground (fundamental,
    // k_mod short 0.9, γ_M 1.3), × φ_stone on the stone (accidental, k_mod 1.1, γ_M 1.0; EN 1995-1-1
    // Tables 3.1 and 2.3, 2.4.1). The governing case has the highest M/f_d, found by hand.
    const states = [
      { id: 'static', m: a.floorDesign, kOverGamma: 0.9 / 1.3 },
      { id: 'rough-ground', m: a.floorDesignRough, kOverGamma: 0.9 / 1.3 },
      { id: 'stone', m: a.floorStone, kOverGamma: 1.1 / 1.0 },
    ].map((c) => ({ ...c, MA: oneStrapHand(80 * 9.80665 * c.m.factor, c.m.frame!.E_MPa, c.m.EA_N).MA }));
    const gov = states.reduce((w, c) => (c.MA / c.kOverGamma > w.MA / w.kOverGamma ? c : w));
    expect(f.load_case).toBe(gov.id);
    expect(f.value! / (gov.MA / W) - 1).toBeCloseTo(0, 6);
    const h = oneStrapHand(80 * 9.80665 * gov.m.factor, gov.m.frame!.E_MPa, gov.m.EA_N);
    expect(h.MA / h.pull).toBeCloseTo((588 * (588 + 2 * 1060)) / (8 * (588 + 1060)), 9);
    // The pretension alone, no one aboard: the strap keeps T_0/(1 + F·(EA + T_0)/L) of its 60 N.
    const pre = 60 / (1 + (h.F * (a.floorStatic.EA_N + 60)) / 980);
    const [preStep] = stepsOf(f, 'largest moment in plan on the left rail');
    expect(preStep.result! / (pre * h.mA) - 1).toBeCloseTo(0, 6);
    // Four cases (pretension, standing, rough ground, the stone) on each of the four rails.
    expect(stepsOf(f, 'σ_m = M/W')).toHaveLength(16);
    // The rear rail holds the side rails apart: compression H/2 beside its corner moment.
    const rear = stepsOf(f, 'axial force there (compression)');
    expect(rear.length).toBeGreaterThan(0);
  });

  it('fails slender rails', async () => {
    const f = await one(deepMerge(readDemo('demo-two-crew'), { box: { floor: { frame: { width_mm: 20, thickness_mm: 15 } } } }));
    expect(f.severity).toBe('fail');
    expect(f.message_key).toBe('over');
  });

  it('warns, and does not pass, when the floor model does not converge', async () => {
    const data = withParams('floor.solver', { max_iterations: 1 });
    const f = await one(readDemo('demo-two-crew'), data);
    expect(f.severity).toBe('warning');
    expect(f.subject).toBe('frame.rails');
    expect(f.message_key).toBe('notChecked');
    expect(f.code).toBe(2303);
    expect(f.message).toContain('did not converge');
    expect(f.value).toBeNull();
    expect(stepsOf(f, 'floor model iterations')[0].result).toBe(1);
  });

  it('its messages hold no numbers of their own', () => {
    expectPlainTemplates(RULE);
  });

  it('boundary: a stress equal to the design strength passes', async () => {
    await expectUtilisationBoundary(RULE, deepRails(), (f) => f[0]);
  });
});
