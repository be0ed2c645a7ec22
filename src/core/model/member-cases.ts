import type { RulesData } from '../data/rules-data.ts';
import type { Combination } from '../findings/finding.ts';
import { num } from '../findings/working.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { G } from '../units/units.ts';
import { combinationFactors, type CombinationFactors } from './combination-factors.ts';
import type { LoadCaseResult } from './load-case-result.ts';
import { staticPoleLoad } from './load-cases.ts';
import { loadFactor } from './load-factors.ts';
import { massModel, type MassModel } from './mass-model.ts';
import { rollingResistance } from './rolling-resistance.ts';
import type { Duration } from './timber/load-duration.ts';
import { strengthFactor } from './timber/strength-factors.ts';
import type { TurnModel } from './turn.ts';
import type { DynamicFactor, GroundFactors } from '../ride/dynamic-factors.ts';

// The load cases the timber members are checked in, each a load combination
// of EN 1990 (design basis, section 2): the fundamental combination
// 1.35 G + 1.5 Q_lead + 1.5 psi_0 Q_other for strength, the accidental one
// (every action x 1.0, gamma_M 1.0) for the stone strike and the stopping
// shock. G is the vehicle's own weight (the chariot without its crew), Q the
// crew's weight; the leading action of a case is its own (rough ground, the
// turn, the motion). Each case is the envelope over the crew positions of the
// balance load cases: the largest wheel load and the largest pole load,
// which may come from different positions (the safe side).

export type MemberCaseId = 'dead' | 'static' | 'rough-ground' | 'turn' | 'accelerating' | 'braking' | 'stone' | 'stopping-shock';

export interface MemberCase {
  id: MemberCaseId;
  title: string;
  combination: Combination;
  duration: Duration;
  /** The material partial factor of the combination (timber). */
  gammaM: number;
  /** Design vertical ground load on the more loaded wheel, N. */
  wheel_N: number;
  /** Design lateral ground force on that wheel, N. */
  wheelLateral_N: number;
  /** Design vertical force between the pole and the yoke, magnitude, N. */
  pole_N: number;
  /** Design force along the pole at the yoke: positive pushes (braking), negative pulls (draught), N. */
  poleAxial_N: number;
  /** Factor on the parts' own weight (the dynamic factor in the rough-ground and stone cases, else 1). */
  gravityFactor: number;
  working: string;
  /** Sources of the factors this case applies, as text. */
  sources: string[];
  /** The same as catalogue ids (rules/sources.yaml). */
  sourceIds: string[];
}

interface Pair {
  /** The own weight's part (the chariot without its crew). */
  G: number;
  /** The crew's part (total less own weight). */
  Q: number;
}

/** The largest wheel load (per wheel) and pole load over a set of balance cases, split into own weight and crew. */
function envelope(list: readonly LoadCaseResult[], dead: { wheel: number; pole: number }): { wheel: Pair; pole: Pair; titles: string } {
  const byWheel = list.reduce((w, c) => (c.axle_load_N > w.axle_load_N ? c : w));
  const byPole = list.reduce((w, c) => (Math.abs(c.pole_load_N) > Math.abs(w.pole_load_N) ? c : w));
  return {
    wheel: { G: dead.wheel, Q: byWheel.axle_load_N / 2 - dead.wheel },
    pole: { G: dead.pole, Q: Math.abs(byPole.pole_load_N) - dead.pole },
    titles: `wheel: ${byWheel.title}; pole: ${byPole.title}`,
  };
}

/** The dynamic factors of a case and where they came from. */
export interface DynamicInput {
  /** The wheels' factor: the ride model's, or the data's bound (provisional). */
  factor: DynamicFactor;
  /** The ride model's largest yoke force above the standing one, N; null without a ride. */
  yokeIncrease_N: number | null;
}

/** A ground's factors as the member cases take them. */
export const wheelInput = (g: GroundFactors): DynamicInput => ({ factor: g.wheel, yokeIncrease_N: g.yokeIncrease_N });

const fund = (f: CombinationFactors, g: number, q: number) => f.gammaGsup * g + f.gammaQ * q;

