import { describe, expect, it } from 'vitest';
import { prepared, readDemo } from '../support/fixtures.ts';
import { axisValues, parseVaries, parseVary, pathSteps } from '../../src/core/sweep/sweep-axis.ts';
import { parseJobs, parseSamples, parseSeed, parseShard } from '../../src/core/sweep/sweep-options.ts';

const spec = prepared(readDemo('demo-two-crew'));

describe('--vary PATH=FROM..TO:N', () => {
  it('reads a path as the user writes it, with brackets or dots for a list entry', () => {
    expect(pathSteps('crew[0].x_mm')).toEqual(['crew', 0, 'x_mm']);
    expect(pathSteps('crew.1.x_mm')).toEqual(['crew', 1, 'x_mm']);
    const a = parseVary('crew.0.x_mm=200..450:6', spec);
    expect(a).toMatchObject({ ok: true, value: { path: 'crew[0].x_mm', from: 200, to: 450, count: 6, unit: 'mm' } });
    // 200 + 250 k / 5: evenly spaced, the ends exactly as given.
    expect(a.ok && axisValues(a.value)).toEqual([200, 250, 300, 350, 400, 450]);
  });

  it('takes decimals, negative values and a quantity with its unit, converted to the unit the spec takes', () => {
    expect(parseVary('crew[0].y_mm=-210..-10.5:3', spec)).toMatchObject({ ok: true, value: { from: -210, to: -10.5 } });
    // 6 in = 152.4 mm, 1 ft = 304.8 mm (exact by definition of the inch).
    const q = parseVary('axle.x_mm=6in..1ft:2', spec);
    expect(q.ok && q.value.from).toBeCloseTo(152.4, 9);
    expect(q.ok && q.value.to).toBeCloseTo(304.8, 9);
  });

  it('varies a value the user left to its default', () => {
    expect(parseVary('box.floor.foot_patch.length_mm=200..300:3', spec)).toMatchObject({ ok: true });
  });

  it.each([
    ['axle.x_mm', 'has no "=": write it PATH=FROM..TO:N'],
    ['axle.x_mm=150:21', 'the range must be FROM..TO:N'],
    ['axle..x=1..2:2', 'is not a spec path'],
    ['axle.xmm=150..350:21', 'option --vary axle.xmm: the specification has no value there; numbers there: axle.x_mm'],
    ['crew[0].role=1..2:2', 'not a number; a sweep varies numbers'],
    ['axle=1..2:2', 'a group of values, not a number'],
    ['axle.x_mm=abc..350:21', 'FROM "abc"'],
    ['axle.x_mm=150..350kg:21', 'cannot be converted to mm'],
    ['axle.x_mm=350..150:21', 'FROM (350) is more than TO (150); give the range low to high'],
    ['axle.x_mm=150..350', 'give the count of values after the range, :N'],
    ['axle.x_mm=150..350:0', 'N "0" must be a whole number from 1 to 1000'],
    ['axle.x_mm=150..350:2.5', 'N "2.5" must be a whole number from 1 to 1000'],
    ['axle.x_mm=150..350:1', 'one value (N = 1) takes FROM equal to TO'],
    ['axle.x_mm=150..150:3', 'FROM equals TO, so there is one value: give N = 1'],
  ])('refuses %s, naming the option and what it takes', (text, says) => {
    const r = parseVary(text, spec);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toContain(says);
    expect(!r.ok && r.message).toContain('--vary');
  });

  it('takes one to three values, each once', () => {
    expect(parseVaries([], spec)).toMatchObject({ ok: false, message: expect.stringContaining('give one to 3 values to vary with --vary') });
    const four = ['axle.x_mm=1..2:2', 'crew[0].x_mm=1..2:2', 'crew[1].x_mm=1..2:2', 'team.horse_mass_kg=1..2:2'];
    expect(parseVaries(four, spec)).toMatchObject({ ok: false, message: 'option --vary is given 4 times; a sweep varies one to 3 values' });
    expect(parseVaries(['crew[0].x_mm=1..2:2', 'crew.0.x_mm=1..3:2'], spec)).toMatchObject({ ok: false, message: 'option --vary crew[0].x_mm is given twice; vary each value once' });
  });
});

describe('the other options', () => {
  it('reads --samples, --seed, --jobs and --shard and names what each takes', () => {
    expect(parseSamples('200')).toEqual({ ok: true, value: 200 });
    expect(parseSamples('0')).toMatchObject({ ok: false, message: expect.stringContaining('option --samples "0" must be a whole number') });
    expect(parseSeed('42')).toEqual({ ok: true, value: 42 });
    expect(parseSeed('-1')).toMatchObject({ ok: false, message: expect.stringContaining('option --seed') });
    expect(parseJobs('2', 8)).toEqual({ ok: true, value: 2 });
    expect(parseJobs('9', 8)).toMatchObject({ ok: false, message: expect.stringContaining('from 1 to 8') });
    expect(parseShard('2/3')).toEqual({ ok: true, value: { index: 2, of: 3 } });
    for (const bad of ['0/3', '4/3', '1', 'a/b']) expect(parseShard(bad)).toMatchObject({ ok: false, message: expect.stringContaining(`option --shard "${bad}" must be I/N`) });
  });
});
