import { describe, expect, it } from 'vitest';
import schema from '../src/core/spec/spec.schema.json' with { type: 'json' };
import { girthLengthMass, HORSE_TYPES, horseMass } from '../src/core/model/horse-mass.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { pathText } from '../src/core/spec/input-issue.ts';
import { prepared, readDemo, rulesData, withParams } from './support/fixtures.ts';

// The lightest horse's mass, the one way the specification gives it.

/** The central-axle demo with its team replaced. */
function withTeam(team: Record<string, unknown>): Record<string, unknown> {
  return { ...readDemo('demo-two-crew'), team: { horses: 2, ...team } };
}

describe('the horse mass from girth and length', () => {
  it("is Carroll and Huntington's girth² × length / 11,900 (cm, kg), worked by hand", () => {
    // Carroll and Huntington 1988 (Equine Vet J 20(1):41-45): W = G² L / Y, Y = 11,900 on average.
    // By hand: 180 cm girth, 160 cm long: 180 × 180 = 32,400; × 160 = 5,184,000; / 11,900 = 435.63 kg.
    expect(girthLengthMass(180, 160, 11900)).toBeCloseTo(435.63, 2);
    const h = horseMass(prepared(withTeam({ horse: { girth_cm: 180, body_length_cm: 160 } })), rulesData);
    expect(h.basis).toBe('girth-length');
    expect(h.mass_kg).toBeCloseTo(5184000 / 11900, 9);
    expect(h.low_kg).toBeUndefined();
    expect(h.sources).toContain('carroll-huntington-1988');
  });

  it('reads the divisor from the data, and a taped length in inches converts', () => {
    const data = withParams('horses', { girth_length_divisor: 10000 });
    // 70 in = 177.8 cm, 63 in = 160.02 cm: 177.8² = 31,612.84; × 160.02 / 10,000 = 505.87 kg by hand.
    const h = horseMass(prepared(withTeam({ horse: { girth_cm: '70 in', body_length_cm: '63 in' } }), data), data);
    expect(h.mass_kg).toBeCloseTo(505.87, 2);
  });
});

describe('the horse mass from a preset', () => {
  it('at the reference height is the band as the data holds it, and the checks take its low end', () => {
    const h = horseMass(prepared(withTeam({ horse: { type: 'pony', height_m: 1.12 } })), rulesData);
    expect(h).toMatchObject({ basis: 'preset', mass_kg: 200, low_kg: 200, high_kg: 250 });
    expect(h.basis_text).toMatch(/low end/);
  });

  it('scales the band with the cube of the height (mass goes with girth² × length), worked by hand', () => {
    // 1.22 m over 1.12 m: (1.22 / 1.12)³ = 1.29248; × 200 kg = 258.50 kg, × 250 kg = 323.12 kg.
    const h = horseMass(prepared(withTeam({ horse: { type: 'pony', height_m: 1.22 } })), rulesData);
    expect(h.low_kg).toBeCloseTo(258.5, 2);
    expect(h.high_kg).toBeCloseTo(323.12, 2);
    expect(h.mass_kg).toBe(h.low_kg);
  });

  it('offers in the schema exactly the types the model reads presets for', () => {
    expect(schema.properties.team.properties.horse.properties.type.enum).toEqual([...HORSE_TYPES]);
  });

  it('a weighed mass is used as given', () => {
    const h = horseMass(prepared(withTeam({ horse_mass_kg: 431 })), rulesData);
    expect(h).toMatchObject({ basis: 'given', mass_kg: 431 });
  });
});

describe('the horse mass is refused unless given exactly one way', () => {
  const issues = (team: Record<string, unknown>) => {
    const p = prepareSpec(withTeam(team), rulesData);
    if (p.ok) throw new Error('expected the specification to be refused');
    return p.issues.map((i) => ({ at: pathText(i.path), code: i.code, message: i.message }));
  };

  it('no way at all', () => {
    expect(issues({})).toEqual([expect.objectContaining({ at: 'team', code: 1127, message: expect.stringContaining('gives no horse mass') })]);
    expect(issues({ horse: {} })).toEqual([expect.objectContaining({ at: 'team', code: 1127 })]);
  });

  it('two ways, each complete', () => {
    const [i] = issues({ horse_mass_kg: 300, horse: { type: 'cob', height_m: 1.45 } });
    expect(i).toMatchObject({ at: 'team.horse_mass_kg', code: 1128 });
    expect(i.message).toContain('horse_mass_kg; horse.type with horse.height_m');
    expect(issues({ horse: { type: 'cob', height_m: 1.45, girth_cm: 170, body_length_cm: 150 } })).toEqual([expect.objectContaining({ at: 'team.horse', code: 1128 })]);
  });

  it('half of a pair, alone or beside a complete way', () => {
    expect(issues({ horse: { girth_cm: 170 } })).toEqual([expect.objectContaining({ at: 'team.horse.body_length_cm', code: 1129, message: 'horse.girth_cm is given without horse.body_length_cm: a mass by tape needs both.' })]);
    expect(issues({ horse: { height_m: 1.3 } })).toEqual([expect.objectContaining({ at: 'team.horse.type', code: 1129 })]);
    expect(issues({ horse_mass_kg: 300, horse: { type: 'pony' } }).map((i) => i.code).sort()).toEqual([1128, 1129]);
  });

  it('a preset height outside the range its band holds for', () => {
    const [i] = issues({ horse: { type: 'pony', height_m: 1.5 } });
    expect(i).toMatchObject({ at: 'team.horse.height_m', code: 1130 });
    expect(i.message).toContain('from 1 to 1.3 m');
  });
});
