import type { WheelStiffness } from '../model/wheel/wheel-stiffness.ts';
import { rollingResistance } from '../model/rolling-resistance.ts';
import type { RulesData } from '../data/rules-data.ts';
import type { FloorResult } from '../model/floor-result.ts';
import type { MassModel } from '../model/mass-model.ts';
import { poleCantilever } from '../model/members/pole-cantilever.ts';
import { axleArm } from '../model/members/axle-arm.ts';
import { tyreOf, wheelBuild } from '../model/tyre.ts';
import { characteristicValue } from '../model/timber/characteristic.ts';
import type { LoadCaseResult } from '../model/load-case-result.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { G, mm, UNITS } from '../units/units.ts';
import { rigidBody } from './body-inertia.ts';
import { groundContact, inSeries, rideParam, roughGround, stone, type ProfileValue } from './ride-data.ts';
import { groundOf, underBothWheels, type RideCase } from './ride-types.ts';
import { wheelEnvelope, type Bump, type Envelope } from './road-envelope.ts';
import type { Enough } from './decay.ts';
import type { RideSystem, RoadInput } from './ride-system.ts';

// The ride model's parameters from the specification, the mass model, the
// static floor and the rules data (mechanics note, section 8).

export interface RideInput {
  spec: CheckedSpecification;
  data: RulesData;
  mass: MassModel;
  staticCase: LoadCaseResult;
  floorStatic: FloorResult;
  /** The wheel's own radial stiffness from its ring frame. */
  wheelStiffness: WheelStiffness;
}

export interface RideOptions {
  /** Floor damping ratio in place of the rules' or the measured floor's. */
  floorDampingRatio?: number;
  /** The road case's ridge or stone height and length, m, in place of the specification's or the ground's. */
  bumpHeight?: number;
  bumpLength?: number;
  duration?: number;
  /** Every damper off (for the energy check). */
  undamped?: boolean;
  /** The integrator's relative tolerance in place of RIDE_TOLERANCE (the benchmark's search). */
  tolerance?: number;
  /** Ends the run early (the tuner's short runs). */
  enough?: Enough;
  /** False: the time series is not kept (nobody will draw it: a decisive trial); the peaks read the same points. */
  series?: boolean;
  /** Keep only the samples a plot of about this many points draws (RunSettings.plotPoints). */
  plotPoints?: number;
}

export interface BuiltRide {
  system: RideSystem;
  /** When the road input has passed (road cases), s; the drop's is found from the first wheel contact. */
  inputEnd: number;
  /** Times at which the road input has a kink (the wheel strikes and leaves the bump), s. */
  breaks: number[];
  /** Release height above the standing position (drop), m; 0 otherwise. */
  drop: number;
  speed: number;
  /** The floor damping ratio used and where it came from. */
  floorDamping: { value: number; source: string };
  /** Shortest undamped period of the elements, s, for the step. */
  shortestPeriod: number;
  /** Shortest time constant of a ground point, c_g/(k_w + k_g), s (Infinity without one). */
  shortestTimeConstant: number;
  /** Each parameter with its working and source. */
  working: string[];
  sources: string[];
  /** Why the system cannot be run (a stiffness the floor model did not give), if so. */
  unknown?: string;
}

const f = (v: number, d = 1) => (Number.isFinite(v) ? v.toFixed(d) : 'not known');

/** St Venant torsion constant of a b × h rectangle (Roark's formula), mm^4. */
export function torsionConstant(b: number, h: number): number {
  const [a, c] = b >= h ? [b, h] : [h, b];
  return a * c ** 3 * (1 / 3 - 0.21 * (c / a) * (1 - c ** 4 / (12 * a ** 4)));
}

/** A measured floor's damping ratio, when the specification names one. */
export function measuredFloorDamping(spec: CheckedSpecification): { value: number; source: string } | null {
  const m = (spec.floor_straps as { measured?: { damping_ratio?: number; source?: string } }).measured;
  return m?.damping_ratio !== undefined ? { value: m.damping_ratio, source: `measured floor${m.source ? `: ${m.source}` : ''} (floor_straps.measured)` } : null;
}

export function floorDampingOf(i: RideInput): { value: number; source: string } {
  const measured = measuredFloorDamping(i.spec);
  if (measured) return measured;
  const l = rideParam(i.data, 'ride.supports', 'floor_damping_ratio');
  return { value: l.value, source: `ride.supports.floor_damping_ratio, rules/parameters/ride.yaml: ${l.source}` };
}

