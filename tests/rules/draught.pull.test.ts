import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { G } from '../../src/core/units/units.ts';
import { dataWithGround, findingsOf, fractionHitting, handSpec, readDemo } from '../support/fixtures.ts';

const RULE = 'draught.pull';

// The hand-calculation spec (tests/support/fixtures.ts): every mass measured, so the
// rolling assembly is box 20 + axle 8 + wheels 2 × 10 + pole 9 + driver 80 = 137 kg
// (the 4 kg yoke rests on the necks and is not pulled). On a ground of soil resistance
// 0.03 at the reference diameter, with a greased hub (journal friction 0.08):
//   C_s = 0.03 × 1200 / 900 = 0.04              (Morin: inversely with the diameter)
//   C_b = 0.08 × 35 / 450   = 0.0062222         (bore 70 mm, wheel 900 mm)
//   i   = 0.05                                   (the data's default grade, 5 %)
//   P   = 137 × 9.80665 × (0.04 + 0.0062222 + 0.05) = 1343.511 × 0.0962222 = 129.276 N
// The team's pull (Peace Corps, Animal Traction, ch. 2 and app. A; Baker 1903, p. 34):
//   sustained = 1/10 × team factor × m × g; short = 1/4 × team factor × m × g,
//   team factor 1 for one horse, 1.85 for a pair (each 7.5 % less than alone), 2.55 for three.
const data = dataWithGround('hand-rigid', 0.03, 0.08);
const W = 137 * G;
const P = W * (0.04 + (0.08 * 35) / 450 + 0.05);

const spec = (team: Record<string, unknown>, operation: Record<string, unknown> = {}) => {
  const s = handSpec();
  s.team = team;
  s.operation = { ...s.operation, ...operation };
  return s;
};

describe(RULE, () => {
  it('passes for the central-axle demo', async () => {
    const [f] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(f.severity).toBe('pass');
    expect(f.subject).toBe('team.draught');
    expect(f.combination).toBe('characteristic');
  });

  it('gives the pull worked by hand with the balance model\'s rolling resistance, against a pair of 400 kg horses', async () => {
    const [f] = await findingsOf(RULE, spec({ horses: 2, horse_mass_kg: 400 }), {}, data);
    expect(P).toBeCloseTo(129.276, 3);
    expect(f.value!).toBeCloseTo(P, 9);
    expect(f.severity).toBe('pass');
    // Capacity by hand: 1.85 × 400 × 9.80665 = 7256.92 N; sustained 725.69 N, short 1814.23 N.
    expect(f.params.advisory as number).toBeCloseTo(725.69, 2);
    expect(f.params.hard as number).toBeCloseTo(1814.23, 2);
    expect(f.limit!).toBeCloseTo(1814.23, 2);
    expect(f.sources).toEqual(expect.arrayContaining(['design-basis-balance', 'peace-corps-animal-traction', 'baker-1903-tractive', 'baker-1903-grades', 'morin-king-1894']));
    expect(f.working_text).toMatch(/the data's default_grade_pct/);
  });

  it('warns beyond the sustained pull and fails beyond the short pull (one 100 kg horse)', async () => {
    // One horse of 100 kg: sustained 0.1 × 980.665 = 98.07 N, short 0.25 × 980.665 = 245.17 N.
    const [warn] = await findingsOf(RULE, spec({ horses: 1, horse_mass_kg: 100 }), {}, data);
    expect(warn.value!).toBeCloseTo(129.276, 3);
    expect(warn.severity).toBe('warning');
    expect(warn.message).toContain('only in short pulls');
    // Up a 20 % grade: 1343.511 × (0.04 + 0.0062222 + 0.2) = 330.80 N, beyond the short pull.
    const [fail] = await findingsOf(RULE, spec({ horses: 1, horse_mass_kg: 100 }, { grade_pct: 20 }), {}, data);
    expect(fail.value!).toBeCloseTo(330.8, 2);
    expect(fail.severity).toBe('fail');
    expect(fail.message).toContain('cannot draw this load up the grade');
    expect(fail.working_text).toMatch(/operation\.grade_pct/);
  });

  it('a team of three counts 2.55 horses, and a level road only the rolling resistance', async () => {
    const [f] = await findingsOf(RULE, spec({ horses: 3, horse_mass_kg: 100 }, { grade_pct: 0 }), {}, data);
    // 1343.511 × 0.0462222 = 62.10 N; sustained 0.1 × 2.55 × 980.665 = 250.07 N.
    expect(f.value!).toBeCloseTo(62.1, 2);
    expect(f.params.advisory as number).toBeCloseTo(250.07, 2);
  });

  it("counts on a preset band's low end and says so", async () => {
    // The pony preset at 1.12 m: 200-250 kg; the pull counts on 200 kg: sustained 1.85 × 200 × 9.80665 × 0.1 = 362.85 N.
    const [f] = await findingsOf(RULE, spec({ horses: 2, horse: { type: 'pony', height_m: 1.12 } }), {}, data);
    expect(f.params.advisory as number).toBeCloseTo(362.85, 2);
    expect(f.message).toContain('the low end of the pony preset band');
  });

  it('boundary: a pull equal to the sustained or the short pull is within it, a hair beyond is not', async () => {
    const raw = spec({ horses: 1, horse_mass_kg: 100 });
    const teamW = 100 * G;
    const f = fractionHitting(P, teamW);
    const atSustained = (await findingsOf(RULE, raw, { 'pull_fraction.advisory': f }, data))[0];
    expect(atSustained.params.advisory).toBe(atSustained.value);
    expect(atSustained.severity).toBe('pass');
    expect((await findingsOf(RULE, raw, { 'pull_fraction.advisory': f * 0.999 }, data))[0].severity).toBe('warning');
    const atShort = (await findingsOf(RULE, raw, { 'pull_fraction.advisory': f * 0.5, 'pull_fraction.hard': f }, data))[0];
    expect(atShort.limit).toBe(atShort.value);
    expect(atShort.severity).toBe('warning');
    expect((await findingsOf(RULE, raw, { 'pull_fraction.advisory': f * 0.5, 'pull_fraction.hard': f * 0.999 }, data))[0].severity).toBe('fail');
  });

  it('puts the design pull and the sustained capacity among the figures', () => {
    const p = prepareSpec(spec({ horses: 2, horse_mass_kg: 400 }), data);
    if (!p.ok) throw new Error('the hand spec does not validate');
    const r = runCheck(p.spec, p.entries, data);
    expect(r.figures.draught_pull_design.unit).toBe('N');
    expect(r.figures.draught_pull_design.value).toBeCloseTo(P, 9);
    expect(r.figures.draught_pull_capacity).toEqual({ value: expect.closeTo(725.69, 2), unit: 'N' });
  });
});
