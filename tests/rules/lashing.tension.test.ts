import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, fractionHitting, readDemo, rulesData, withParams } from '../support/fixtures.ts';

const RULE = 'lashing.tension';
const demo = readDemo('demo-two-crew');
const axleToFloor = (wraps: number) => ({ lashings: [{ joint: 'axle-to-floor', material: 'rawhide', width_mm: 12, thickness_mm: 3, wraps }] });

/** The divisor d with x / d === v, where one exists. */
function divisorHitting(x: number, v: number): number {
  let d = x / v;
  for (let i = 0; i < 8 && x / d !== v; i++) d = x / d > v ? d + Number.EPSILON * d : d - Number.EPSILON * d;
  return d;
}

describe(RULE, () => {
  it('passes for the central-axle demo, driven dry', async () => {
    const found = await findingsOf(RULE, demo);
    expect(found.map((f) => f.subject)).toEqual(['joint.pole-to-axle', 'joint.pole-to-yoke', 'joint.axle-to-floor']);
    expect(found.map((f) => f.subject_label)).toEqual(['pole-to-axle lashing', 'pole-to-yoke lashing', 'axle-to-floor lashing']);
    expect(found.every((f) => f.severity === 'pass')).toBe(true);
    // The limit's source, the method's, the leather's and the load factors' (rules/limits/lashing.yaml, leathers.yaml, load-cases.yaml).
    expect(found[0].sources).toEqual(expect.arrayContaining(['design-basis-lashings', 'from-memory']));
  });

  it('hand calculation: capacity 2·n·b·t·f_t / SF, strand pull the larger of the joint force and 2·n·T_pre', async () => {
    // 12 wraps of rawhide 16 × 3 mm laid at 110 N on the pole-to-axle joint (demo data).
    const lashings = [
      { joint: 'pole-to-axle', material: 'rawhide', width_mm: 16, thickness_mm: 3, wraps: 12, pretension_N: 110 },
      { joint: 'pole-to-yoke', material: 'rawhide', width_mm: 16, thickness_mm: 3, wraps: 14, pretension_N: 110 },
      { joint: 'axle-to-floor', material: 'rawhide', width_mm: 12, thickness_mm: 3, wraps: 8 },
    ];
    const [f] = await findingsOf(RULE, deepMerge(demo, { lashings }));
    expect(f.subject).toBe('joint.pole-to-axle');
    // At 20 MPa over SF 4: 2 × 12 × 16 × 3 × 20 / 4 = 5760 N (hand calculation);
    // its strands hold their own pretension, 2 × 12 × 110 = 2640 N, more than any joint force.
    expect(f.limit).toBeCloseTo(5760, 9);
    expect(f.params.capacity as number).toBeCloseTo(5760, 9);
    expect(f.value).toBe(2640);
    expect(f.utilisation!).toBeCloseTo(2640 / 5760, 12);
    expect(f.params.case).toBe('its own pretension');
    expect(f.load_case).toBeNull();
    expect(f.severity).toBe('pass');
    expect(f.working.find((s) => s.formula.startsWith('capacity'))!.result!).toBeCloseTo(5760, 9);
  });

  it('fails where the wraps are too few for the bump rebound of the box', async () => {
    const [f] = await findingsOf(RULE, deepMerge(demo, axleToFloor(2)));
    // 2 × 2 × 12 × 3 × 20 / 4 = 720 N against the box's rebound (k_bump − 1)·m·g, above 1600 N
    expect(f.limit).toBeCloseTo(720, 9);
    expect(f.value!).toBeGreaterThan(1600);
    expect(f.severity).toBe('fail');
    expect(f.load_case).toBe('bump');
    expect(f.working_text).toContain('apart = (k_bump − 1)·m·g');
  });

  it('driven wet, the strength falls by the wet strength factor', async () => {
    const [dry] = await findingsOf(RULE, deepMerge(demo, axleToFloor(8)));
    const [wet] = await findingsOf(RULE, deepMerge(demo, { ...axleToFloor(8), operation: { wet: true } }));
    expect(dry.severity).toBe('pass');
    // rawhide wet: 0.4 of its dry strength (rules/materials/leathers.yaml)
    expect(wet.limit!).toBeCloseTo(dry.limit! * rulesData.leathers.rawhide.wet_strength_factor.value, 9);
    expect(wet.limit!).toBeCloseTo(1152, 9); // 2 × 8 × 12 × 3 × 8 MPa / 4
    expect(wet.severity).toBe('fail');
    expect(wet.params.state).toBe('wet');
  });

  it('boundary: a strand pull equal to the capacity is within it', async () => {
    const raw = deepMerge(demo, axleToFloor(8));
    const [f] = await findingsOf(RULE, raw);
    const strength = 2 * 8 * 12 * 3 * 20; // N, before the safety factor
    const sf = divisorHitting(strength, f.value!);
    const [at] = await findingsOf(RULE, raw, { safety_factor: sf });
    expect(at.limit).toBe(at.value);
    expect(at.severity).toBe('pass');
    const [over] = await findingsOf(RULE, raw, { safety_factor: sf * 1.000001 });
    expect(over.severity).toBe('fail');
  });

  it('boundary: the hard level of the utilisation limit scales the capacity', async () => {
    // 8 wraps: capacity 2 × 8 × 12 × 3 × 20 / 4 = 2880 N (hand calculation); a level of value / 2880 puts the limit on the value.
    const raw = deepMerge(demo, axleToFloor(8));
    const [f] = await findingsOf(RULE, raw);
    expect(f.params.capacity).toBe(2880);
    // The least level whose limit is not below the value (no double may hit it exactly).
    const hit = fractionHitting(f.value!, 2880);
    const level = hit * 2880 < f.value! ? hit * (1 + Number.EPSILON) : hit;
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
