import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { Analysis } from '../../src/core/engine/analysis.ts';
import type { Finding } from '../../src/core/findings/finding.ts';

const RULE = 'floor.sag';
const THICK = { floor_straps: { width_mm: 30, thickness_mm: 10, pitch_mm: 32, pretension_N: 60 } };
// Thin straps on a 42 × 38 mm frame bent at 180 mm: a floor soft enough to reach the pole (demo data).
const THIN = { box: { floor: { frame: { width_mm: 42, thickness_mm: 38, bend_radius_mm: 180 } } }, floor_straps: { width_mm: 24, thickness_mm: 4, pitch_mm: 34, weave: 'two-way', pretension_N: 160 } };
const raw = (patch: unknown = {}) => deepMerge(readDemo('demo-two-crew'), patch);
const bySubject = (found: Finding[], s: string) => found.find((f) => f.subject === s)!;

describe(RULE, () => {
  it('passes a stiff floor: small sag under each person, clear of the pole and the axle', async () => {
    const found = await findingsOf(RULE, raw(THICK));
    expect(found.map((f) => f.subject)).toEqual(['driver, standing', 'companion, standing', 'floor over the pole', 'floor over the axle']);
    expect(found.every((f) => f.severity === 'pass')).toBe(true);
    const sag = new Analysis(prepared(raw(THICK)), rulesData).floorStatic.crew[0].sag_mm;
    expect(found[0].value).toBe(sag);
  });

  it('fails a floor that rests on the pole with the crew standing', async () => {
    // Thin side-to-side straps only: each sags deepest between the two crew, over the pole.
    const found = await findingsOf(RULE, raw(deepMerge(THIN, { floor_straps: { weave: 'side-to-side' } })));
    const pole = bySubject(found, 'floor over the pole');
    expect(pole.severity).toBe('fail');
    // With the default floor height the pole's top is one frame thickness below the floor top (layout).
    expect(pole.limit).toBeCloseTo(38, 9);
    expect(pole.value!).toBeGreaterThan(38);
    expect(pole.message).toContain('"crew standing"');
  });

  it('warns when the floor reaches the pole only at a bump', async () => {
    // The thin floor on a 25 mm frame: the standing sag over the pole (about 20 mm) clears it, the bump sag (about 28 mm) does not.
    const found = await findingsOf(RULE, raw(deepMerge(THIN, { box: { floor: { frame: { thickness_mm: 25 } } } })));
    const pole = bySubject(found, 'floor over the pole');
    expect(pole.severity).toBe('warning');
    expect(pole.limit).toBeCloseTo(25, 9);
    expect(pole.message).toMatch(/bump, [\d.]+ × crew weight/);
  });

  it('warns above the advisory sag under a person', async () => {
    const found = await findingsOf(RULE, raw(), { advisory_sag_mm: 10 });
    expect(bySubject(found, 'driver, standing').severity).toBe('warning');
  });

  it('boundary: a sag equal to the advisory limit is within it', async () => {
    const r = raw();
    const sag = bySubject(await findingsOf(RULE, r), 'driver, standing').value!;
    const at = bySubject(await findingsOf(RULE, r, { advisory_sag_mm: sag }), 'driver, standing');
    expect(at.limit).toBe(sag);
    expect(at.severity).toBe('pass');
    const over = bySubject(await findingsOf(RULE, r, { advisory_sag_mm: sag * (1 - 1e-12) }), 'driver, standing');
    expect(over.severity).toBe('warning');
  });

  it('fails, saying why, when the floor could not be solved', async () => {
    const found = await findingsOf(RULE, raw({ floor_straps: { width_mm: 4, thickness_mm: 1, pitch_mm: 5 } }));
    expect(found.length).toBeGreaterThan(0);
    expect(found.every((f) => f.severity === 'fail' && f.code === 2203)).toBe(true);
  });
});
