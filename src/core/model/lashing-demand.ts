import { rollingResistance } from './rolling-resistance.ts';
import type { Limit, RulesData } from '../data/rules-data.ts';
import type { LoadCaseResult } from './load-case-result.ts';
import type { PartMass } from './part-mass.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { G, mm } from '../units/units.ts';
import { cornerDemand, jointedCorners } from './corner-demand.ts';
import type { FloorResult } from './floor-result.ts';
import { jointForceWith, type JointForce } from './joint-force.ts';
import { combinationFactors } from './combination-factors.ts';
import { loadFactor } from './load-factors.ts';
import type { MassModel } from './mass-model.ts';
import type { TurnModel } from './turn.ts';

// The force each lashed joint must pass, case by case (mechanics note,
// sections 3 to 7). Where two joints share a load path and the split between
// them is unknown (it depends on how tight each lashing is), each is checked
// for the whole: the box's inertia reaches the running gear through the
// pole-to-floor or the axle-to-floor lashing, and the team's pull reaches the
// whole chariot through the pole-to-axle crossing. That is the safe side.

export type Joint = CheckedSpecification['lashings'][number]['joint'];

export const JOINTS: readonly Joint[] = ['pole-to-axle', 'pole-to-yoke', 'pole-to-floor', 'axle-to-floor', 'frame-corners', 'siding-to-frame'];

export interface JointDemand {
  joint: Joint;
  /** Which joint or joints a lashing entry stands for. */
  where: string;
  cases: JointForce[];
  /** Why no demand could be found; null when it was. */
  unknown: string | null;
}

export interface DemandInput {
  spec: CheckedSpecification;
  data: RulesData;
  mass: MassModel;
  cases: readonly LoadCaseResult[];
  turn: TurnModel;
  /** The strap floor under the bump factor; undefined where no floor model ran. */
  floorBump: FloorResult | undefined;
  /** The routine rough ground's factor and its source (the ride model's crew floor factor, or the data's bound). */
  bump: { value: number; source: string };
  /** The stone strike's factor (an accidental case), the same way. */
  stone: { value: number; source: string };
}

// Parts of the rolling assembly that are not carried by the box: the running
// gear under it (names as the mass model gives them).
const RUNNING_GEAR = new Set(['axle', 'wheel, left', 'wheel, right', 'pole', 'lashing, pole-to-axle', 'lashing, pole-to-floor', 'lashing, axle-to-floor']);

type Motion = 'static' | 'accelerating' | 'braking';
const motionOf = (c: LoadCaseResult): Motion => (c.id.endsWith('accelerating') ? 'accelerating' : c.id.endsWith('braking') ? 'braking' : 'static');

const f1 = (v: number) => v.toFixed(1);
const f3 = (v: number) => v.toFixed(3);

interface Factors {
  bump: { value: number; source: string };
  stone: { value: number; source: string };
  shock: Limit;
  /** A joint force with the data's γ_Q on the leading variable action. */
  force: ReturnType<typeof jointForceWith>;
}

export function lashingDemands(i: DemandInput): Record<Joint, JointDemand> {
  const k: Factors = { bump: i.bump, stone: i.stone, shock: loadFactor(i.data, 'stopping_shock_factor'), force: jointForceWith(combinationFactors(i.data).gammaQ) };
  const boxParts = i.mass.parts.filter((p) => p.group === 'rolling' && !RUNNING_GEAR.has(p.part));
  const corners = cornerDemand(i.spec, i.floorBump, k.force);
  const siding = i.spec.box.siding_mass_kg;
  return {
    'pole-to-axle': { joint: 'pole-to-axle', where: 'where the pole crosses the axle', cases: poleCases('pole-to-axle', i, k), unknown: null },
    'pole-to-yoke': { joint: 'pole-to-yoke', where: 'where the pole meets the yoke', cases: poleCases('pole-to-yoke', i, k), unknown: null },
    'pole-to-floor': { joint: 'pole-to-floor', where: 'the pole to the floor frame, all its lashings there together', cases: carriedCases(massOf(boxParts, 'the box and all it carries'), i, k), unknown: null },
    'axle-to-floor': { joint: 'axle-to-floor', where: "the box's two bearings on the axle, together", cases: carriedCases(massOf(boxParts, 'the box and all it carries'), i, k), unknown: null },
    'frame-corners': { joint: 'frame-corners', where: jointedCorners(i.spec), ...corners },
    'siding-to-frame': { joint: 'siding-to-frame', where: 'the siding to the floor frame, all its lashings together', cases: siding > 0 ? carriedCases({ kg: siding, basis: `the siding, ${siding} kg` }, i, k) : [], unknown: null },
  };
}

