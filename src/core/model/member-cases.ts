import type { RulesData } from '../data/rules-data.ts';
import type { LoadCaseResult } from './load-case-result.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { G } from '../units/units.ts';
import { staticPoleLoad } from './load-cases.ts';
import { bumpFactorSources } from './bump-sources.ts';
import { loadFactor } from './load-factors.ts';
import { massModel, type MassModel } from './mass-model.ts';
import type { Duration } from './timber/load-duration.ts';
import type { TurnModel } from './turn.ts';

// The load cases the timber members are checked in (issue: static, bump, the
// design turn, braking), each with its load-duration class (mechanics note,
// section 1). Each case is the envelope over the crew positions of the
// balance load cases: the largest wheel load and the largest pole load, which
// may come from different positions (the safe side).

export type MemberCaseId = 'dead' | 'standing' | 'bump' | 'turn' | 'accelerating' | 'braking' | 'stopping-shock';

export interface MemberCase {
  id: MemberCaseId;
  title: string;
  duration: Duration;
  /** Vertical ground load on the more loaded wheel, N. */
  wheel_N: number;
  /** Lateral ground force on that wheel, N. */
  wheelLateral_N: number;
  /** Vertical force between the pole and the yoke, magnitude, N. */
  pole_N: number;
  /** Force along the pole at the yoke: positive pushes (braking), negative pulls (draught), N. */
  poleAxial_N: number;
  /** Factor on the parts' own weight (the bump factor in the bump case, else 1). */
  gravityFactor: number;
  working: string;
  /** Sources of the factors this case applies, as text. */
  sources: string[];
  /** The same as catalogue ids (rules/sources.yaml). */
  sourceIds: string[];
}

const f = (v: number, d = 1) => v.toFixed(d);

interface Envelope {
  wheel_N: number;
  pole_N: number;
  working: string;
}

function envelope(list: readonly { title: string; axle_N: number; pole_N: number }[]): Envelope {
  const byWheel = list.reduce((w, c) => (c.axle_N > w.axle_N ? c : w));
  const byPole = list.reduce((w, c) => (Math.abs(c.pole_N) > Math.abs(w.pole_N) ? c : w));
  return {
    wheel_N: byWheel.axle_N / 2,
    pole_N: Math.abs(byPole.pole_N),
    working: `N_w = axle load / 2 = ${f(byWheel.axle_N)} / 2 = ${f(byWheel.axle_N / 2)} N (${byWheel.title}); |R_pole| = ${f(Math.abs(byPole.pole_N))} N (${byPole.title})`,
  };
}

const standingPole = (cases: readonly LoadCaseResult[]) => envelope(asLoads(cases.filter((c) => c.accel_g === 0))).pole_N;

const asLoads = (cases: readonly LoadCaseResult[]) => cases.map((c) => ({ title: c.title, axle_N: c.axle_load_N, pole_N: c.pole_load_N }));

/** The bump case's factor and where it came from; without one, the placeholder bump_dynamic_factor. */
export interface BumpInput {
  /** `from`: the ride case the factor came from, null or absent for the placeholder. */
  factor: { value: number; source: string; from?: string | null };
  /** The ride model's largest yoke force above the standing one, N: added to the worst standing pole load when that gives more. */
  yokeIncrease_N: number | null;
}

