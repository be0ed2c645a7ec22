import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, fractionHitting, readDemo, rulesData } from '../support/fixtures.ts';
import { bySubjectId } from '../support/member-support.ts';

const RULE = 'bend.radius';
const ash = rulesData.species['white-ash'].steam_bend_ratio;

describe(RULE, () => {
  it('passes the rear-axle demo: pole and felloe, inner radius over thickness against the data', async () => {
    const found = await findingsOf(RULE, readDemo('demo-rear-axle'));
    expect(found.map((f) => [f.subject, f.subject_label, f.severity])).toEqual([['part.pole', 'pole', 'pass'], ['part.felloe', 'felloe', 'pass']]);
    // Pole: 1000 mm on the centre line, 72 mm high: R_i = 1000 − 36 = 964 mm. Felloe: inner radius 406 / depth 54.
    expect(found[0].value).toBeCloseTo(964 / 72, 12);
    expect(found[1].value).toBeCloseTo(406 / 54, 12);
    expect(found[0].params).toMatchObject({ part: 'pole', radius: 964, thickness: 72, species: 'white-ash', strap: 'bent with a supporting strap' });
    expect(found[0].working.find((s) => s.formula === 'inner face R_i = R − t/2')!.result).toBe(964);
    // White ash with a strap: the species file's supported figure (from memory), times the hard level 1.0.
    expect(found[0].limit).toBe(ash.supported!.value);
    expect(found[0].utilisation!).toBeCloseTo(ash.supported!.value / (964 / 72), 12);
    expect(found[0].message_key).toBe('within');
    expect(found[0].sources).toEqual(expect.arrayContaining(['design-basis-members', ...ash.supported!.sources]));
    expect(found[0].load_case).toBeNull();
  });

  it('fails a felloe bent without a strap, against the unsupported figure', async () => {
    const f = bySubjectId('part.felloe')(await findingsOf(RULE, deepMerge(readDemo('demo-rear-axle'), { wheels: { felloe: { bend_strap: false } } })));
    expect(f.severity).toBe('fail');
    expect(f.message_key).toBe('tight');
    expect(f.limit).toBe(ash.unsupported!.value);
    expect(f.fix).toContain(`against a strap (limit ${ash.supported!.value})`);
  });

  it('fails frame corners bent tight: (180 − 42/2) / 42 is below 4.5', async () => {
    // The central-axle demo with a 42 mm wide white-ash frame bent at 180 mm, against a strap (demo data).
    const raw = deepMerge(readDemo('demo-two-crew'), { box: { floor: { frame: { species: 'white-ash', width_mm: 42, bend_radius_mm: 180, bend_strap: true } } } });
    const f = bySubjectId('part.frame')(await findingsOf(RULE, raw));
    expect(f.subject).toBe('part.frame');
    expect(f.value).toBeCloseTo(159 / 42, 12);
    expect(f.severity).toBe('fail');
    // The radius that would pass: limit × t + t/2 on the centre line.
    expect(f.fix).toContain(`Open the radius to at least ${Math.round(ash.supported!.value * 42 + 21)}`);
  });

  it('a species with no bending figure is a warning, not a pass', async () => {
    expect(rulesData.species['black-ash'].steam_bend_ratio.supported).toBeNull();
    const f = bySubjectId('part.pole')(await findingsOf(RULE, deepMerge(readDemo('demo-rear-axle'), { pole: { species: 'black-ash' } })));
    expect(f.severity).toBe('warning');
    expect(f).toMatchObject({ code: 2403, message_key: 'noData', limit: null, utilisation: null });
    expect(f.value).toBeCloseTo(964 / 72, 12);
  });

  it('sawn felloes have nothing to check; a frame bent without a strap is held to the unsupported figure', async () => {
    // The teaching example: sawn felloes, a bent pole, and a 40 mm wide elm frame bent at 150 mm without a strap (demo data).
    const raw = deepMerge(readDemo('teaching-flawed'), { box: { floor: { frame: { species: 'american-elm', width_mm: 40, bend_radius_mm: 150, bend_strap: false } } } });
    const found = await findingsOf(RULE, raw);
    expect(found.map((f) => [f.subject, f.subject_label])).toEqual([['part.pole', 'pole'], ['part.frame', 'floor frame front rail']]);
    // Frame: R_i = 150 − 40/2 = 130 mm over the width in plan 40 mm.
    const frame = bySubjectId('part.frame')(found);
    expect(frame.value).toBeCloseTo(130 / 40, 12);
    expect(frame.limit).toBe(rulesData.species['american-elm'].steam_bend_ratio.unsupported!.value);
    expect(frame.params.strap).toBe('bent without a strap');
    expect(frame.severity).toBe('fail');
  });

  it('boundary: a ratio equal to the limit passes, a hair below fails', async () => {
    const raw = readDemo('demo-rear-axle');
    const pick = bySubjectId('part.felloe');
    const f = pick(await findingsOf(RULE, raw));
    const m = fractionHitting(f.value!, ash.supported!.value);
    const at = pick(await findingsOf(RULE, raw, { 'radius_ratio.hard': m }));
    expect(at.limit).toBe(f.value);
    expect(at.severity).toBe('pass');
    expect(pick(await findingsOf(RULE, raw, { 'radius_ratio.hard': m * 1.001 })).severity).toBe('fail');
  });
});
