import type { RulesData } from '../data/rules-data.ts';
import type { LoadCaseResult } from './load-case-result.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { G } from '../units/units.ts';
import { massModel, type MassModel } from './mass-model.ts';
import { poleLoad } from './pole-load.ts';
import { rollingResistance } from './rolling-resistance.ts';
import { combinationFactors } from './combination-factors.ts';
import { equilibriumWeight } from './equilibrium-factors.ts';
import { num, step, stepText } from '../findings/working.ts';

// The longitudinal load cases (design basis, section 3): the crew as placed
// and at both ends of the usable floor, each standing still, accelerating and
// braking. Taking every combination is the safe side. Each case's pole load
// is given as it is (characteristic: the load on each horse) and with the EQU
// factors (equilibrium: whether the yoke lifts).

type CrewPosition = LoadCaseResult['crew_position'];

const CREW: { pos: CrewPosition; id: string; title: string }[] = [
  { pos: 'as placed', id: '', title: 'crew as placed' },
  { pos: 'forward', id: 'crew-forward', title: 'crew at the front of the usable floor' },
  { pos: 'aft', id: 'crew-aft', title: 'crew at the back of the usable floor' },
];

export function crewAt(spec: CheckedSpecification, pos: CrewPosition): CheckedSpecification {
  if (pos === 'as placed') return spec;
  const { front, back } = usableFloor(spec);
  return crewMovedTo(spec, pos === 'forward' ? front : back);
}

/** The usable floor's back and front edges, mm from the floor's rear edge. */
export function usableFloor(spec: CheckedSpecification): { back: number; front: number } {
  const margin = spec.box.floor.usable_margin_mm;
  return { back: margin, front: spec.box.floor.depth_mm - margin };
}

/** The whole crew standing together at x (mm from the floor's rear edge). */
export function crewMovedTo(spec: CheckedSpecification, x_mm: number): CheckedSpecification {
  return { ...spec, crew: spec.crew.map((c) => ({ ...c, x_mm })) };
}

/** Standing, accelerating and braking at the specification's rates. */
export function motions(spec: CheckedSpecification): { accel: number; id: string; title: string }[] {
  return [
    { accel: 0, id: 'static', title: 'standing' },
    { accel: spec.operation.acceleration_g, id: 'accelerating', title: `accelerating at ${spec.operation.acceleration_g} g` },
    { accel: -spec.operation.braking_g, id: 'braking', title: `braking at ${spec.operation.braking_g} g` },
  ];
}

/** The pole load, the yoke load (pole plus yoke weight) and each horse's share, for one placement of the masses. */
export function yokeLoads(spec: CheckedSpecification, data: RulesData, model: MassModel, accel_g: number) {
  const r = poleLoad({
    parts: model.parts.filter((p) => p.group === 'rolling'),
    axleX_mm: spec.axle.x_mm,
    yokeX_mm: spec.pole.yoke_x_mm,
    yokeZ_mm: spec.pole.yoke_height_mm,
    accel_g,
    resistance: rollingResistance(spec, data),
  });
  const yoke_N = r.pole_N + model.yoke.mass_kg * G;
  return { pole: r, yoke_N, perHorse_N: yoke_N / spec.team.horses };
}

/**
 * The pole load with the EQU factors: each permanent weight × 1.1 behind the
 * axle and × 0.9 ahead of it; the motion's inertia (one action, each mass at
 * its own height) × 1.5 where it lifts the yoke, else left out; the crew and
 * loads × 1.5 where they (weight and inertia together) lift it, else left out.
 * Whether the motion lifts depends on which masses are aboard, so both
 * choices are made and the lower pole load is the equilibrium case.
 */