interface Carried {
  kg: number;
  basis: string;
}

function massOf(parts: readonly PartMass[], what: string): Carried {
  const kg = parts.reduce((s, p) => s + p.mass_kg, 0);
  return { kg, basis: `${what}: ${parts.map((p) => `${p.part} ${p.mass_kg.toFixed(1)}`).join(' + ')} = ${kg.toFixed(1)} kg` };
}

/** A longitudinal case's pole, yoke and axle loads, N. */
interface Vertical {
  title: string;
  pole: number;
  yoke: number;
  axle: number;
}

const asVertical = (c: LoadCaseResult): Vertical => ({ title: c.title, pole: c.pole_load_N, yoke: c.yoke_load_N, axle: c.axle_load_N });

/**
 * The pole's two crossings: the team's pull and hold-back for the whole
 * rolling assembly along the pole, the pole's vertical load, and in the turn
 * the side pull that holds the chariot's heading.
 */
function poleCases(joint: 'pole-to-axle' | 'pole-to-yoke', i: DemandInput, k: Factors): JointForce[] {
  const { spec, turn } = i;
  // At the yoke the joint carries the yoke's own weight too when the yoke hangs on the pole.
  const yoke = joint === 'pole-to-yoke';
  const vertical = (c: Vertical) => (yoke ? Math.max(Math.abs(c.pole), Math.abs(c.yoke)) : Math.abs(c.pole));
  const vText = (c: Vertical) => (yoke ? `max(|R_pole|, |R_yoke|) = max(${f1(Math.abs(c.pole))}, ${f1(Math.abs(c.yoke))})` : '|R_pole|') + ` = ${f1(vertical(c))} N in "${c.title}" (its sense at the joint not known: all of it taken as pulling apart)`;
  const worst = (list: Vertical[]) => list.reduce((w, c) => (vertical(c) > vertical(w) ? c : w));
  const of = (m: Motion) => i.cases.filter((c) => motionOf(c) === m);
  const m = i.mass.rolling.mass_kg;
  // The pull at constant speed: the soil's and the hub's resistance together (design basis, section 3).
  const Crr = rollingResistance(spec, i.data).total;
  const A = spec.operation.acceleration_g * G;
  const B = spec.operation.braking_g * G;
  const out: JointForce[] = [];

  const accel = of('accelerating');
  const acc = worst(accel.map(asVertical));
  const axleMax = Math.max(...accel.map((c) => c.axle_load_N));
  const pull = m * A + Crr * axleMax;
  out.push(k.force('draught', `draught, accelerating at ${spec.operation.acceleration_g} g`, { along: pull, normal: vertical(acc) }, [
    `along = m·a + (C_s + C_b)·N_axle = ${f1(m)} kg × ${f3(A)} m/s² + ${f3(Crr)} × ${f1(axleMax)} N = ${f1(pull)} N (the largest axle load of the accelerating cases)`,
    `normal = ${vText(acc)}`,
  ]));

  // The pole load is linear in the deceleration: the shock scales the change
  // from standing, crew position by crew position.
  const standing = of('static');
  const shocked = of('braking').map((c): Vertical => {
    const still = standing.find((s) => s.crew_position === c.crew_position)!;
    const scale = (at: number, rest: number) => rest + k.shock.value * (at - rest);
    return { title: c.title.replace(/^braking at [^,]+/, `stopping shock at ${(k.shock.value * spec.operation.braking_g).toFixed(2)} g`), pole: scale(c.pole_load_N, still.pole_load_N), yoke: scale(c.yoke_load_N, still.yoke_load_N), axle: scale(c.axle_load_N, still.axle_load_N) };
  });
  const braking = worst(of('braking').map(asVertical));
  out.push(k.force('braking', `braking at ${spec.operation.braking_g} g`, { along: m * B, normal: vertical(braking) }, [
    `along = m·b = ${f1(m)} kg × ${f3(B)} m/s² = ${f1(m * B)} N (rolling resistance, which helps, not counted)`,
    `normal = ${vText(braking)}`,
  ]));
  const brk = worst(shocked);
  const hold = m * B * k.shock.value;
  out.push(k.force('stopping-shock', `stopping shock, ${k.shock.value} × the braking`, { along: hold, normal: vertical(brk) }, [
    `along = m·b·k_stop = ${f1(m)} kg × ${f3(B)} m/s² × ${k.shock.value} = ${f1(hold)} N (rolling resistance, which helps, not counted)`,
    `with R = R_standing + k_stop × (R_braking − R_standing), normal = ${vText(brk)}`,
  ]));

  const stat = worst(standing.map(asVertical));
  for (const [id, phi, name] of [['rough-ground', k.bump, 'rough ground'], ['stone', k.stone, 'stone strike']] as const) {
    out.push(k.force(id, `${name}, standing load × ${phi.value.toFixed(2)}`, { normal: phi.value * vertical(stat) }, [
      `normal = φ × ${vText(stat)}: ${phi.value.toFixed(3)} × ${f1(vertical(stat))} = ${f1(phi.value * vertical(stat))} N`,
    ]));
  }

  if (turn.steady && turn.lateralAccel > 0) {
    const placed = asVertical(i.cases.find((c) => c.id === 'static')!);
    const arm = mm(Math.abs(i.mass.rolling.x_mm - spec.axle.x_mm));
    const side = (m * turn.lateralAccel * arm) / turn.reach;
    const rrTurn = Crr * placed.axle;
    out.push(k.force('turn', `design turn at ${spec.operation.speed_kmh} km/h`, { along: rrTurn, across: side, normal: vertical(placed) }, [
      `along = (C_s + C_b)·N_axle = ${f3(Crr)} × ${f1(placed.axle)} N = ${f1(rrTurn)} N`,
      `across = m·a_lat·|x_g − x_a| / L = ${f1(m)} kg × ${f3(turn.lateralAccel)} m/s² × ${f3(arm)} m / ${f3(turn.reach)} m = ${f1(side)} N (the side pull that holds the heading)`,
      `normal = ${vText(placed)}`,
    ]));
  }
  return out;
}

