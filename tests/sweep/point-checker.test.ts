import { describe, expect, it } from 'vitest';
import { readDemo, rulesData } from '../support/fixtures.ts';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import { pointChecker } from '../../src/core/sweep/point-checker.ts';
import { setPath } from '../../src/core/sweep/spec-diff.ts';
import type { KeyPath } from '../../src/core/spec/input-issue.ts';

// Each point the sweep's checker gives (reusing the design point's models and
// earlier points' values) must be what a whole check of that spec gives, run
// afresh by runCheck with nothing reused.

const raw = readDemo('demo-two-crew');
const FIGURES = ['yoke_load_per_horse', 'floor_sag_static_max', 'rollover_speed_at_turn', 'pole_stress_static', 'strap_tension_max', 'ride_crew_rise_max', 'floor_damping_ratio_needed'];

async function fullCheck(paths: readonly KeyPath[], values: readonly number[], ride: boolean) {
  let r: unknown = raw;
  paths.forEach((p, i) => (r = setPath(r, p, values[i])));
  const p = prepareSpec(r, rulesData);
  if (!p.ok) return { verdict: 'refused' as const };
  const c = runCheck(p.spec, p.entries, rulesData, { lp: await loadLpSolver(), ride, decisive: false });
  const withUtil = c.findings.filter((f) => f.utilisation !== null);
  const worst = withUtil.reduce<(typeof withUtil)[number] | null>((w, f) => (w === null || f.utilisation! > w.utilisation! ? f : w), null);
  return { verdict: c.verdict, worst_utilisation: worst?.utilisation ?? null, worst: worst && { rule: worst.rule, subject: worst.subject }, figures: FIGURES.map((n) => c.figures[n]?.value ?? null) };
}

async function agree(paths: KeyPath[], points: number[][], ride: boolean) {
  const checker = pointChecker(raw, rulesData, paths, { lp: await loadLpSolver(), ride, figures: FIGURES });
  if (!checker.ok) throw new Error(checker.reason);
  for (const v of points) {
    const got = checker.check(v);
    const want = await fullCheck(paths, v, ride);
    expect({ at: v, ...got }).toEqual({ at: v, ...want });
  }
  return checker;
}

describe('a point of a sweep is the whole check of its spec', () => {
  it('statics: the axle and a crew member moved (the floor re-solved), a point checked twice', async () => {
    await agree(
      [['axle', 'x_mm'], ['crew', 0, 'x_mm']],
      [[200, 320], [200, 400], [260, 320], [200, 400], [235, 320], [300, 250]],
      false,
    );
  }, 120_000);

  it('statics: a value that moves a computed default (the axle\'s depth sets the floor height) and the horses\' mass', async () => {
    const c = await agree([['axle', 'height_mm'], ['team', 'horse_mass_kg']], [[72, 380], [80, 430], [90, 500], [80, 500]], false);
    // The last point repeats an axle depth and a horse mass seen before: what reads only one of them is reused.
    expect(c.cache.hits).toBeGreaterThan(0);
  }, 120_000);

  it('with the ride model: the speed (read by the ride model through the spec its input hands on) and the crew', async () => {
    await agree([['operation', 'speed_kmh'], ['crew', 1, 'x_mm']], [[15, 320], [25, 320], [25, 380], [15, 380]], true);
  }, 180_000);

  it('a refused point gives its reason', () => {
    const checker = pointChecker(raw, rulesData, [['axle', 'x_mm']], { ride: false, figures: ['yoke_load_per_horse'] });
    if (!checker.ok) throw new Error(checker.reason);
    // The demo's floor is 560 mm deep: an axle at 600 mm lies outside it (cross-checks.ts, axleOutsideFloor).
    expect(checker.check([600])).toMatchObject({ verdict: 'refused', figures: [null], reason: expect.stringContaining('axle.x_mm') });
  }, 60_000);
});

describe('reuse across the points of a grid', () => {
  it('an envelope line\'s point (only the axle moved) keeps its floor for the grid\'s points at that axle position', async () => {
    const paths: KeyPath[] = [['axle', 'x_mm'], ['team', 'horse_mass_kg']];
    const design = (raw as { team: { horse_mass_kg: number } }).team.horse_mass_kg;
    // The line point first, as the sweep's order puts it, then two grid points at the same axle position.
    const checker = await agree(paths, [[180, design], [180, 300], [180, 330]], false);
    if (!checker.ok) throw new Error('no checker');
    // The strap floor reads the axle's position (its frame rests on the axle), not the horses: one solve for the three.
    expect(checker.computed.get('floorStatic')).toBe(1);
    expect(checker.computed.get('floorLoaded')).toBe(1);
  }, 120_000);

  it('moving the crew re-solves the floor but keeps its net and frame (floorSetup reads no crew)', async () => {
    const checker = await agree([['crew', 0, 'x_mm']], [[260], [300]], false);
    if (!checker.ok) throw new Error('no checker');
    expect(checker.computed.get('floorStatic')).toBe(2);
    expect(checker.computed.get('floorSetup')).toBeUndefined();
  }, 120_000);
});
