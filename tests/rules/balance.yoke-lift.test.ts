import { describe, expect, it } from 'vitest';
import { equilibriumPoleLoad } from '../../src/core/model/load-cases.ts';
import { massModel } from '../../src/core/model/mass-model.ts';
import { G } from '../../src/core/units/units.ts';
import { dataWithGround, findingsOf, handSpec, prepared, readDemo, deepMerge } from '../support/fixtures.ts';

const RULE = 'balance.yoke-lift';

describe(RULE, () => {
  it('EQU by hand: weights ahead of the axle × 0.9, the crew behind it × 1.5 and ahead left out', () => {
    // EN 1990 Table A1.2(A). The hand spec (rigid ground, no rolling resistance): axle at 250 mm, reach 2.25 m,
    // pole 9 kg centred 1.0 m ahead of the axle; box, axle and wheels over the axle; crew 80 kg.
    const rigid = dataWithGround('hand-rigid', 0);
    const at = (crewX: number) => {
      const s = handSpec();
      s.crew[0].x_mm = crewX;
      const spec = prepared(s, rigid);
      return equilibriumPoleLoad(spec, rigid, massModel(spec, rigid), 0).pole_N;
    };
    // Crew 50 mm ahead: it helps, so it is left out; the pole × 0.9 (the box, axle and wheels have no arm).
    expect(at(300)).toBeCloseTo((0.9 * 9 * 1.0 * G) / 2.25, 9);
    // Crew 50 mm behind: it lifts, × 1.5.
    expect(at(200)).toBeCloseTo(((0.9 * 9 * 1.0 - 1.5 * 80 * 0.05) * G) / 2.25, 9);
  });

  it("EQU by hand in motion: each mass's inertia at its own height × 1.5 where the motion lifts the yoke; the driver stays aboard × 0.9", () => {
    // EN 1990 Table A1.2(A); the driver's presence while the vehicle moves is the design basis's judgement (section 3).
    // Moments about the contact on rigid ground (no rolling resistance): R = [Σ f_i·m_i·g·(x_i − x_a) + a·Σ fI_i·m_i·(h_y − z_i)] / L.
    const rigid = dataWithGround('hand-rigid', 0);
    const s = handSpec();
    s.crew[0].x_mm = 300;
    const spec = prepared(s, rigid);
    const model = massModel(spec, rigid);
    const xa = spec.axle.x_mm / 1000;
    const hy = spec.pole.yoke_height_mm / 1000;
    const L = spec.pole.yoke_x_mm / 1000 - xa;
    const rolling = model.parts.filter((p) => p.group === 'rolling');
    const hand = (a_g: number, fI: number) =>
      rolling.reduce((sum, p) => {
        const arm = p.x_mm / 1000 - xa;
        const f = p.variable ? 0.9 : arm >= 0 ? 0.9 : 1.1; // the one crew member is the driver, ahead of the axle
        return sum + f * p.mass_kg * G * arm + fI * p.mass_kg * a_g * G * (hy - p.z_mm / 1000);
      }, 0) / L;
    // Braking (a < 0): the lower of the motion left out and the motion × 1.5 is the equilibrium case.
    const braking = Math.min(hand(-0.3, 0), hand(-0.3, 1.5));
    expect(equilibriumPoleLoad(spec, rigid, model, -0.3).pole_N).toBeCloseTo(braking, 9);
    const accelerating = Math.min(hand(0.2, 0), hand(0.2, 1.5));
    expect(equilibriumPoleLoad(spec, rigid, model, 0.2).pole_N).toBeCloseTo(accelerating, 9);
    // The two motions lift the yoke in opposite senses, so exactly one of them takes the inertia.
    expect(hand(-0.3, 1.5) < hand(-0.3, 0)).not.toBe(hand(0.2, 1.5) < hand(0.2, 0));
  });

  it('passes when the axle is under the rear edge (the crew always ahead of it), in equilibrium', async () => {
    const [f, seated] = await findingsOf(RULE, readDemo('demo-rear-axle'));
    expect(f.severity).toBe('pass');
    expect(f.combination).toBe('equilibrium');
    expect(f.value!).toBeGreaterThan(0);
    // As driven, the least unfactored pole load is above the seating a yoke needs.
    expect(seated).toMatchObject({ severity: 'pass', message_key: 'seated', combination: 'characteristic' });
    expect(seated.value!).toBeGreaterThan(f.value!);
  });

  it('fails when the axle stands ahead of the crew at the back of the floor', async () => {
    const [f] = await findingsOf(RULE, deepMerge(readDemo('demo-two-crew'), { axle: { x_mm: 520 } }));
    expect(f.severity).toBe('fail');
    expect(f.value!).toBeLessThan(0);
    expect(f.working_text).toContain('R_pole =');
    expect(f.subject_label).toContain('back of the usable floor');
    expect(f.subject).toBe(`case.${f.load_case}`);
    expect(f.params.lift as number).toBeCloseTo(-f.value!, 12);
  });

  it('boundary: a least pole load equal to the lift limit does not lift', async () => {
    const raw = readDemo('demo-two-crew');
    const [probe] = await findingsOf(RULE, raw);
    const v = probe.value!;
    const [atLimit] = await findingsOf(RULE, raw, { 'pole_load.hard': v });
    expect(atLimit.severity).toBe('pass');
    const [justOver] = await findingsOf(RULE, raw, { 'pole_load.hard': v + 1e-6 * Math.abs(v) + 1e-9 });
    expect(justOver.severity).toBe('fail');
  });

  it('gives advice when the yoke only just rests on the necks as driven, with the loads unfactored', async () => {
    // The central-axle demo with both crew at the back, accelerating: the pole still presses down in
    // equilibrium terms, but by less than the seating a yoke needs not to bounce (100 N, from memory).
    const [lift, seated] = await findingsOf(RULE, readDemo('demo-two-crew'));
    expect(lift.severity).toBe('pass');
    expect(seated).toMatchObject({ severity: 'advice', message_key: 'light', combination: 'characteristic', load_case: 'crew-aft-accelerating' });
    expect(seated.value!).toBeLessThan(100);
    expect(seated.params.advisory).toBe(100);
    // The seated value is the unfactored pole load, the largest lift of the two (EQU leaves out the crew's help).
    expect(seated.value!).toBeGreaterThan(lift.value!);
    // A minimum limit: utilisation is limit over value.
    expect(seated.utilisation!).toBeCloseTo(100 / seated.value!, 12);
  });

  it('boundary: a least unfactored pole load equal to the seating level passes', async () => {
    const raw = readDemo('demo-two-crew');
    const [, probe] = await findingsOf(RULE, raw);
    const [, at] = await findingsOf(RULE, raw, { 'seated_load.advisory': probe.value! });
    expect(at.severity).toBe('pass');
    const [, over] = await findingsOf(RULE, raw, { 'seated_load.advisory': probe.value! * (1 + 1e-9) });
    expect(over.severity).toBe('advice');
  });
});
