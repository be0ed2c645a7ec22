import { describe, expect, it } from 'vitest';
import { Analysis, rideInput } from '../support/analysis.ts';
import { rideCaseOf } from '../../src/core/ride/ride-model.ts';
import { buildRide } from '../../src/core/ride/ride-build.ts';
import { energy, stateSize } from '../../src/core/ride/ride-system.ts';
import { integrate } from '../../src/core/ride/integrate.ts';
import { contactMode, derivative, newForces } from '../../src/core/ride/ride-system.ts';
import { staticEquilibrium } from '../../src/core/ride/static-equilibrium.ts';
import { rideByOdex } from '../../src/node/ride-odex.ts';
import { rideParam } from '../../src/core/ride/ride-data.ts';
import { deepMerge, prepared, readDemo, rulesData } from '../support/fixtures.ts';

const analysis = (name: string) => new Analysis(prepared(readDemo(name)), rulesData);
const analysis2 = (raw: Record<string, unknown>) => new Analysis(prepared(raw), rulesData);
const DEMOS = ['demo-two-crew', 'demo-rear-axle', 'teaching-flawed'];

describe('the ride model', () => {
  it('starts from a static equilibrium that gives the balance model\'s axle and yoke loads', () => {
    for (const name of DEMOS) {
      const a = analysis(name);
      for (const which of ['rough-ridge', 'rough-one-wheel', 'stone-ridge', 'stone-one-wheel'] as const) {
        const rest = staticEquilibrium(buildRide(rideInput(a), which).system);
        expect(rest.forces.yoke, name).toBeCloseTo(a.staticCase.pole_load_N, 6);
        expect(rest.forces.wheel[0] + rest.forces.wheel[1], name).toBeCloseTo(a.staticCase.axle_load_N, 6);
        // each person stands on the floor with their own weight
        a.spec.crew.forEach((c, i) => expect(rest.forces.crew[i]).toBeCloseTo(c.mass_kg * 9.80665, 6));
      }
    }
  });

  it('conserves energy to 0.1 % with damping off and the contacts closed', () => {
    const a = analysis('demo-two-crew');
    // The draught couple h_y·C_rr·ΣF_wheel follows the wheel loads and has no potential: off for this check.
    const sys = { ...buildRide(rideInput(a), 'rough-ridge', { undamped: true, bumpHeight: 0 }).system, draughtArm: 0 };
    const rest = staticEquilibrium(sys);
    const y0 = Float64Array.from(rest.y);
    y0[0] += 0.0005; // heave the body 0.5 mm and lift the first person 3 mm: every contact stays closed
    y0[3] += 0.003;
    const E0 = energy(sys, 0, y0), Erest = energy(sys, 0, rest.y);
    const scratch = newForces(sys);
    const closed = contactMode(sys, 0, y0, scratch);
    let worst = 0, opened = false;
    integrate((t, y, dy) => derivative(sys, t, y, dy), (t, y) => contactMode(sys, t, y, scratch), y0, 0, 3, {
      rtol: 1e-9,
      atol: 1e-12,
      h0: 2e-4,
      eventTolerance: 1e-9,
      onStep(_t0, t1, y, mode) {
        worst = Math.max(worst, Math.abs(energy(sys, t1, y) - E0));
        if (mode !== closed) opened = true;
      },
    });
    expect(opened).toBe(false);
    expect(worst / (E0 - Erest)).toBeLessThan(1e-3);
    expect(stateSize(sys)).toBe(2 * (3 + 2)); // no ground points without ground damping
  });

  it('agrees with odex at relative tolerance 1e-10 within 0.05 mm on the crew\'s rise over the demo\'s rough ground and stone', () => {
    const a = analysis('demo-two-crew');
    for (const which of ['rough-ridge', 'stone-ridge'] as const) {
      const ours = rideCaseOf(rideInput(a), which);
      const ref = rideByOdex(buildRide(rideInput(a), which), rideParam(rulesData, 'ride.inputs', 'duration_s').value, 1e-10);
      ours.crew.forEach((c, i) => expect(Math.abs(c.rise_mm - ref.rise_mm[i]), which).toBeLessThan(0.05));
      expect(ours.crew[0].rise_mm).toBeGreaterThan(5);
    }
  });

  it('gives each case its results, and the drop test falls from the given height', () => {
    const a = analysis('demo-two-crew');
    const r = a.ride;
    expect(Object.keys(r)).toEqual(['rough-ridge', 'rough-one-wheel', 'stone-ridge', 'stone-one-wheel', 'drop']);
    expect(r.drop.crew[0].rise_mm).toBeCloseTo(500, 3); // released 500 mm above standing: the highest point
    expect(r['rough-ridge'].wheels.every((w) => w.dlf > 1)).toBe(true);
    // the one-wheel cases strike the left wheel harder than the right
    for (const c of ['rough-one-wheel', 'stone-one-wheel'] as const) expect(r[c].wheels[0].dlf).toBeGreaterThan(r[c].wheels[1].dlf);
    // the short stone strikes harder than the long, low ridge of rough ground
    expect(r['stone-ridge'].wheels[0].dlf).toBeGreaterThan(r['rough-ridge'].wheels[0].dlf);
    // The check keeps the samples its plots draw: every third of the 1501 samples of 3 s at 2 ms, and the last.
    expect(r['rough-ridge'].series.stride).toBe(3);
    expect(r['rough-ridge'].series.t_s.length).toBe(501);
    expect(r['rough-ridge'].series.t_s.at(-1)).toBeCloseTo(3, 9);
  });

  it('reads the rough ground from the specification, else from the ground type, and the stone from bump_height_mm', () => {
    const rough = (raw: Record<string, unknown>) => analysis2(raw).ride['rough-ridge'].working.find((w) => w.startsWith('road:'))!;
    const demo = readDemo('demo-two-crew');
    // turf's rough_ground in rules/grounds.yaml
    const turf = rulesData.grounds.turf.rough_ground!;
    expect(rough(demo)).toContain(`${turf.height_mm.value}.0 mm high (rules/grounds.yaml, turf.rough_ground.height_mm`);
    expect(rough(deepMerge(demo, { operation: { rough_ground: { height_mm: 25, length_mm: 900 } } }))).toContain('25.0 mm high (operation.rough_ground.height_mm) and 900 mm long (operation.rough_ground.length_mm)');
    const stoneRoad = analysis2(demo).ride['stone-ridge'].working.find((w) => w.startsWith('road:'))!;
    expect(stoneRoad).toContain('15.0 mm high (operation.bump_height_mm) and 200 mm long (operation.bump_length_mm)');
  });

  it('feeds its factors to the floor, member and lashing rules, saying where they came from', () => {
    const a = analysis('demo-two-crew');
    const f = a.bumpFactors;
    expect(f.provisional).toBe(false);
    expect(f.crew.source).toMatch(/^ride model, rough-(ridge|one-wheel) case: \d\.\d\d/);
    expect(f.crew.value).toBeGreaterThanOrEqual(1);
    expect(a.floorBump.factor).toBe(f.crew.value);
    expect(a.floorBump.factorSource).toContain('ride model');
    const bump = a.memberCases.find((c) => c.id === 'rough-ground')!;
    expect(bump.gravityFactor).toBe(f.wheel.value);
    expect(bump.sources.join(' ')).toContain('ride model');
    const crewFactor = Math.max(...a.ride['rough-ridge'].crew.map((c) => c.floor_dlf), ...a.ride['rough-one-wheel'].crew.map((c) => c.floor_dlf));
    expect(f.crew.value).toBeCloseTo(Math.max(1, crewFactor), 12);
    const wheelFactor = Math.max(...a.ride['rough-ridge'].wheels.map((w) => w.dlf), ...a.ride['rough-one-wheel'].wheels.map((w) => w.dlf));
    expect(f.wheel.value).toBeCloseTo(Math.max(1, wheelFactor), 12);
    // the stone's factors, from its own two cases
    const stone = a.graph.get('stoneFactors');
    const stoneWheel = Math.max(...a.ride['stone-ridge'].wheels.map((w) => w.dlf), ...a.ride['stone-one-wheel'].wheels.map((w) => w.dlf));
    expect(stone.wheel.value).toBeCloseTo(stoneWheel, 12);
    expect(stone.wheel.from).toMatch(/^stone-/);
    expect(stone.provisional).toBe(false);
  });

  it('without a ride (a statics-only run) the factors are the data\'s bounds, and provisional', () => {
    const a = new Analysis(prepared(readDemo('demo-two-crew')), rulesData, undefined, { ride: false });
    const routine = a.bumpFactors, stone = a.graph.get('stoneFactors');
    const bound = (n: string) => rulesData.params['load-cases'][n].value;
    expect([routine.provisional, routine.crew.value, routine.wheel.value, routine.yokeIncrease_N]).toEqual([true, bound('routine_factor_bound'), bound('routine_factor_bound'), null]);
    expect([stone.provisional, stone.crew.value, stone.wheel.value]).toEqual([true, bound('stone_factor_bound'), bound('stone_factor_bound')]);
    expect(routine.wheel.source).toContain('routine_factor_bound');
    expect(routine.wheel.sources).toEqual(rulesData.params['load-cases'].routine_factor_bound.sources);
  });

  it('the routine wheel factor of the demonstration builds lies between 1.5 and 3.5', () => {
    // The target band for routine rough ground (design basis, section 8); the stone strikes harder.
    for (const name of ['demo-two-crew', 'demo-rear-axle']) {
      const a = analysis(name);
      expect(a.bumpFactors.wheel.value, name).toBeGreaterThan(1.5);
      expect(a.bumpFactors.wheel.value, name).toBeLessThan(3.5);
      expect(a.graph.get('stoneFactors').wheel.value, name).toBeGreaterThan(a.bumpFactors.wheel.value);
    }
  });

  it('the floor-damping tuner finds a ratio at which the rules just hold', () => {
    const a = analysis('demo-rear-axle');
    const need = a.floorDampingNeeded;
    expect(need.ratio).not.toBeNull();
    const at = rideCaseOf(rideInput(a), 'drop', { floorDampingRatio: need.ratio! });
    const below = rideCaseOf(rideInput(a), 'drop', { floorDampingRatio: need.ratio! * 0.97 });
    expect(at.decayCycles!).toBeLessThanOrEqual(3);
    expect(below.decayCycles === null || below.decayCycles > 3).toBe(true);
  });
});
