import type { RulesData } from '../data/rules-data.ts';
import type { LoadCaseResult } from '../result/check-result.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { G } from '../units/units.ts';
import { massModel, type MassModel } from './mass-model.ts';
import { poleLoad } from './pole-load.ts';

// The longitudinal load cases of the mechanics note, section 3: the crew as
// placed and at both ends of the usable floor, each standing still,
// accelerating and braking. Taking every combination is the safe side.

type CrewPosition = LoadCaseResult['crew_position'];

const CREW: { pos: CrewPosition; id: string; title: string }[] = [
  { pos: 'as placed', id: '', title: 'crew as placed' },
  { pos: 'forward', id: 'crew-forward', title: 'crew at the front of the usable floor' },
  { pos: 'aft', id: 'crew-aft', title: 'crew at the back of the usable floor' },
];

export function crewAt(spec: CheckedSpecification, pos: CrewPosition): CheckedSpecification {
  if (pos === 'as placed') return spec;
  const margin = spec.box.floor.usable_margin_mm;
  const x = pos === 'forward' ? spec.box.floor.depth_mm - margin : margin;
  return { ...spec, crew: spec.crew.map((c) => ({ ...c, x_mm: x })) };
}

/** The pole load for a spec as it stands (crew as placed, no acceleration). */
export function staticPoleLoad(spec: CheckedSpecification, data: RulesData, model: MassModel = massModel(spec, data)) {
  return poleLoad({ parts: model.parts.filter((p) => p.group === 'rolling'), axleX_mm: spec.axle.x_mm, yokeX_mm: spec.pole.yoke_x_mm, yokeZ_mm: spec.pole.yoke_height_mm, accel_g: 0, rollingResistance: data.grounds[spec.operation.ground].rolling_resistance.value });
}

export function loadCases(spec: CheckedSpecification, data: RulesData): LoadCaseResult[] {
  const motions = [
    { accel: 0, id: 'static', title: 'standing' },
    { accel: spec.operation.acceleration_g, id: 'accelerating', title: `accelerating at ${spec.operation.acceleration_g} g` },
    { accel: -spec.operation.braking_g, id: 'braking', title: `braking at ${spec.operation.braking_g} g` },
  ];
  const Crr = data.grounds[spec.operation.ground].rolling_resistance.value;
  const out: LoadCaseResult[] = [];
  for (const crew of CREW) {
    const variant = crewAt(spec, crew.pos);
    const model = massModel(variant, data);
    const rolling = model.parts.filter((p) => p.group === 'rolling');
    const yokeWeight = model.yoke.mass_kg * G;
    for (const motion of motions) {
      const r = poleLoad({ parts: rolling, axleX_mm: spec.axle.x_mm, yokeX_mm: spec.pole.yoke_x_mm, yokeZ_mm: spec.pole.yoke_height_mm, accel_g: motion.accel, rollingResistance: Crr });
      const yoke = r.pole_N + yokeWeight;
      const perHorse = yoke / spec.team.horses;
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
        working: `${r.working}\nR_yoke = R_pole + m_yoke·g = ${r.pole_N.toFixed(1)} + ${model.yoke.mass_kg.toFixed(2)} kg × ${G} = ${yoke.toFixed(1)} N; per horse ${yoke.toFixed(1)} / ${spec.team.horses} = ${perHorse.toFixed(1)} N`,
      });
    }
  }
  return out;
}
