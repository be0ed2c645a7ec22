import { describe, expect, it } from 'vitest';
import { G } from '../../src/core/units/units.ts';
import { findingsOf, fractionHitting, readDemo, deepMerge } from '../support/fixtures.ts';

const RULE = 'balance.horse-load';

/** The rear-axle demo with its horse given another way. */
const rearAxleWith = (team: Record<string, unknown>) => ({ ...readDemo('demo-rear-axle'), team: { horses: 2, ...team } });

describe(RULE, () => {
  it('passes for the central-axle demo', async () => {
    const found = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(found.map((f) => f.severity)).toEqual(['pass', 'pass']);
    expect(found[0].subject).toBe('case.static');
    expect(found[0].subject_label).toBe('standing, crew as placed');
    expect(found[0].load_case).toBe('static');
  });

  it('warns above the advisory fraction (a judgement) and fails above the hard one (an analogy)', async () => {
    const raw = deepMerge(readDemo('demo-rear-axle'), { team: { horse_mass_kg: 150 } });
    const worst = (await findingsOf(RULE, raw)).at(-1)!;
    // The rear-axle demo's worst case puts 179 N on each horse: 12.2 % of a 150 kg horse's weight
    // (179 / (150 × 9.807)), above the advisory 10 %, below the hard 20 %.
    expect(worst.value! / (150 * G)).toBeGreaterThan(0.1);
    expect(worst.value! / (150 * G)).toBeLessThan(0.2);
    expect(worst.severity).toBe('warning');
    expect(worst.message).toContain('is a judgement');
    expect(worst.message).toContain('an analogy with the load a ridden horse carries');
    const [, hard] = await findingsOf(RULE, deepMerge(raw, { team: { horses: 1 } }));
    expect(hard.severity).toBe('fail');
    // The levels as the data holds them: advisory 10 % (a judgement), hard 20 %
    // (Powell et al. 2008: ridden horses carried about 20 % of their weight unchanged).
    expect(hard.limit!).toBeCloseTo(0.2 * 150 * G, 9);
    expect(hard.utilisation!).toBeCloseTo(hard.value! / hard.limit!, 12);
    expect(hard.params.advisory as number).toBeCloseTo(0.1 * 150 * G, 9);
    expect(hard.params.hard as number).toBeCloseTo(0.2 * 150 * G, 9);
    expect(hard.sources).toEqual(expect.arrayContaining(['design-basis-balance', 'from-memory', 'powell-2008-weight-carrying']));
    expect(hard.working_text).toMatch(/advisory limit = fraction × m_horse·g \(a judgement\)/);
    expect(hard.working_text).toMatch(/hard limit = fraction × m_horse·g \(an analogy/);
  });

  it("takes a preset band's low end: the lighter horse carries the larger share", async () => {
    // The pony preset at 1.22 m: 200 kg × (1.22 / 1.12)³ = 258.50 kg low, 323.12 kg high (by hand).
    const [f] = await findingsOf(RULE, rearAxleWith({ horse: { type: 'pony', height_m: 1.22 } }));
    expect(f.params.mass as number).toBeCloseTo(258.5, 2);
    expect(f.limit!).toBeCloseTo(0.2 * 258.497 * G, 1);
    expect(f.message).toContain('the low end of the pony preset band');
    expect(f.working_text).toMatch(/m_high = .* = 323\skg/);
    expect(f.sources).toEqual(expect.arrayContaining(['common-practice', 'from-memory', 'carroll-huntington-1988']));
  });

  it('takes a taped mass as Carroll and Huntington estimate it', async () => {
    // 150 cm girth, 140 cm long: 150² × 140 / 11,900 = 264.71 kg by hand.
    const [f] = await findingsOf(RULE, rearAxleWith({ horse: { girth_cm: 150, body_length_cm: 140 } }));
    expect(f.params.mass as number).toBeCloseTo(264.71, 2);
    expect(f.message).toContain('estimated from its girth and length');
    expect(f.sources).toContain('carroll-huntington-1988');
  });

  it('boundary: a load equal to the hard limit is not above it', async () => {
    const raw = readDemo('demo-rear-axle');
    const worst = (await findingsOf(RULE, raw)).at(-1)!;
    const W = 340 * G;
    const f = fractionHitting(worst.value!, W);
    const at = (await findingsOf(RULE, raw, { 'load_fraction.advisory': f, 'load_fraction.hard': f })).at(-1)!;
    expect(at.limit).toBe(worst.value);
    expect(at.severity).toBe('pass');
    const over = (await findingsOf(RULE, raw, { 'load_fraction.advisory': f * 0.999, 'load_fraction.hard': f * 0.999 })).at(-1)!;
    expect(over.severity).toBe('fail');
  });
});
