import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, fractionHitting, readDemo, rulesData, withParams } from '../support/fixtures.ts';

const RULE = 'lashing.tension';
const demo = readDemo('demo-two-crew');
const axleToFloor = (wraps: number) => ({ lashings: [{ joint: 'axle-to-floor', material: 'rawhide', width_mm: 12, thickness_mm: 3, wraps }] });
// The one strength chain of leather and rawhide (design basis, section 1): f_d = f_k / gamma_M for a strand that
// wraps round (no joint), 20 MPa for rawhide (rules/materials/leathers.yaml, from memory), gamma_M 1.5 in the
// fundamental combination and 1.0 in the accidental one (rules/parameters/leather.yaml).
const FD = 20 / 1.5;
const FD_ACC = 20 / 1.0;

describe(RULE, () => {
  it('passes for the central-axle demo, driven dry', async () => {
    const found = await findingsOf(RULE, demo);
    expect(found.map((f) => f.subject)).toEqual(['joint.pole-to-axle', 'joint.pole-to-yoke', 'joint.axle-to-floor']);
    expect(found.map((f) => f.subject_label)).toEqual(['pole-to-axle lashing', 'pole-to-yoke lashing', 'axle-to-floor lashing']);
    expect(found.every((f) => f.severity === 'pass')).toBe(true);
    expect(found[0].sources).toEqual(expect.arrayContaining(['design-basis-lashings', 'from-memory']));
  });

  it('hand calculation: capacity 2·n·b·t·f_d, strand pull the larger of the design joint force and 2·n·T_pre', async () => {
    // 12 wraps of rawhide 16 × 3 mm laid at 110 N on the pole-to-axle joint (demo data).
    const lashings = [
      { joint: 'pole-to-axle', material: 'rawhide', width_mm: 16, thickness_mm: 3, wraps: 12, pretension_N: 110 },
      { joint: 'pole-to-yoke', material: 'rawhide', width_mm: 16, thickness_mm: 3, wraps: 14, pretension_N: 110 },
      { joint: 'axle-to-floor', material: 'rawhide', width_mm: 12, thickness_mm: 3, wraps: 8 },
    ];
    const [f] = await findingsOf(RULE, deepMerge(demo, { lashings }));
    expect(f.subject).toBe('joint.pole-to-axle');
    // The governing case is the one with the highest strand pull over its own combination's capacity:
    // fundamental 2 × 12 × 16 × 3 × 20/1.5 = 15360 N, accidental 2 × 12 × 16 × 3 × 20 = 23040 N (hand calculation).
    expect([2 * 12 * 16 * 3 * FD, 2 * 12 * 16 * 3 * FD_ACC]).toContainEqual(expect.closeTo(f.params.capacity as number, 9));
    expect(f.value!).toBeGreaterThanOrEqual(2640); // never less than its own pretension, 2 × 12 × 110 = 2640 N
    expect(f.utilisation!).toBeCloseTo(f.value! / (f.params.capacity as number), 12);
    expect(f.severity).toBe('pass');
  });

  it('fails where the wraps are too few for the rough-ground rebound of the box, factored 1.5', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, axleToFloor(2)));
    // 2 × 2 × 12 × 3 × 20/1.5 = 1920 N against 1.5 × the box's rebound (φ − 1)·m·g
    expect(f.severity).toBe('fail');
    expect(['rough-ground', 'stone']).toContain(f.load_case);
    expect(f.params.capacity as number).toBeCloseTo(f.combination === 'accidental' ? 2 * 2 * 12 * 3 * FD_ACC : 2 * 2 * 12 * 3 * FD, 9);
    expect(f.working_text).toContain('apart = (φ − 1)·m·g');
  });

  it('driven wet, the strength falls by the wet strength factor', async () => {
    const [dry] = await findingsOf(RULE, deepMerge(demo, axleToFloor(8)));
    const [wet] = await findingsOf(RULE, deepMerge(demo, { ...axleToFloor(8), operation: { wet: true } }));
    // rawhide wet: 0.4 of its dry strength (rules/materials/leathers.yaml, from memory)
    const k = rulesData.leathers.rawhide.wet_strength_factor.value;
    expect((wet.params.capacity as number) / (wet.combination === 'accidental' ? FD_ACC : FD)).toBeCloseTo(((dry.params.capacity as number) / (dry.combination === 'accidental' ? FD_ACC : FD)) * k, 6);
    expect(wet.utilisation!).toBeGreaterThan(dry.utilisation!);
    expect(wet.params.state).toBe('wet');
  });

  it('boundary: the hard level of the utilisation limit scales the capacity', async () => {
    const raw = deepMerge(demo, axleToFloor(8));
    const [f] = await findingsOf(RULE, raw);
    const capacity = f.params.capacity as number;
    // The least level whose limit is not below the value (no double may hit it exactly).
    const hit = fractionHitting(f.value!, capacity);
    const level = hit * capacity < f.value! ? hit * (1 + Number.EPSILON) : hit;
    const [at] = await findingsOf(RULE, raw, { 'utilisation.hard': level });
    expect(at.limit!).toBeGreaterThanOrEqual(at.value!);
    expect(at.limit! - at.value!).toBeLessThan(1e-9);
    expect(at.severity).toBe('pass');
    const [over] = await findingsOf(RULE, raw, { 'utilisation.hard': level * 0.999999 });
    expect(over.severity).toBe('fail');
  });

  it('a joint whose force is not known is a warning, not a pass', async () => {
    // A floor solver stopped after one step leaves the corner forces unknown.
    const data = withParams('floor.solver', { max_iterations: 1 });
    const raw = deepMerge(demo, { lashings: [{ joint: 'frame-corners', material: 'rawhide', width_mm: 12, thickness_mm: 3, wraps: 10 }] });
    const [f] = await findingsOf(RULE, raw, {}, data);
    expect(f.severity).toBe('warning');
    expect(f.code).toBe(2503);
    expect(f.message).toContain('could not be found');
    expect(f.working_text).toMatch(/did not converge/);
  });
});
