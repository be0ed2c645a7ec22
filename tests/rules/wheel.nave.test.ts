import { describe, expect, it } from 'vitest';
import type { Finding } from '../../src/core/findings/finding.ts';
import { Analysis } from '../support/analysis.ts';
import { dataWithGround, deepMerge, findingsOf, handSpec, prepared, readDemo } from '../support/fixtures.ts';
import { bySubjectId, expectPlainTemplates, expectUtilisationBoundary } from '../support/member-support.ts';

const rigid = dataWithGround('hand-rigid', 0); // lateral friction 0.5 (the fixture's ground)
const RULE = 'wheel.nave';
const outer = bySubjectId('wheel.outer.nave');
const inner = bySubjectId('wheel.inner.nave');

/** The result of the step `formula` in the working of the case titled `title` (the arm's check, the first after the title). */
function caseStep(f: Finding, title: string, formula: string): number {
  const start = f.working.findIndex((s) => s.formula.startsWith(`${title} [`));
  if (start < 0) throw new Error(`no case ${title}`);
  const s = f.working.slice(start + 1).find((x) => x.formula.startsWith(formula));
  if (!s || s.result === null) throw new Error(`no step ${formula} in ${title}`);
  return s.result;
}

/** No stone and no rough ground, so the design turn governs the outer wheel (demo data). */
const turnOnly = () => deepMerge(handSpec(), { operation: { bump_height_mm: 0, speed_kmh: 20, turn_radius_m: 8, rough_ground: { height_mm: 0, length_mm: 1000 } } });

