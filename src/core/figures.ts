import { lateralLimits } from './model/turn-limits.ts';
import type { ModelView } from './pipeline/define-model.ts';
import { figureOrReason, type Figure, type FigureEntry } from './result/figure.ts';
import { G, UNITS } from './units/units.ts';
import { tightestYokeRadius } from './model/turn.ts';
import { memberFigures } from './model/members/member-figures.ts';
import { floorFigures } from './model/cable-net/floor-figures.ts';
import { rideFigures } from './ride/ride-figures.ts';

/** The models the named figures read. */
export type FiguresView = ModelView<'mass' | 'loadCases' | 'staticCase' | 'turn' | 'floorStatic' | 'floorBump' | 'floorStone' | 'ride' | 'bumpFactors' | 'stoneFactors' | 'cutting' | 'draught'>;

/** The named figures of a check, or why one does not apply; later families add theirs here. */
export function figures(a: FiguresView): Record<string, FigureEntry> {
  const cases = a.loadCases;
  const stat = cases.find((c) => c.id === 'static')!;
  const yoke = cases.map((c) => c.yoke_load_N);
  const { rolling, total } = a.mass;
  return {
    total_mass: { value: total.mass_kg, unit: 'kg' },
    rolling_mass: { value: rolling.mass_kg, unit: 'kg' },
    cg_x: { value: rolling.x_mm, unit: 'mm' },
    cg_z: { value: rolling.z_mm, unit: 'mm' },
    yoke_load: { value: stat.yoke_load_N, unit: 'N' },
    yoke_load_per_horse: { value: stat.per_horse_N, unit: 'N' },
    yoke_load_min: { value: Math.min(...yoke), unit: 'N' },
    yoke_load_max: { value: Math.max(...yoke), unit: 'N' },
    axle_load: { value: stat.axle_load_N, unit: 'N' },
    yoke_mass: { value: a.mass.yoke.mass_kg, unit: 'kg' },
    total_weight: { value: total.mass_kg * G, unit: 'N' },
    // The pull up the design grade, and the pull the team keeps up (draught.pull's advisory level).
    draught_pull_design: { value: a.draught.pull_N, unit: 'N' },
    draught_pull_capacity: { value: a.draught.sustained_N, unit: 'N' },
    ...turnFigures(a),
    ...memberFigures(a),
    ...floorFigures(a),
    ...rideFigures(a),
    ...cuttingFigures(a),
  };
}

// Timber volume is rough (as bought and cut), spares included. The stock cost is
// in the currency of stock.lumber's prices; it is 0 where no stock has a price
// (the plan then minimises the count of pieces instead).
function cuttingFigures(a: ModelView<'cutting'>): Record<string, Figure> {
  const { cut_list, stock_plan } = a.cutting;
  const volume = cut_list.reduce((sum, c) => sum + c.volume_m3 * (c.quantity + c.spares), 0);
  return {
    timber_volume: { value: volume, unit: 'm³' },
    stock_pieces: { value: stock_plan.pieces, unit: 'count' },
    stock_cost: { value: stock_plan.cost ?? 0, unit: 'currency' },
    stock_waste_pct: { value: stock_plan.waste_pct, unit: '%' },
  };
}

// Rollover figures use the rolling assembly with the crew as placed. Where no
// steady turn exists, the inner path and the rollover speed do not apply (turn.pole-reach says why).
function turnFigures(a: ModelView<'turn'>): Record<string, FigureEntry> {
  const t = a.turn;
  const allowed = lateralLimits(a.data, t).rollover;
  const advisory = (allowed.advisory ?? allowed.hard)!;
  return {
    ssf: { value: t.ssf, unit: '1' },
    rollover_accel: { value: t.rolloverAccel, unit: 'm/s²' },
    axle_path_radius: { value: t.axleRadius, unit: 'm' },
    inner_wheel_path_radius: figureOrReason(t.steady ? t.innerRadius : null, 'm', 'no steady turn: the planned turn is inside the pole reach'),
    lateral_accel_design: { value: t.lateralAccel, unit: 'm/s²' },
    rollover_speed_at_turn: figureOrReason(t.rolloverSpeed === null ? null : t.rolloverSpeed / UNITS.kmh.si, 'km/h', 'no steady turn: the planned turn is inside the pole reach'),
    min_turn_radius_at_speed: { value: tightestYokeRadius(t.speed, advisory, t.reach), unit: 'm' },
  };
}
