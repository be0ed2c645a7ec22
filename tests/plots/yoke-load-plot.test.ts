import { limitLevel } from '../../src/core/data/param.ts';
import { describe, expect, it } from 'vitest';
import { loadCases } from '../../src/core/model/load-cases.ts';
import { YOKE_LOAD_SAMPLES, yokeLoadPlot } from '../../src/core/plots/yoke-load-plot.ts';
import { G } from '../../src/core/units/units.ts';
import { dataWithGround, handSpec, prepared } from '../support/fixtures.ts';

// The hand-calculation spec (tests/support/fixtures.ts) on rigid ground
// (C_rr = 0): moments about the axle at x_a = 0.25 m give the pole load by
// hand (mechanics note, section 3): R_pole = g [9 kg × 1.0 m + 80 kg × (x - 0.25 m)] / 2.25 m,
// the pole's 9 kg standing 1.0 m ahead of the axle and box, axle and wheels over it.
const rigid = dataWithGround('hand-rigid', 0);

describe('load on each horse over crew position', () => {
  const spec = prepared(handSpec(), rigid);
  const plot = yokeLoadPlot(spec, rigid, 400)!;
  const line = (label: RegExp) => plot.lines.find((l) => label.test(l.label))!;
  const rule = (label: RegExp) => plot.rules.find((r) => label.test(r.label))!;

  it('samples the usable floor from end to end', () => {
    const m = spec.box.floor.usable_margin_mm;
    for (const l of plot.lines) {
      expect(l.x).toHaveLength(YOKE_LOAD_SAMPLES);
      expect(l.x[0]).toBe(m);
      expect(l.x.at(-1)).toBe(500 - m);
    }
  });

  it('standing, matches the moment balance worked by hand at every point', () => {
    const standing = line(/^standing$/);
    standing.x.forEach((x, i) => {
      const pole = (G * (9 * 1.0 + 80 * (x / 1000 - 0.25))) / 2.25;
      expect(standing.y[i]).toBeCloseTo((pole + 4 * G) / 2, 9);
    });
  });

  it("ends on the load cases' crew-aft and crew-forward figures, standing, accelerating and braking", () => {
    const cases = loadCases(spec, rigid);
    const per = (id: string) => cases.find((c) => c.id === id)!.per_horse_N;
    const pairs: [RegExp, string][] = [[/^standing$/, ''], [/^accelerating/, '-accelerating'], [/^braking/, '-braking']];
    for (const [label, suffix] of pairs) {
      expect(line(label).y[0]).toBeCloseTo(per(`crew-aft${suffix}`), 9);
      expect(line(label).y.at(-1)).toBeCloseTo(per(`crew-forward${suffix}`), 9);
    }
  });

  it("draws the horse-load limits, the lift line, the axle and the crew's centre as placed", () => {
    expect(rule(/^advisory limit, balance.horse-load/).value).toBeCloseTo(limitLevel(rigid, 'balance.horse-load', 'load_fraction', 'advisory') * 400 * G, 9);
    expect(rule(/^hard limit, balance.horse-load/).value).toBeCloseTo(limitLevel(rigid, 'balance.horse-load', 'load_fraction', 'hard') * 400 * G, 9);
    // R_pole = 0 leaves each horse half the 4 kg yoke's weight.
    expect(rule(/lifts the yoke/).value).toBeCloseTo((limitLevel(rigid, 'balance.yoke-lift', 'pole_load', 'hard') + 4 * G) / 2, 9);
    expect(rule(/^axle$/)).toMatchObject({ axis: 'x', value: 250 });
    expect(rule(/crew as placed/)).toMatchObject({ axis: 'x', value: 300 });
  });

  it('puts the crew centre at the mass-weighted mean of two crew members', () => {
    const s = handSpec();
    s.crew = [{ role: 'driver', mass_kg: 80, x_mm: 200, y_mm: 0 }, { role: 'archer', mass_kg: 60, x_mm: 340, y_mm: 0 }];
    const two = yokeLoadPlot(prepared(s, rigid), rigid, 400)!;
    expect(two.rules.find((r) => /crew as placed/.test(r.label))!.value).toBeCloseTo((80 * 200 + 60 * 340) / 140, 9);
  });

  it('is left out with no crew on board (the schema asks for one; the core does not rely on it)', () => {
    expect(yokeLoadPlot({ ...spec, crew: [] }, rigid, 400)).toBeNull();
  });
});
