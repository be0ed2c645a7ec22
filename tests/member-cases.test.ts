import { describe, expect, it } from 'vitest';
import { Analysis } from './support/analysis.ts';
import { crewAt } from '../src/core/model/load-cases.ts';
import { massModel } from '../src/core/model/mass-model.ts';
import { poleLoad } from '../src/core/model/pole-load.ts';
import { rollingResistance } from '../src/core/model/rolling-resistance.ts';
import { G } from '../src/core/units/units.ts';
import { prepared, readDemo, rulesData } from './support/fixtures.ts';

// The member load cases as EN 1990 combinations (design basis, section 2).
// Fundamental, eq. 6.10 with Table A1.2(B): 1.35 G + 1.5 Q_lead + 1.5 psi_0 Q;
// accidental, eq. 6.11: every action x 1.0. Checked by hand here from the
// balance model's own loads: G the chariot without its crew, Q the rest.
const GG = 1.35; // EN 1990 Table A1.2(B), gamma_G,sup
const GQ = 1.5; // EN 1990 Table A1.2(B), gamma_Q
const PSI_CREW = 1.0; // rules/parameters/combinations.yaml, psi_0_crew (a judgement)

describe('member load cases', () => {
  const spec = prepared(readDemo('demo-rear-axle'));
  const a = new Analysis(spec, rulesData);
  const byId = (id: string) => a.memberCases.find((c) => c.id === id)!;
  const rr = rollingResistance(spec, rulesData);
  const pole = (s: typeof spec, accel: number) =>
    poleLoad({ parts: massModel(s, rulesData).parts.filter((p) => p.group === 'rolling'), axleX_mm: s.axle.x_mm, yokeX_mm: s.pole.yoke_x_mm, yokeZ_mm: s.pole.yoke_height_mm, accel_g: accel, resistance: rr });
  const dead = pole({ ...spec, crew: [], loads: [] }, 0);
  const standing = (['as placed', 'forward', 'aft'] as const).map((p) => pole(crewAt(spec, p), 0));
  const wheelG = dead.axle_N / 2;
  const wheelQ = Math.max(...standing.map((r) => r.axle_N)) / 2 - wheelG;
  const poleG = Math.abs(dead.pole_N);
  const poleQ = Math.max(...standing.map((r) => Math.abs(r.pole_N))) - poleG;

  it('names each case with its combination, load duration and material factor', () => {
    expect(a.memberCases.map((c) => [c.id, c.combination, c.duration, c.gammaM])).toEqual([
      ['dead', 'fundamental', 'permanent', 1.3],
      ['static', 'fundamental', 'short', 1.3],
      ['rough-ground', 'fundamental', 'short', 1.3],
      ['turn', 'fundamental', 'short', 1.3],
      ['accelerating', 'fundamental', 'short', 1.3],
      ['braking', 'fundamental', 'short', 1.3],
      // EN 1995-1-1 Table 2.3 (gamma_M 1.3 for solid timber) and its accidental value 1.0
      ['stone', 'accidental', 'instantaneous', 1.0],
      ['stopping-shock', 'accidental', 'instantaneous', 1.0],
    ]);
  });

  it('the own weight alone takes 1.35; standing with the crew 1.35 G + 1.5 Q', () => {
    expect(byId('dead').wheel_N).toBeCloseTo(GG * wheelG, 9);
    expect(byId('dead').pole_N).toBeCloseTo(GG * poleG, 9);
    expect(byId('static').wheel_N).toBeCloseTo(GG * wheelG + GQ * wheelQ, 9);
    expect(byId('static').pole_N).toBeCloseTo(GG * poleG + GQ * poleQ, 9);
  });

  it('rough ground leads with its increment (phi - 1)(G + Q); the stone is accidental, phi (G + Q) unfactored', () => {
    const phi = a.bumpFactors.wheel.value;
    expect(byId('rough-ground').wheel_N).toBeCloseTo(GG * wheelG + GQ * PSI_CREW * wheelQ + GQ * (phi - 1) * (wheelG + wheelQ), 9);
    expect(byId('rough-ground').gravityFactor).toBe(phi);
    const yoke = Math.max(0, a.bumpFactors.yokeIncrease_N!);
    expect(byId('rough-ground').pole_N).toBeCloseTo(GG * poleG + GQ * PSI_CREW * poleQ + GQ * yoke, 9);
    // The stone's own factors, from the ride model's stone cases.
    const phiStone = a.stoneFactors.wheel.value;
    expect(phiStone).toBeGreaterThan(phi);
    expect(byId('stone').wheel_N).toBeCloseTo(phiStone * (wheelG + wheelQ), 9);
    expect(byId('stone').gravityFactor).toBe(phiStone);
    expect(byId('stone').pole_N).toBeCloseTo(poleG + poleQ + Math.max(0, a.stoneFactors.yokeIncrease_N!), 9);
  });

  it('the turn leads with the load transfer and the lateral force', () => {
    const placed = pole(spec, 0);
    const half = placed.axle_N / 2;
    expect(byId('turn').wheel_N).toBeCloseTo(GG * wheelG + GQ * PSI_CREW * (half - wheelG) + GQ * a.turn.loadTransfer, 9);
    expect(byId('turn').wheelLateral_N).toBeCloseTo(GQ * a.turn.outerLateral, 9);
  });

  it('braking pushes 1.5 x m b g along the pole; the stopping shock is the balance model at twice the braking, unfactored', () => {
    expect(byId('braking').poleAxial_N).toBeCloseTo(GQ * a.mass.rolling.mass_kg * spec.operation.braking_g * G, 9);
    // Independent of the linear scaling the case uses: solve the pole load afresh at −2 × 0.3 g (shock factor 2, rules/parameters/load-cases.yaml).
    const shock = Math.max(...(['as placed', 'forward', 'aft'] as const).map((p) => Math.abs(pole(crewAt(spec, p), -2 * spec.operation.braking_g).pole_N)));
    expect(byId('stopping-shock').pole_N).toBeCloseTo(shock, 6);
    expect(byId('stopping-shock').poleAxial_N).toBeCloseTo(2 * a.mass.rolling.mass_kg * spec.operation.braking_g * G, 9);
  });
});