/**
 * A mass seated on a joint: its share of draught and braking, its side force
 * in the turn, and its weight, which presses the seat in bearing. Over a bump
 * the load above the standing one, (k − 1)·m·g, is taken as pulling the seat
 * apart on the rebound; the weight that holds it down is not counted off (the
 * safe side until the ride model gives the rebound).
 */
function carriedCases(c: Carried, i: DemandInput, k: Factors): JointForce[] {
  const { spec, turn } = i;
  const W = c.kg * G;
  const A = spec.operation.acceleration_g * G;
  const B = spec.operation.braking_g * G;
  const seated = [`normal = m·g = ${f1(c.kg)} kg × ${G} = ${f1(W)} N, pressing the seat (apart 0)`];
  const bumped = (id: 'rough-ground' | 'stone', phi: { value: number }, name: string) =>
    k.force(id, `${name}, weight × ${phi.value.toFixed(2)}`, { normal: phi.value * W, apart: Math.max(0, phi.value - 1) * W }, [
      c.basis,
      `normal = φ·m·g = ${phi.value.toFixed(3)} × ${f1(c.kg)} kg × ${G} = ${f1(phi.value * W)} N, pressing the seat`,
      `apart = (φ − 1)·m·g = ${f1(Math.max(0, phi.value - 1))} × ${f1(W)} = ${f1(Math.max(0, phi.value - 1) * W)} N (the rebound, the weight not counted off)`,
    ]);
  const out: JointForce[] = [
    k.force('draught', `draught, accelerating at ${spec.operation.acceleration_g} g`, { along: c.kg * A, normal: W, apart: 0 }, [c.basis, `along = m·a = ${f1(c.kg)} kg × ${f3(A)} m/s² = ${f1(c.kg * A)} N`, ...seated]),
    k.force('braking', `braking at ${spec.operation.braking_g} g`, { along: c.kg * B, normal: W, apart: 0 }, [c.basis, `along = m·b = ${f1(c.kg)} kg × ${f3(B)} m/s² = ${f1(c.kg * B)} N`, ...seated]),
    k.force('stopping-shock', `stopping shock, ${k.shock.value} × the braking`, { along: c.kg * B * k.shock.value, normal: W, apart: 0 }, [c.basis, `along = m·b·k_stop = ${f1(c.kg)} kg × ${f3(B)} m/s² × ${k.shock.value} = ${f1(c.kg * B * k.shock.value)} N`, ...seated]),
    bumped('rough-ground', k.bump, 'rough ground'),
    bumped('stone', k.stone, 'stone strike'),
  ];
  if (turn.steady && turn.lateralAccel > 0) {
    out.push(k.force('turn', `design turn at ${spec.operation.speed_kmh} km/h`, { across: c.kg * turn.lateralAccel, normal: W, apart: 0 }, [c.basis, `across = m·a_lat = ${f1(c.kg)} kg × ${f3(turn.lateralAccel)} m/s² = ${f1(c.kg * turn.lateralAccel)} N`, ...seated]));
  }
  return out;
}

