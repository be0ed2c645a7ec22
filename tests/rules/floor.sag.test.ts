import { describe, expect, it } from 'vitest';
import { deepMerge, findingsOf, prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { Analysis } from '../support/analysis.ts';
import type { Finding } from '../../src/core/findings/finding.ts';
import { floorFigures } from '../../src/core/model/cable-net/floor-figures.ts';
import { ONE_STRAP, oneStrapHand } from '../support/one-strap-floor.ts';

const RULE = 'floor.sag';
const THICK = { floor_straps: { width_mm: 30, thickness_mm: 10, pitch_mm: 32, pretension_N: 60 } };
// Thin straps on a 42 × 38 mm frame bent at 180 mm: a floor soft enough to reach the pole (demo data).
const THIN = { box: { floor: { frame: { width_mm: 42, thickness_mm: 38, bend_radius_mm: 180 } } }, floor_straps: { width_mm: 24, thickness_mm: 4, pitch_mm: 34, weave: 'two-way', pretension_N: 160 } };
const raw = (patch: unknown = {}) => deepMerge(readDemo('demo-two-crew'), patch);
const bySubject = (found: Finding[], s: string) => found.find((f) => f.subject === s)!;
const floors = (r: unknown) => new Analysis(prepared(r), rulesData);

describe(RULE, () => {
  it('passes a stiff floor: small sag under each person, clear of the pole and the axle', async () => {
    const found = await findingsOf(RULE, raw(THICK));
    expect(found.map((f) => f.subject)).toEqual(['crew.0', 'crew.1', 'part.pole', 'part.axle']);
    expect(found.map((f) => f.subject_label)).toEqual(['driver, standing', 'companion, standing', 'floor over the pole', 'floor over the axle']);
    expect(found.every((f) => f.severity === 'pass')).toBe(true);
    const a = floors(raw(THICK));
    expect(found[0].value).toBe(a.floorStatic.crew[0].sag_mm);
    expect(found[0].load_case).toBe('static');
    // Standing clear of both parts: the stone, the deepest sag, is the one shown (accidental, every
    // action × 1.0); its clearance left is clearance − sag.
    const pole = a.floorStone.clearances[0];
    expect(found[2]).toMatchObject({ load_case: 'stone', combination: 'accidental', message_key: 'clears', value: pole.clearance_mm - pole.sag_mm, limit: 0 });
    expect(found[2].params).toMatchObject({ part: 'pole', sag: pole.sag_mm, clearance: pole.clearance_mm, case: 'stone' });
  });

  it('advises where the floor comes to bear on the pole with the crew standing: the pole holds it up', async () => {
    // Thin side-to-side straps only: each sags deepest between the two crew, over the pole.
    const found = await findingsOf(RULE, raw(deepMerge(THIN, { floor_straps: { weave: 'side-to-side' } })));
    const pole = bySubject(found, 'part.pole');
    expect(pole.severity).toBe('advice');
    expect(pole.load_case).toBe('static');
    // With the default floor height the pole's top is one frame thickness below the floor top (layout).
    expect(pole.params.clearance as number).toBeCloseTo(38, 9);
    expect(pole.params.sag as number).toBeGreaterThan(38);
    expect(pole.value!).toBeCloseTo(38 - (pole.params.sag as number), 9);
    expect(pole.limit).toBe(0);
    expect(pole.message_key).toBe('strikes');
    expect(pole.message).toContain('in the crew standing case and comes to bear on it');
    expect(pole.fix).toMatch(/^Pad the pole's top/);
    expect(pole.sources).toContain('design-basis-floor');
  });

  it('advises when the floor reaches the pole only over rough ground or on the stone', async () => {
    // The thin floor on a 46 mm frame: the standing sag over the pole (about 38 mm) clears it, the dynamic sags do not.
    const found = await findingsOf(RULE, raw(deepMerge(THIN, { box: { floor: { frame: { thickness_mm: 46 } } } })));
    const pole = bySubject(found, 'part.pole');
    expect(pole.severity).toBe('advice');
    expect(['rough-ground', 'stone']).toContain(pole.load_case);
    expect(pole.params.clearance as number).toBeCloseTo(46, 9);
    expect(pole.value!).toBeLessThan(0);
    expect(pole.message).toContain(`in the ${pole.params.case as string} case and comes to bear on it`);
    expect(pole.working_text).toMatch(/rough ground, [\d.]+ × crew weight/);
    expect(pole.working_text).toMatch(/stone, [\d.]+ × crew weight/);
  });

  it('warns above the advisory sag under a person', async () => {
    const found = await findingsOf(RULE, raw(), { 'sag_mm.advisory': 10 });
    const driver = bySubject(found, 'crew.0');
    expect(driver.severity).toBe('warning');
    expect(driver.message_key).toBe('over');
    expect(driver.params.advisory).toBe(10);
  });

  it('boundary: a sag equal to the advisory limit is within it', async () => {
    const r = raw();
    const sag = bySubject(await findingsOf(RULE, r), 'crew.0').value!;
    const at = bySubject(await findingsOf(RULE, r, { 'sag_mm.advisory': sag }), 'crew.0');
    expect(at.limit).toBe(sag);
    expect(at.severity).toBe('pass');
    const over = bySubject(await findingsOf(RULE, r, { 'sag_mm.advisory': sag * (1 - 1e-12) }), 'crew.0');
    expect(over.severity).toBe('warning');
  });

  it('boundary: a standing clearance left equal to its limit passes, a hair less advises', async () => {
    const r = raw(THICK);
    const p = floors(r).floorStatic.clearances[0];
    const left = p.clearance_mm - p.sag_mm;
    const at = bySubject(await findingsOf(RULE, r, { 'clearance_mm.hard': left }), 'part.pole');
    expect(at.severity).toBe('pass');
    const over = bySubject(await findingsOf(RULE, r, { 'clearance_mm.hard': left + 1e-9 }), 'part.pole');
    expect(over).toMatchObject({ severity: 'advice', load_case: 'static', value: left });
  });

  it('boundary: a clearance left on the stone equal to its limit passes, a hair less advises', async () => {
    const r = raw(THICK);
    const p = floors(r).floorStone.clearances[1];
    const left = p.clearance_mm - p.sag_mm;
    const at = bySubject(await findingsOf(RULE, r, { 'bump_clearance_mm.hard': left }), 'part.axle');
    expect(at).toMatchObject({ severity: 'pass', load_case: 'stone', value: left, limit: left });
    const over = bySubject(await findingsOf(RULE, r, { 'bump_clearance_mm.hard': left + 1e-9 }), 'part.axle');
    expect(over.severity).toBe('advice');
  });

  it('warns, saying why, when the floor could not be solved', async () => {
    const found = await findingsOf(RULE, raw({ floor_straps: { width_mm: 5, thickness_mm: 1, pitch_mm: 5 } }));
    expect(found.length).toBeGreaterThan(0);
    expect(found.every((f) => f.severity === 'warning' && f.code === 2215 && f.message_key === 'notSolved' && f.subject === 'floor.net')).toBe(true);
    expect(found[0].message).toContain('max_nodes');
  });

  it('hand calculation: one strap over the pole leaves the rail thickness less its sag; the figure gives the least in any case', async () => {
    // tests/support/one-strap-floor.ts: one side-to-side strap at x = 254 mm right over the pole,
    // one person of 80 kg on it, the rails free to bow (square corners, no lashing). The pole's
    // top is one rail thickness (45 mm) below the floor top (layout: the frame sits on the pole);
    // the floor over it sags by the strap's sag w, found by hand from the compatibility of the
    // strap's stretch with the frame's deflection. Clearance left = 45 − w in each case.
    const r = deepMerge(readDemo('demo-rear-axle'), ONE_STRAP);
    const a = floors(r);
    const found = await findingsOf(RULE, r);
    const pole = bySubject(found, 'part.pole');
    const w = (factor: number) => oneStrapHand(80 * 9.80665 * factor, a.floorStatic.frame!.E_MPa, a.floorStatic.EA_N).sag;
    const standing = 45 - w(1);
    const bump = 45 - w(a.floorBump.factor);
    const stone = 45 - w(a.floorStone.factor);
    // One strap sags more than a rail thickness under a person: the floor comes to bear on the pole standing, which governs (advice).
    expect(standing).toBeLessThan(0);
    expect(pole).toMatchObject({ severity: 'advice', load_case: 'static', message_key: 'strikes' });
    expect(pole.value! / standing - 1).toBeCloseTo(0, 6);
    const left = pole.working.filter((st) => st.formula?.startsWith('clearance left,'));
    expect(left.map((st) => st.result! / 1)).toHaveLength(3);
    expect(left[1].result! / bump - 1).toBeCloseTo(0, 6);
    expect(left[2].result! / stone - 1).toBeCloseTo(0, 6);
    // The figure: the least clearance left under the floor in any case, here on the stone.
    expect(stone).toBeLessThan(bump);
    expect(bump).toBeLessThan(standing);
    const figure = floorFigures({ floorStatic: a.floorStatic, floorBump: a.floorBump, floorStone: a.floorStone } as Parameters<typeof floorFigures>[0]).floor_clearance_min;
    expect(figure).toMatchObject({ unit: 'mm' });
    expect((figure as { value: number }).value / stone - 1).toBeCloseTo(0, 6);
  });

  it('reports the case that leaves the least clearance where standing clears', async () => {
    const found = await findingsOf(RULE, raw(THICK));
    const a = floors(raw(THICK));
    for (const part of ['pole', 'axle'] as const) {
      const f = bySubject(found, `part.${part}`);
      const left = [a.floorStatic, a.floorBump, a.floorStone].map((m) => m.clearances.find((c) => c.part === part)!).map((c) => c.clearance_mm - c.sag_mm);
      expect(f.value).toBe(Math.min(...left));
      expect(f.load_case).toBe((['static', 'rough-ground', 'stone'] as const)[left.indexOf(Math.min(...left))]);
    }
  });
});