export function memberCases(spec: CheckedSpecification, data: RulesData, mass: MassModel, cases: readonly LoadCaseResult[], turn: TurnModel, bumpIn?: BumpInput): MemberCase[] {
  const m = mass.rolling.mass_kg;
  const Crr = data.grounds[spec.operation.ground].rolling_resistance.value;
  const standingCases = cases.filter((c) => c.accel_g === 0);
  const accelCases = cases.filter((c) => c.accel_g > 0);
  const brakeCases = cases.filter((c) => c.accel_g < 0);

  const noCrew = { ...spec, crew: [] };
  const dead = staticPoleLoad(noCrew, data, massModel(noCrew, data));
  const standing = envelope(asLoads(standingCases));
  const placeholder = loadFactor(data, 'bump_dynamic_factor');
  const bump = bumpIn?.factor ?? { value: placeholder.value, source: `placeholder bump_dynamic_factor ${placeholder.value}: ${placeholder.source}` };
  // The pole carries what the yoke feels: with a ride model, the worst standing pole load plus the ride's
  // largest rise of the yoke force over standing (the wheel factor does not reach the pole); without one, the factor.
  const stand = standingPole(cases);
  const rideYoke = bumpIn?.yokeIncrease_N ?? null;
  const bumpPole = rideYoke !== null ? stand + Math.max(0, rideYoke) : stand * bump.value;
  const poleText = rideYoke !== null ? `|R_pole| = standing ${f(stand)} + the ride model's largest yoke force above standing ${f(Math.max(0, rideYoke))} = ${f(bumpPole)} N` : `|R_pole| = ${f(stand)} × ${bump.value.toFixed(2)} = ${f(bumpPole)} N`;
  const bumpIds = bumpFactorSources(data, bumpIn?.factor.from);
  const shock = loadFactor(data, 'stopping_shock_factor');
  const asPlaced = cases.find((c) => c.id === 'static')!;

  const out: MemberCase[] = [
    { id: 'dead', title: 'dead load alone (no crew)', duration: 'permanent', wheel_N: dead.axle_N / 2, wheelLateral_N: 0, pole_N: Math.abs(dead.pole_N), poleAxial_N: 0, gravityFactor: 1, sources: [], sourceIds: [], working: `the chariot without its crew: N_w = ${f(dead.axle_N)} / 2 = ${f(dead.axle_N / 2)} N; |R_pole| = ${f(Math.abs(dead.pole_N))} N` },
    { id: 'standing', title: 'standing with the crew (worst crew position)', duration: 'short', wheel_N: standing.wheel_N, wheelLateral_N: 0, pole_N: standing.pole_N, poleAxial_N: 0, gravityFactor: 1, sources: [], sourceIds: [], working: standing.working },
    { id: 'bump', title: `bump (standing × ${bump.value.toFixed(2)})`, duration: 'instantaneous', wheel_N: standing.wheel_N * bump.value, wheelLateral_N: 0, pole_N: bumpPole, poleAxial_N: 0, gravityFactor: bump.value, sources: [bump.source], sourceIds: bumpIds, working: `standing loads × bump factor ${bump.value.toFixed(2)} (${bump.source}): N_w = ${f(standing.wheel_N * bump.value)} N; ${poleText}` },
    {
      id: 'turn',
      title: `outer wheel in the design turn (${spec.operation.turn_radius_m} m at ${spec.operation.speed_kmh} km/h)`,
      duration: 'short',
      wheel_N: turn.outerWheel,
      wheelLateral_N: turn.outerLateral,
      pole_N: Math.abs(asPlaced.pole_load_N),
      poleAxial_N: 0,
      gravityFactor: 1,
      sources: [],
      sourceIds: ['design-basis-turning'],
      working: `a_lat = ${f(turn.lateralAccel, 3)} m/s²; N_o = N/2 + m·a_lat·h_g/t = ${f(turn.wheelsLoad / 2)} + ${f(turn.loadTransfer)} = ${f(turn.outerWheel)} N; lateral ground force F_lat = ${f(turn.outerLateral)} N${turn.steady ? '' : ' (no steady turn: the pole reach is longer than the turn radius)'}`,
    },
  ];

  if (accelCases.length > 0) {
    const env = envelope(asLoads(accelCases));
    const a = spec.operation.acceleration_g;
    const axleMax = Math.max(...accelCases.map((c) => c.axle_load_N));
    const pull = m * a * G + Crr * axleMax;
    out.push({ id: 'accelerating', title: `accelerating at ${a} g (worst crew position)`, duration: 'short', wheel_N: env.wheel_N, wheelLateral_N: 0, pole_N: env.pole_N, poleAxial_N: -pull, gravityFactor: 1, sources: [], sourceIds: data.grounds[spec.operation.ground].rolling_resistance.sources, working: `${env.working}; draught T = m·a·g + C_rr·N = ${f(m)} kg × ${a} × ${G} + ${Crr} × ${f(axleMax)} N = ${f(pull)} N` });
  }
  if (brakeCases.length > 0) {
    const b = spec.operation.braking_g;
    const push = m * b * G;
    const env = envelope(asLoads(brakeCases));
    out.push({ id: 'braking', title: `braking at ${b} g (worst crew position)`, duration: 'short', wheel_N: env.wheel_N, wheelLateral_N: 0, pole_N: env.pole_N, poleAxial_N: push, gravityFactor: 1, sources: [], sourceIds: [], working: `${env.working}; design braking force through the pole T = m·b·g = ${f(m)} kg × ${b} × ${G} = ${f(push)} N` });
    // The pole load is linear in the acceleration, so the shock case scales the
    // braking change from standing, position by position.
    const shocked = brakeCases.map((c) => {
      const still = standingCases.find((s) => s.crew_position === c.crew_position)!;
      const pole = still.pole_load_N + shock.value * (c.pole_load_N - still.pole_load_N);
      return { title: c.title.replace(/^braking at [^,]+/, `stopping shock at ${f(shock.value * b, 2)} g`), pole_N: pole, axle_N: still.axle_load_N + still.pole_load_N - pole };
    });
    const sEnv = envelope(shocked);
    out.push({ id: 'stopping-shock', title: `stopping shock (${shock.value} × the braking force)`, duration: 'instantaneous', wheel_N: sEnv.wheel_N, wheelLateral_N: 0, pole_N: sEnv.pole_N, poleAxial_N: shock.value * push, gravityFactor: 1, sources: [shock.source], sourceIds: shock.sources, working: `deceleration stopping_shock_factor ${shock.value} × ${b} g: R_pole = R_standing + ${shock.value} × (R_braking − R_standing); ${sEnv.working}; T = ${shock.value} × ${f(push)} = ${f(shock.value * push)} N` });
  }
  return out;
}