/**
 * The wheel's path over each bump, kept by the values it depends on (the
 * bump's height and length, the wheel's radius): a check's cases over the
 * same ground, the tuner's runs, and the re-runs of a decisive-input search,
 * a sweep or a workbench edit that leave those alone all share one. Tabulating
 * it costs about a millisecond; the table is a pure function of the three
 * values, so sharing it changes nothing. The oldest go first past the limit.
 */
const envelopes = new Map<string, Envelope>();
const ENVELOPES_KEPT = 32;

/** Lets the kept envelopes go (pipeline/kept-values.ts). */
export function forgetKeptEnvelopes(): void {
  envelopes.clear();
}

function envelopeOf(bump: Bump, r: number): Envelope {
  const key = `${bump.height} ${bump.length} ${r}`;
  let env = envelopes.get(key);
  if (!env) {
    envelopes.set(key, (env = wheelEnvelope(bump, r)));
    if (envelopes.size > ENVELOPES_KEPT) envelopes.delete(envelopes.keys().next().value!);
  }
  return env;
}

export function buildRide(i: RideInput, which: RideCase, o: RideOptions = {}): BuiltRide {
  const { spec, data, mass } = i;
  const lay = mass.layout;
  const body = rigidBody(mass.parts, spec, lay);
  const working = [body.working];
  const sources: string[] = [];
  const lim = (g: string, n: string) => {
    const l = rideParam(data, g, n);
    sources.push(`${g}.${n}: ${l.source}`);
    return l.value;
  };
  const damp = o.undamped ? 0 : 1;

  // Wheels: the wheel's own radial stiffness and the axle arm's bending in series with the ground
  // (none in the drop test: rigid ground). The arm is a cantilever from the box's bearing to the
  // wheel's mid-plane, 3EI/a³ (Roark, Table 8.1 case 1a), the full section over the whole arm (the
  // stiff side: the spindle in the nave is thinner), the mean modulus at the build's moisture.
  const build = wheelBuild(spec);
  // The data's figure stands for the joints, tenons, nave seat and tyre; the ring frame adds the felloe's and spokes' own give.
  const kJoints = lim('ride.wheel-contact', `stiffness_${build}`);
  const rolling = which === 'rough-ridge' || which === 'rough-one-wheel';
  const kRing = rolling ? i.wheelStiffness.rolling : i.wheelStiffness.strike;
  const kRim = 1 / (1 / kJoints + 1 / kRing);
  working.push(`${i.wheelStiffness.working}; ${rolling ? 'rough ground is rolled over: the averaged figure' : 'a stone or the drop may meet the rim anywhere: the stiffest'}, in series with the joints, tenons and tyre ${f(kJoints / 1e3, 0)} kN/m (ride.wheel-contact.stiffness_${build}): ${f(kRim / 1e3, 0)} kN/m`);
  const armGeo = axleArm(spec);
  const Eaxle = characteristicValue(data, spec.axle.species, 'stiffness', spec.moisture_content_pct, 0);
  sources.push(...Eaxle.sources);
  const kArm = (3 * Eaxle.mean * 1e6 * armGeo.bearing.I * 1e-12) / mm(armGeo.a) ** 3;
  const wheel = { k: 1 / (1 / kRim + 1 / kArm), zeta: lim('ride.wheel-contact', 'damping_ratio') };
  working.push(
    `axle arm bending 3EI/a³ = 3 × ${f(Eaxle.mean, 0)} MPa × ${f(armGeo.bearing.I / 1e6, 3)}e6 mm⁴ / (${f(armGeo.a, 0)} mm)³ = ${f(kArm / 1e3, 0)} kN/m, in series with the wheel ${f(kRim / 1e3, 0)} kN/m: ${f(wheel.k / 1e3, 0)} kN/m`,
  );
  const ground = which === 'drop' ? null : groundContact(data, spec.operation.ground);
  if (ground) sources.push(`ride.ground-contact.${spec.operation.ground}: ${ground.k.source}`, `ride.ground-damping.${spec.operation.ground}: ${ground.zeta.source}`);
  const contact = inSeries(wheel, ground ? { k: ground.k.value, zeta: ground.zeta.value } : null);
  const wheelMass = i.staticCase.axle_load_N / 2 / G;
  const cw = damp * 2 * wheel.zeta * Math.sqrt(wheel.k * wheelMass);
  const cg = ground ? damp * 2 * ground.zeta.value * Math.sqrt(ground.k.value * wheelMass) : 0;
  const iron = tyreOf(spec)?.kind === 'iron' ? ', an iron tyre taken as the bare wheel: no iron-tyred stiffness is held' : '';
  working.push(`wheel (${build}${iron}) k = ${f(wheel.k / 1e3, 0)} kN/m, ζ = ${wheel.zeta}, c = 2ζ√(k·N_w/g) = ${f(cw, 0)} N·s/m${ground ? `, in series with ${spec.operation.ground} k = ${f(ground.k.value / 1e3, 0)} kN/m, ζ = ${ground.zeta.value}, c = ${f(cg, 0)} N·s/m: together ${f(contact.k / 1e3, 0)} kN/m` : which === 'drop' ? ' on rigid ground' : ` (${spec.operation.ground} not in ride.ground-contact: taken as rigid)`}`);
  // The damped spring's standing compression for the contact law: the wheel's own with a ground point, else the whole contact's.
  const wheelAt = (side: 'left' | 'right', y: number) => ({
    side, y, k: contact.k, c: cw, kWheel: wheel.k, kGround: ground ? ground.k.value : Infinity, cGround: cg, xs: (wheelMass * G) / (cg > 0 ? wheel.k : contact.k),
  });

  // Yoke: pole bending 3EI/L³ in series with the pad and horse; roll from pole torsion GJ/L.
  const pole = poleCantilever(spec, lay);
  const E = characteristicValue(data, spec.pole.species, 'stiffness', spec.moisture_content_pct, 0);
  sources.push(...E.sources);
  const L = mm(pole.reach);
  const I = pole.section.I * 1e-12;
  const kPole = (3 * E.mean * 1e6 * I) / L ** 3;
  const yoke = inSeries({ k: kPole, zeta: lim('ride.wheel-contact', 'damping_ratio') }, { k: lim('ride.supports', 'yoke_pad_stiffness'), zeta: lim('ride.supports', 'yoke_damping_ratio') });
  const arm = mm(spec.pole.yoke_x_mm - spec.axle.x_mm);
  const yokeMass = (body.Ipitch + body.mass_kg * (body.x - mm(spec.axle.x_mm)) ** 2) / arm ** 2;
  const cy = damp * 2 * yoke.zeta * Math.sqrt(yoke.k * yokeMass);
  const Gmod = E.mean * 1e6 * lim('ride.supports', 'shear_modulus_ratio');
  const J = torsionConstant(spec.pole.width_mm, spec.pole.height_mm) * 1e-12;
  const kRoll = which === 'drop' ? 0 : (Gmod * J) / L;
  const cRoll = damp * 2 * yoke.zeta * Math.sqrt(kRoll * body.Iroll);
  working.push(`pole bending 3EI/L_f³ = 3 × ${f(E.mean, 0)} MPa × ${f(pole.section.I / 1e6, 3)}e6 mm⁴ / (${f(pole.reach, 0)} mm)³ = ${f(kPole, 0)} N/m, in series with the yoke pad: k_y = ${f(yoke.k, 0)} N/m, ζ = ${f(yoke.zeta, 3)}, c = ${f(cy, 0)} N·s/m (mass at the yoke ${f(yokeMass)} kg)`);
  working.push(which === 'drop' ? 'drop test: the pole end rests on a prop of the yoke\'s stiffness that can only push; no roll spring' : `roll: G = E × ${lim('ride.supports', 'shear_modulus_ratio')} = ${f(Gmod / 1e6, 0)} MPa, J = ${f(J * 1e12 / 1e6, 3)}e6 mm⁴, k_roll = GJ/L_f = ${f(kRoll, 0)} N·m/rad`);

  // Crew: the floor's tangent stiffness under each person in series with the legs.
  const legs = lim('ride.supports', 'legs_stiffness');
  const floorDamping = o.floorDampingRatio !== undefined ? { value: o.floorDampingRatio, source: 'set by the caller' } : floorDampingOf(i);
  sources.push(`floor damping: ${floorDamping.source}`);
  const unknownFloor: string[] = [];
  const crew = spec.crew.map((c, n) => {
    const kf = i.floorStatic.crew[n].tangentStiffness_N_per_mm * 1e3;
    const k = (kf * legs) / (kf + legs);
    const cc = damp * 2 * floorDamping.value * Math.sqrt(k * c.mass_kg);
    if (!(kf > 0) || !Number.isFinite(kf)) unknownFloor.push(c.role);
    working.push(
      unknownFloor.includes(c.role)
        ? `${c.role}: the floor's stiffness under them is not known (the cable net was not solved: see floor.convergence)`
        : `${c.role}: floor ${f(kf / 1e3, 2)} kN/m (tangent, cable net) in series with the legs ${f(legs / 1e3, 0)} kN/m = ${f(k / 1e3, 2)} kN/m; ζ_floor = ${floorDamping.value}, c = ${f(cc, 0)} N·s/m`,
    );
    return { role: c.role, m: c.mass_kg, x: mm(c.x_mm), y: mm(c.y_mm), k, c: cc, xs: (c.mass_kg * G) / k };
  });

  const speed = which === 'drop' ? 0 : spec.operation.speed_kmh * UNITS.kmh.si;
  // The draught's couple about the contact: each part of the rolling resistance with its own arm (design basis, section 3).
  const couple = rollingResistance(spec, data).couple_m;
  const r = mm(lay.wheelRadius);
  let road: RoadInput = (_w, _t, out) => out.fill(0);
  let inputEnd = 0;
  let breaks: number[] = [];
  const over = groundOf(which);
  if (over !== null) {
    const profile = over === 'rough-ground' ? roughGround(spec, data) : stone(spec);
    sources.push(...profile.height.sources, ...profile.length.sources);
    const bump = { height: o.bumpHeight ?? profile.height.value, length: o.bumpLength ?? profile.length.value };
    const env = envelopeOf(bump, r);
    const lead = 0.05 - env.start; // the wheel starts 50 mm short of where it first touches
    const struck = underBothWheels(which) ? [true, true] : [true, false];
    road = (w, t, out) => {
      if (!struck[w]) return void out.fill(0);
      env.at(speed * t - lead, out);
      out[1] *= speed;
    };
    inputEnd = (lead + env.end) / speed;
    // just past each kink, so a step never starts on its left-hand value
    breaks = [(lead + env.start) / speed + 1e-9, inputEnd + 1e-9];
    const what = over === 'rough-ground' ? 'rough ground, a ridge' : 'the stone, a hump';
    const given = (v: number | undefined, p: ProfileValue) => (v === undefined ? p.from : 'set by the caller');
    working.push(`road: ${what} ${underBothWheels(which) ? 'across both tracks' : 'under the left wheel'}, raised cosine ${f(bump.height * 1000)} mm high (${given(o.bumpHeight, profile.height)}) and ${f(bump.length * 1000, 0)} mm long (${given(o.bumpLength, profile.length)}), steepest slope πh/L = ${f((Math.PI * bump.height) / bump.length, 3)}; the rigid wheel's envelope (r = ${f(r * 1000, 0)} mm) ${f((env.end - env.start) * 1000, 0)} mm long, at ${spec.operation.speed_kmh} km/h; draught couple (h_y − r)·C_s + h_y·C_b = ${f(couple, 4)} m`);
  } else {
    working.push(`drop test: released at rest with every point ${f(spec.operation.drop_height_mm, 0)} mm above its standing position, onto rigid ground`);
  }

  const system: RideSystem = {
    body,
    axleX: mm(spec.axle.x_mm),
    wheels: [
      wheelAt('left', mm(spec.wheels.track_mm) / 2),
      wheelAt('right', -mm(spec.wheels.track_mm) / 2),
    ],
    yoke: { x: mm(spec.pole.yoke_x_mm), k: yoke.k, c: cy, kRoll, cRoll, oneSided: which === 'drop', xs: Math.max(i.staticCase.pole_load_N, 1) / yoke.k },
    crew,
    draughtArm: which === 'drop' ? 0 : couple,
    road,
  };
  const periods = [
    ...crew.map((c) => 2 * Math.PI * Math.sqrt(c.m / c.k)),
    2 * Math.PI * Math.sqrt(effectiveMass(body, system.axleX, mm(spec.wheels.track_mm) / 2) / contact.k),
    2 * Math.PI * Math.sqrt(yokeMass / yoke.k),
  ];
  const shortestTimeConstant = cg > 0 ? cg / (wheel.k + (ground?.k.value ?? 0)) : Infinity;
  const unknown = !Number.isFinite(kRing)
    ? `the wheel's own stiffness is not known (${i.wheelStiffness.working})`
    : unknownFloor.length ? `the floor's stiffness under ${unknownFloor.join(' and ')} is not known: the strap floor was not solved (see floor.convergence)` : undefined;
  return { system, inputEnd, breaks, drop: which === 'drop' ? mm(spec.operation.drop_height_mm) : 0, speed, floorDamping, shortestPeriod: Math.min(...periods), shortestTimeConstant, working, sources, ...(unknown ? { unknown } : {}) };
}

/** The body's mass as felt at one wheel (heave, pitch and roll together). */
function effectiveMass(b: { mass_kg: number; x: number; y: number; Ipitch: number; Iroll: number }, x: number, y: number): number {
  return 1 / (1 / b.mass_kg + (x - b.x) ** 2 / b.Ipitch + (y - b.y) ** 2 / b.Iroll);
}