export function memberCases(spec: CheckedSpecification, data: RulesData, mass: MassModel, cases: readonly LoadCaseResult[], turn: TurnModel, rough: DynamicInput, strike: DynamicInput): MemberCase[] {
  const f = combinationFactors(data);
  const gammaM = strengthFactor(data, 'gamma_M').value;
  const comboIds = f.sources;
  const m = mass.rolling.mass_kg;
  const rr = rollingResistance(spec, data);
  const noCrew = { ...spec, crew: [], loads: [] };
  const deadLoad = staticPoleLoad(noCrew, data, massModel(noCrew, data));
  const dead = { wheel: deadLoad.axle_N / 2, pole: Math.abs(deadLoad.pole_N) };
  const standingCases = cases.filter((c) => c.accel_g === 0);
  const stand = envelope(standingCases, dead);
  const G_ = num(f.gammaGsup);
  const Q_ = num(f.gammaQ);
  const fundText = (what: string, p: Pair, extra = 0, extraName = '') => `${what}: ${G_} × ${num(p.G)} + ${Q_} × ${num(p.Q)}${extra ? ` + ${Q_} × ${num(extra)} (${extraName})` : ''} = ${num(fund(f, p.G, p.Q) + f.gammaQ * extra)} N`;

  // A dynamic case: the wheel carries phi x the static load; the increment (phi - 1) x (G + Q) is its leading action.
  const dynamicCase = (id: 'rough-ground' | 'stone', d: DynamicInput): MemberCase => {
    const phi = d.factor.value;
    const acc = id === 'stone';
    const incWheel = (phi - 1) * (stand.wheel.G + stand.wheel.Q);
    const incPole = d.yokeIncrease_N !== null ? Math.max(0, d.yokeIncrease_N) : (phi - 1) * (stand.pole.G + stand.pole.Q);
    const wheel = acc ? stand.wheel.G + stand.wheel.Q + incWheel : fund(f, stand.wheel.G, f.psi0Crew * stand.wheel.Q) + f.gammaQ * incWheel;
    const pole = acc ? stand.pole.G + stand.pole.Q + incPole : fund(f, stand.pole.G, f.psi0Crew * stand.pole.Q) + f.gammaQ * incPole;
    const poleWhat = d.yokeIncrease_N !== null ? "the ride model's largest yoke force above standing" : `(φ − 1) × the standing pole load`;
    const working = acc
      ? `accidental (every action × 1.0, γ_M = ${f.gammaMaccidental}): N_w = φ × (G + Q) = ${num(phi)} × ${num(stand.wheel.G + stand.wheel.Q)} = ${num(wheel)} N; |R_pole| = ${num(stand.pole.G + stand.pole.Q)} + ${num(incPole)} (${poleWhat}) = ${num(pole)} N; φ from ${d.factor.source}`
      : `fundamental, the rough ground leading (γ_G ${G_}, γ_Q ${Q_}, ψ_0 of the crew ${num(f.psi0Crew)}): ${fundText('N_w', { G: stand.wheel.G, Q: f.psi0Crew * stand.wheel.Q }, incWheel, `(φ − 1)(G + Q), φ = ${num(phi)}`)}; ${fundText('|R_pole|', { G: stand.pole.G, Q: f.psi0Crew * stand.pole.Q }, incPole, poleWhat)}; φ from ${d.factor.source}`;
    return {
      id,
      title: acc ? `stone struck at the design speed (φ = ${num(phi)})` : `routine rough ground (φ = ${num(phi)})`,
      combination: acc ? 'accidental' : 'fundamental',
      duration: acc ? 'instantaneous' : 'short',
      gammaM: acc ? f.gammaMaccidental : gammaM,
      wheel_N: wheel,
      wheelLateral_N: 0,
      pole_N: pole,
      poleAxial_N: 0,
      gravityFactor: phi,
      sources: [d.factor.source],
      sourceIds: [...d.factor.sources, ...(acc ? ['en-1990-6-11', 'en-1995-1-1-2-4-1'] : comboIds)],
      working: `${working}; own weight G from the chariot without its crew, crew Q the rest (${stand.titles})`,
    };
  };

  const out: MemberCase[] = [
    {
      id: 'dead',
      title: 'own weight alone (no crew)',
      combination: 'fundamental',
      duration: 'permanent',
      gammaM,
      wheel_N: f.gammaGsup * dead.wheel,
      wheelLateral_N: 0,
      pole_N: f.gammaGsup * dead.pole,
      poleAxial_N: 0,
      gravityFactor: 1,
      sources: [],
      sourceIds: comboIds,
      working: `fundamental, own weight only: N_w = ${G_} × ${num(dead.wheel)} = ${num(f.gammaGsup * dead.wheel)} N; |R_pole| = ${G_} × ${num(dead.pole)} = ${num(f.gammaGsup * dead.pole)} N`,
    },
    {
      id: 'static',
      title: 'standing with the crew (worst crew position)',
      combination: 'fundamental',
      duration: 'short',
      gammaM,
      wheel_N: fund(f, stand.wheel.G, stand.wheel.Q),
      wheelLateral_N: 0,
      pole_N: fund(f, stand.pole.G, stand.pole.Q),
      poleAxial_N: 0,
      gravityFactor: 1,
      sources: [],
      sourceIds: comboIds,
      working: `fundamental, the crew leading: ${fundText('N_w', stand.wheel)}; ${fundText('|R_pole|', stand.pole)} (${stand.titles})`,
    },
    dynamicCase('rough-ground', rough),
  ];

  // The turn: the outer wheel's share of the crew-as-placed load plus the transfer, the transfer and the lateral force leading.
  const placed = cases.find((c) => c.id === 'static')!;
  const half = { G: dead.wheel, Q: placed.axle_load_N / 2 - dead.wheel };
  const outer = fund(f, half.G, f.psi0Crew * half.Q) + f.gammaQ * turn.loadTransfer;
  out.push({
    id: 'turn',
    title: `outer wheel in the design turn (${spec.operation.turn_radius_m} m at ${spec.operation.speed_kmh} km/h)`,
    combination: 'fundamental',
    duration: 'short',
    gammaM,
    wheel_N: outer,
    wheelLateral_N: f.gammaQ * turn.outerLateral,
    pole_N: fund(f, dead.pole, Math.abs(placed.pole_load_N) - dead.pole),
    poleAxial_N: 0,
    gravityFactor: 1,
    sources: [],
    sourceIds: ['design-basis-turning', ...comboIds],
    working: `fundamental, the turn leading: a_lat = ${num(turn.lateralAccel)} m/s²; ${fundText('N_outer', { G: half.G, Q: f.psi0Crew * half.Q }, turn.loadTransfer, 'the load transfer m·a_lat·h_g/t')}; F_lat = ${Q_} × ${num(turn.outerLateral)} = ${num(f.gammaQ * turn.outerLateral)} N${turn.steady ? '' : ' (no steady turn: the pole reach is longer than the turn radius)'}`,
  });

  // The motion cases: their change from standing leads; the pull or push along the pole is the motion's own.
  const motion = (id: 'accelerating' | 'braking', list: readonly LoadCaseResult[], axial: number, axialText: string) => {
    const env = envelope(list, dead);
    const dWheel = Math.max(0, env.wheel.G + env.wheel.Q - (stand.wheel.G + stand.wheel.Q));
    const dPole = Math.max(0, env.pole.G + env.pole.Q - (stand.pole.G + stand.pole.Q));
    out.push({
      id,
      title: `${id} at ${id === 'accelerating' ? spec.operation.acceleration_g : spec.operation.braking_g} g (worst crew position)`,
      combination: 'fundamental',
      duration: 'short',
      gammaM,
      wheel_N: fund(f, stand.wheel.G, f.psi0Crew * stand.wheel.Q) + f.gammaQ * dWheel,
      wheelLateral_N: 0,
      pole_N: fund(f, stand.pole.G, f.psi0Crew * stand.pole.Q) + f.gammaQ * dPole,
      poleAxial_N: f.gammaQ * axial,
      gravityFactor: 1,
      sources: [],
      sourceIds: [...rr.sources, ...comboIds],
      working: `fundamental, the ${id === 'accelerating' ? 'acceleration' : 'braking'} leading: ${fundText('N_w', { G: stand.wheel.G, Q: f.psi0Crew * stand.wheel.Q }, dWheel, 'the change from standing')}; ${fundText('|R_pole|', { G: stand.pole.G, Q: f.psi0Crew * stand.pole.Q }, dPole, 'the change from standing')}; ${axialText}, × ${Q_} = ${num(f.gammaQ * axial)} N (${env.titles})`,
    });
  };
  const accelCases = cases.filter((c) => c.accel_g > 0);
  const brakeCases = cases.filter((c) => c.accel_g < 0);
  if (accelCases.length > 0) {
    const a = spec.operation.acceleration_g;
    const axleMax = Math.max(...accelCases.map((c) => c.axle_load_N));
    const pull = m * a * G + rr.total * axleMax;
    motion('accelerating', accelCases, -pull, `draught T = m·a·g + (C_s + C_b)·N = ${num(m)} × ${a} × ${num(G)} + ${num(rr.total)} × ${num(axleMax)} = ${num(pull)} N`);
  }
  if (brakeCases.length > 0) {
    const b = spec.operation.braking_g;
    const push = m * b * G;
    motion('braking', brakeCases, push, `braking force through the pole T = m·b·g = ${num(m)} × ${b} × ${num(G)} = ${num(push)} N`);
  }
  out.push(dynamicCase('stone', strike));
  if (brakeCases.length > 0) {
    // The stopping shock: an accidental deceleration; the pole load is linear in the acceleration, so the braking change from standing scales.
    const shock = loadFactor(data, 'stopping_shock_factor');
    const b = spec.operation.braking_g;
    const shocked = brakeCases.map((c) => {
      const still = standingCases.find((s) => s.crew_position === c.crew_position)!;
      const pole = still.pole_load_N + shock.value * (c.pole_load_N - still.pole_load_N);
      return { ...c, pole_load_N: pole, axle_load_N: still.axle_load_N + still.pole_load_N - pole };
    });
    const env = envelope(shocked, dead);
    const push = shock.value * m * b * G;
    out.push({
      id: 'stopping-shock',
      title: `stopping shock (${num(shock.value)} × the braking force)`,
      combination: 'accidental',
      duration: 'instantaneous',
      gammaM: f.gammaMaccidental,
      wheel_N: env.wheel.G + env.wheel.Q,
      wheelLateral_N: 0,
      pole_N: env.pole.G + env.pole.Q,
      poleAxial_N: push,
      gravityFactor: 1,
      sources: [shock.source],
      sourceIds: [...shock.sources, 'en-1990-6-11', 'en-1995-1-1-2-4-1'],
      working: `accidental (every action × 1.0, γ_M = ${f.gammaMaccidental}): deceleration ${num(shock.value)} × ${b} g; R_pole = R_standing + ${num(shock.value)} × (R_braking − R_standing): N_w = ${num(env.wheel.G + env.wheel.Q)} N, |R_pole| = ${num(env.pole.G + env.pole.Q)} N; T = ${num(push)} N`,
    });
  }
  return out;
}