describe(RULE, () => {
  it('passes both demos, one finding for each wheel', async () => {
    for (const demo of ['demo-two-crew', 'demo-rear-axle']) {
      const found = await findingsOf(RULE, readDemo(demo));
      expect(found.map((f) => f.subject)).toEqual(['wheel.outer.nave', 'wheel.inner.nave']);
      for (const f of found) expect(f.severity, `${demo} ${f.subject}`).toBe('pass');
    }
  });

  it('hand statics: the nave as a short beam on two bearings, struck by the stone', async () => {
    // Closed-form statics of a beam on two supports. The hand spec: nave 300 mm long, bore 70 mm, wheel
    // 900 mm (r = 450 mm), the bearing zones a quarter of the nave each: l_zone = 75 mm, L_b = 300 − 75 = 225 mm.
    // The stone's side force F = μ·N = 0.5·N (the fixture ground's lateral friction). Moments about the less
    // loaded zone's centre: R·L_b = N·L_b/2 + F·r, so R = N/2 + 0.5·N·450/225 = 1.5·N, and
    // p = R/(d·l_zone) = 1.5·N/(70 × 75) = N/3500 MPa.
    const raw = handSpec();
    const a = new Analysis(prepared(raw, rigid), rigid);
    const stone = a.memberCases.find((c) => c.id === 'stone')!;
    const N = stone.wheel_N;
    const f = outer(await findingsOf(RULE, raw, {}, rigid));
    expect(f.load_case).toBe('stone');
    expect(f.combination).toBe('accidental');
    expect(caseStep(f, stone.title, 'F_side')).toBeCloseTo(0.5 * N, 6);
    expect(caseStep(f, stone.title, 'M = F·r')).toBeCloseTo(0.5 * N * 450, 6);
    expect(caseStep(f, stone.title, 'R = N_w/2')).toBeCloseTo(1.5 * N, 6);
    // Vertical equilibrium: the two zones carry N between them (R_other = N/2 − 0.5·N·450/225 = −0.5·N, on the far side of the arm).
    expect(caseStep(f, stone.title, 'R_other')).toBeCloseTo(-0.5 * N, 6);
    expect(f.value! / (N / 3500)).toBeCloseTo(1, 9);
    // Rock elm across the grain, 8.5 MPa at 12 % (Wood Handbook Table 5-3a, in the rules data), to a 5th
    // percentile with COV 0.18 (handbook chapter 5): 8.5 × (1 − 1.645 × 0.18) = 5.983 MPa; sawn stock 0.6,
    // instantaneous k_mod 1.1, γ_M 1.0 in the accidental combination (EN 1995-1-1 Table 3.1, 2.4.1), k_c,90 1:
    // 5.983 × 0.6 × 1.1 = 3.949 MPa. Axle and nave are both rock elm, so the two checks meet the same strength.
    expect(f.limit!).toBeCloseTo(8.5 * (1 - 1.645 * 0.18) * 0.6 * 1.1, 6);
  });

  it('hand statics: in the design turn the outer wheel is the worse, the inner takes the transfer off', async () => {
    // Design basis section 4: ΔN = m·a_lat·h_g/t; the design turn leads with γ_Q = 1.5 (EN 1990 Table A1.2(B)):
    // N_outer = N_0 + 1.5·ΔN, N_inner = N_0 − 1.5·ΔN; the lateral force m·a_lat shared in proportion to
    // wheel load, × 1.5. Each zone: R = N/2 + F·450/225 = N/2 + 2·F (the hand spec's nave as above).
    const raw = turnOnly();
    const a = new Analysis(prepared(raw, rigid), rigid);
    const t = a.turn;
    const turn = a.memberCases.find((c) => c.id === 'turn')!;
    const found = await findingsOf(RULE, raw, {}, rigid);
    const o = outer(found);
    const i = inner(found);
    expect(o.load_case).toBe('turn');
    expect(o.combination).toBe('fundamental');
    expect(o.value! / ((turn.wheel_N / 2 + 2 * turn.wheelLateral_N) / 5250)).toBeCloseTo(1, 9);
    const Nin = turn.wheel_N - 2 * 1.5 * t.loadTransfer;
    const Fin = (1.5 * t.mass * t.lateralAccel * (t.wheelsLoad / 2 - t.loadTransfer)) / t.wheelsLoad;
    const innerTitle = `inner wheel in the design turn (8 m at 20 km/h)`;
    expect(caseStep(i, innerTitle, 'N_w')).toBeCloseTo(Nin, 6);
    expect(caseStep(i, innerTitle, 'F_lat,inner')).toBeCloseTo(Fin, 6);
    expect(caseStep(i, innerTitle, 'p = R/(d·l_zone)')).toBeCloseTo((Nin / 2 + 2 * Fin) / 5250, 9);
    expect(caseStep(i, innerTitle, 'p = R/(d·l_zone)')).toBeLessThan(o.value!);
  });

  it('a shorter nave on the same wheel bears harder: the couple on each zone grows as 1/L_b', async () => {
    // For each nave length L: l_zone = L/4, L_b = 3L/4; R − N/2 = F·r/L_b (statics above), so
    // (R − N/2)·L_b = F·r is the same for every L, and p = R/(70·L/4) rises as L falls.
    const lengths = [150, 200, 250, 300, 400];
    const rows: { L: number; N: number; F: number; R: number; p: number; severity: string }[] = [];
    for (const L of lengths) {
      const raw = deepMerge(handSpec(), { wheels: { nave: { length_mm: L } } });
      const f = outer(await findingsOf(RULE, raw, {}, rigid));
      const title = f.working.find((s) => s.formula.startsWith('stone struck'))!.formula.split(' [')[0];
      rows.push({ L, N: caseStep(f, title, 'N_w'), F: caseStep(f, title, 'F_side'), R: caseStep(f, title, 'R = N_w/2'), p: caseStep(f, title, 'p = R/(d·l_zone)'), severity: f.severity });
    }
    for (const r of rows) {
      expect(r.N).toBeCloseTo(rows[0].N, 6); // the wheels' masses are given: the loads do not move with the nave
      expect((r.R - r.N / 2) * (0.75 * r.L)).toBeCloseTo(r.F * 450, 4);
      expect(r.p).toBeCloseTo(r.R / (70 * 0.25 * r.L), 9);
    }
    for (let k = 1; k < rows.length; k++) expect(rows[k].p).toBeLessThan(rows[k - 1].p);
    // On this 900 mm wheel a 150 mm nave crushes where the 300 mm nave holds.
    expect(rows[0].severity).toBe('fail');
    expect(rows.find((r) => r.L === 300)!.severity).toBe('pass');
  });

  it('the zone fraction and k_c,90 enter as the statics say', async () => {
    const raw = handSpec();
    const base = outer(await findingsOf(RULE, raw, {}, rigid));
    // Zones of a third: l_zone = 100, L_b = 200; R = N/2 + 0.5·N·450/200 = 1.625·N, p = 1.625·N/7000,
    // against 1.5·N/5250 with quarters.
    const third = outer(await findingsOf(RULE, raw, { bearing_zone_fraction: 1 / 3 }, rigid));
    expect(third.value! / base.value!).toBeCloseTo(1.625 / 7000 / (1.5 / 5250), 9);
    const enhanced = outer(await findingsOf(RULE, raw, { k_c90: 1.5 }, rigid));
    expect(enhanced.limit! / base.limit!).toBeCloseTo(1.5, 12);
  });

  it('its messages hold no numbers of their own', () => {
    expectPlainTemplates(RULE);
  });

  it('boundary: a pressure equal to the design strength passes', async () => {
    await expectUtilisationBoundary(RULE, readDemo('demo-two-crew'), outer);
  });
});