export function equilibriumPoleLoad(spec: CheckedSpecification, data: RulesData, model: MassModel, accel_g: number) {
  const f = combinationFactors(data);
  const rolling = model.parts.filter((p) => p.group === 'rolling');
  const xa = spec.axle.x_mm;
  const hy = spec.pole.yoke_height_mm;
  const resistance = rollingResistance(spec, data);
  // Someone drives whenever the vehicle moves: the driver (the crew entry of that role, else the first) is then aboard.
  const driver = `crew, ${(spec.crew.find((c) => c.role === 'driver') ?? spec.crew[0])?.role}`;
  const trial = (fI: number) => {
    const parts = rolling.map((p) => {
      if (!p.variable) return { ...p, factor: equilibriumWeight(p, xa, f), inertiaFactor: fI };
      // A person aboard brings weight (× γ_Q behind the axle, × 0.9 ahead of it) and inertia (the motion's factor).
      // The driver of a moving vehicle is aboard; anyone else only where their presence lifts the yoke.
      const weightFactor = p.x_mm < xa ? f.gammaQdst : f.gammaGstb;
      const lifts = weightFactor * (p.x_mm - xa) + fI * accel_g * (hy - p.z_mm) < 0;
      const aboard = lifts || (accel_g !== 0 && p.part === driver);
      return aboard ? { ...p, factor: weightFactor, inertiaFactor: fI } : { ...p, factor: 0, inertiaFactor: 0 };
    });
    return { fI, r: poleLoad({ parts, axleX_mm: xa, yokeX_mm: spec.pole.yoke_x_mm, yokeZ_mm: hy, accel_g, resistance }) };
  };
  const choices = accel_g === 0 ? [trial(0)] : [trial(0), trial(f.gammaQdst)];
  const { fI, r } = choices.reduce((lo, c) => (c.r.pole_N < lo.r.pole_N ? c : lo));
  const factors = [`own weight × ${f.gammaGstb} ahead of the axle, × ${f.gammaGdst} behind it; crew and loads aboard where they lift the yoke${accel_g !== 0 ? ' (and the driver, aboard whenever the vehicle moves)' : ''}, × ${f.gammaGstb} ahead of the axle and × ${f.gammaQdst} behind it, else left out; inertia × ${fI} (the lower pole load of the motion left out and the motion × ${f.gammaQdst})`];
  return { pole_N: r.pole_N, working: [...factors, ...r.working.map(stepText)].join('\n') };
}

/** The pole load for a spec as it stands (crew as placed, no acceleration). */
export function staticPoleLoad(spec: CheckedSpecification, data: RulesData, model: MassModel = massModel(spec, data)) {
  return yokeLoads(spec, data, model, 0).pole;
}

export function loadCases(spec: CheckedSpecification, data: RulesData): LoadCaseResult[] {
  const out: LoadCaseResult[] = [];
  const resistance = rollingResistance(spec, data);
  for (const crew of CREW) {
    const model = massModel(crewAt(spec, crew.pos), data);
    for (const motion of motions(spec)) {
      const { pole: r, yoke_N: yoke, perHorse_N: perHorse } = yokeLoads(spec, data, model, motion.accel);
      const equ = equilibriumPoleLoad(spec, data, model, motion.accel);
      const id = crew.id ? (motion.id === 'static' ? crew.id : `${crew.id}-${motion.id}`) : motion.id;
      out.push({
        id,
        title: `${motion.title}, ${crew.title}`,
        crew_position: crew.pos,
        accel_g: motion.accel,
        pole_load_N: r.pole_N,
        yoke_load_N: yoke,
        per_horse_N: perHorse,
        axle_load_N: r.axle_N,
        working: [...resistance.working, ...r.working, step('R_yoke = R_pole + m_yoke·g', `${num(r.pole_N)} + ${num(model.yoke.mass_kg)} × ${num(G)}`, yoke, 'N'), step('per horse = R_yoke / n', `${num(yoke)} / ${spec.team.horses}`, perHorse, 'N')].map(stepText).join('\n'),
        pole_load_equ_N: equ.pole_N,
        working_equ: equ.working,
      });
    }
  }
  return out;
}
