import { describe, expect, it } from 'vitest';
import { Analysis } from '../support/analysis.ts';
import { deepMerge, findingsOf, prepared, readDemo, rulesData, withParams } from '../support/fixtures.ts';
import { expectPlainTemplates, expectUtilisationBoundary, governingStep, stepsOf } from '../support/member-support.ts';

const RULE = 'member.frame-rail';
// The central-axle demo (floor 560 × 1020 mm) with deep 50 × 120 mm rails of selected
// stock and two-way rawhide straps 30 × 10 mm at 32 mm pitch, 60 N (demo data).
const DEEP_RAILS = {
  box: { floor: { depth_mm: 560, width_mm: 1020, frame: { width_mm: 120, thickness_mm: 50, bend_radius_mm: 300 } } },
  floor_straps: { material: 'rawhide', width_mm: 30, thickness_mm: 10, pitch_mm: 32, weave: 'two-way', pretension_N: 60 },
  stock: { grade: 'selected' },
};
// W = t·w²/6 of the 50 mm thick rail bent in plan about its 120 mm width, mm³.
const W = (50 * 120 ** 2) / 6;
const deepRails = (patch: unknown = {}) => deepMerge(deepMerge(readDemo('demo-two-crew'), DEEP_RAILS), patch);
const one = async (raw: unknown, data = rulesData) => (await findingsOf(RULE, raw, {}, data))[0];

/**
 * Bending moment at x of a simply supported span L under point loads, by statics:
 * R_A = Σ P_i·(L − a_i)/L, and the moment of R_A and of the loads left of x.
 */
function momentAt(x: number, L: number, loads: { at_mm: number; force_N: number }[]): number {
  const RA = loads.reduce((s, q) => s + (q.force_N * (L - q.at_mm)) / L, 0);
  return RA * x - loads.filter((q) => q.at_mm < x).reduce((s, q) => s + q.force_N * (x - q.at_mm), 0);
}

describe(RULE, () => {
  it('passes deep rails of selected stock', async () => {
    const f = await one(deepRails());
    expect(f.severity).toBe('pass');
    expect(f.message_key).toBe('within');
    expect(f.subject).toMatch(/^frame\.(front|rear|left|right)-rail$/);
  });

  it('hand calculation: the largest moment by statics under the strap-end pulls on the governing rail, bent in plan', async () => {
    const raw = deepRails();
    const a = new Analysis(prepared(raw), rulesData);
    const f = await one(raw);
    expect(f.load_case).toBe('bump');
    expect(f.params.duration).toBe('instantaneous');
    const rail = a.floorBump.rails.find((r) => f.subject === `frame.${r.rail}-rail`)!;
    expect(f.subject_label).toBe(`${rail.rail} rail of the floor frame`);
    // Between loads the moment is linear in x, so its largest value sits under a load.
    const M = Math.max(...rail.pulls.map((q) => momentAt(q.at_mm, rail.span_mm, rail.pulls)));
    expect(rail.pulls.length).toBeGreaterThan(0);
    expect(f.value).toBeCloseTo(M / W, 9);
    // The bump factor comes from the ride model here, and the finding cites it.
    expect(f.sources).toContain('design-basis-ride');
    // Three cases (pretension, standing, bump) on each rail the straps pull on.
    expect(stepsOf(f, 'σ = M_max/W')).toHaveLength(3 * a.floorStatic.rails.filter((r) => r.total_N > 0).length);
  });

  it('the pretension alone: each strap end pulls T_0 on its rail, a permanent case', async () => {
    // At T_0 = 600 N the pretension, held for good (k_mod 0.6), governs. Front rail, span
    // L = 1020 mm: floor(1020/32) = 31 strap ends at 32 mm pitch, centred, a_k = 510 + 32·k,
    // k = −15 … 15. Symmetric, so R_A = 31 × 600 / 2 = 9300 N and the moment peaks at midspan:
    // M = R_A·L/2 − Σ_{k=1..15} T_0·32·k = 9300 × 510 − 600 × 32 × 120 = 2 439 000 N·mm.
    // (Side rails, L = 560 mm, 17 ends: 5100 × 280 − 600 × 32 × 36 = 736 800 N·mm, less.)
    // σ = M/W = 2 439 000 / 120 000 = 20.325 MPa.
    const f = await one(deepRails({ floor_straps: { pretension_N: 600 } }));
    expect(f.subject).toBe('frame.front-rail');
    expect(f.load_case).toBe('pretension');
    expect(f.params).toMatchObject({ case: 'strap pretension alone', duration: 'permanent', kMod: 0.6, mode: 'front rail' });
    expect(f.message).toContain('"strap pretension alone" (permanent load, k_mod 0.6)');
    expect(f.value).toBeCloseTo(2_439_000 / W, 9);
    expect(f.value).toBeCloseTo(20.325, 9);
    expect(f.working_text).toContain('strap pretension alone [permanent]: each strap end pulls T_0 on its rail (T_0 = 600 N, pitch 32 mm)');
    const Mstep = governingStep(f, 'M_max = max over x of [R_A·x − Σ P_i·(x − a_i)]');
    expect(Mstep.formula).toContain('at x = 510 mm');
    expect(Mstep.result).toBeCloseTo(2_439_000, 6);
    // The uniform load of the same total, w = ΣP/L = 18 600 / 1020 N/mm, for comparison:
    // w·L²/8 = 18 600 × 1020 / 8 = 2 371 500 N·mm.
    expect(governingStep(f, 'ΣP over 31 strap ends').result).toBe(18_600);
    expect(governingStep(f, 'for comparison, a uniform load').result).toBeCloseTo(2_371_500, 6);
  });

  it('fails slender rails', async () => {
    const f = await one(deepMerge(readDemo('demo-two-crew'), { box: { floor: { frame: { width_mm: 30, thickness_mm: 30 } } } }));
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
