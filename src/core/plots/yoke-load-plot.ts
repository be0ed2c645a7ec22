import type { RulesData } from '../data/rules-data.ts';
import { crewMovedTo, motions, usableFloor, yokeLoads } from '../model/load-cases.ts';
import { massModel } from '../model/mass-model.ts';
import { horseLoad } from '../rules/balance/horse-load.ts';
import { yokeLift } from '../rules/balance/yoke-lift.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { G } from '../units/units.ts';
import type { PlotData } from './plot-data.ts';
import { limitLevel } from '../data/param.ts';

// The load on each horse as the whole crew moves together over the usable
// floor, standing, accelerating and braking: the balance model's load cases
// (mechanics note, section 3) swept between the two ends they take. Each point
// is a full mass model and pole-load solution, not an interpolation.

/** Crew positions sampled across the usable floor. */
export const YOKE_LOAD_SAMPLES = 21;

/** `horseKg`: the mass the horse-load check uses (the horse model's: the low end of a preset band). */
export function yokeLoadPlot(spec: CheckedSpecification, data: RulesData, horseKg: number): PlotData | null {
  if (spec.crew.length === 0) return null;
  const { back, front } = usableFloor(spec);
  const xs = Array.from({ length: YOKE_LOAD_SAMPLES }, (_, i) => back + ((front - back) * i) / (YOKE_LOAD_SAMPLES - 1));
  const models = xs.map((x) => massModel(crewMovedTo(spec, x), data));
  const lines = motions(spec).map((m) => ({
    label: m.title,
    x: xs,
    y: models.map((model) => yokeLoads(spec, data, model, m.accel).perHorse_N),
    style: m.accel === 0 ? ('solid' as const) : ('dashed' as const),
  }));
  const weight = horseKg * G;
  const yokeWeight = massModel(spec, data).yoke.mass_kg * G;
  const horses = spec.team.horses;
  const lift = limitLevel(data, yokeLift.id, 'pole_load', 'hard');
  const crewMass = spec.crew.reduce((s, c) => s + c.mass_kg, 0);
  const crewX = spec.crew.reduce((s, c) => s + c.mass_kg * c.x_mm, 0) / crewMass;
  return {
    id: 'yoke-load',
    title: 'Load on each horse over crew position',
    caption: `The yoke load each of the ${horses} horses carries with the whole crew standing together at a point of the usable floor (${back}-${front} mm from the rear edge), standing still and at the specification's acceleration and braking. Dashed level lines are the ${horseLoad.id} limits and the load below which the pole lifts the yoke (${yokeLift.id}); vertical lines mark the axle and the crew's centre of mass as placed.`,
    xLabel: 'crew position from the rear edge of the floor (mm)',
    yLabel: 'load per horse (N)',
    lines,
    rules: [
      { label: `advisory limit, ${horseLoad.id} (a judgement)`, axis: 'y', value: limitLevel(data, horseLoad.id, 'load_fraction', 'advisory') * weight, kind: 'advisory' },
      { label: `hard limit, ${horseLoad.id} (an analogy with ridden horses)`, axis: 'y', value: limitLevel(data, horseLoad.id, 'load_fraction', 'hard') * weight, kind: 'hard' },
      { label: `pole lifts the yoke below this, ${yokeLift.id}`, axis: 'y', value: (lift + yokeWeight) / horses, kind: 'threshold' },
      { label: 'axle', axis: 'x', value: spec.axle.x_mm, kind: 'position' },
      { label: 'crew as placed (centre of mass)', axis: 'x', value: crewX, kind: 'position' },
    ],
  };
}
