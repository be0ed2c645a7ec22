import type { RulesData } from '../data/rules-data.ts';
import { lateralAccelAt, type TurnModel } from '../model/turn.ts';
import { rollover } from '../rules/turn/rollover.ts';
import { sliding } from '../rules/turn/sliding.ts';
import { UNITS } from '../units/units.ts';
import type { PlotData } from './plot-data.ts';
import { lateralLimits } from '../model/turn-limits.ts';

// Lateral acceleration at the axle over team speed for the planned turn
// (mechanics note, section 4: a = v² R_a / R_y²), against the rollover
// threshold g·SSF and the sliding threshold μg with the rules' fractions of
// them. The speed axis runs past the planned speed to where the turn would
// reach the lower of the two thresholds, so the margin can be read off.

export const TURN_SPEED_SAMPLES = 61;
/** The axis runs at least this far past the planned speed, and at most this many times it. */
const LEAST_SPAN = 1.5;
const MOST_SPAN = 4;
/** How far past the first threshold's speed the axis runs. */
const PAST_THRESHOLD = 1.15;

const kmh = (v_ms: number) => v_ms / UNITS.kmh.si;

export function turnSpeedPlot(t: TurnModel, data: RulesData): PlotData | null {
  if (!t.steady || !(t.speed > 0)) return null;
  const first = Math.min(t.rolloverAccel, t.slideAccel);
  const firstSpeed = t.yokeRadius * Math.sqrt(first / t.axleRadius);
  const top = Math.min(MOST_SPAN * t.speed, Math.max(LEAST_SPAN * t.speed, PAST_THRESHOLD * firstSpeed));
  const v = Array.from({ length: TURN_SPEED_SAMPLES }, (_, i) => (top * i) / (TURN_SPEED_SAMPLES - 1));
  // Each limit as the lateral acceleration it allows, unfactored (the checks themselves are in equilibrium, EQU).
  const allowed = lateralLimits(data, t);
  const line = (label: string, value: number | null, kind: 'hard' | 'advisory') => (value === null ? [] : [{ label, axis: 'y' as const, value, kind }]);
  return {
    id: 'turn-speed',
    title: `Lateral acceleration over speed on the ${t.yokeRadius} m turn`,
    caption: `The lateral acceleration at the axle on the planned turn (yoke path radius ${t.yokeRadius} m, axle path ${t.axleRadius.toFixed(2)} m) as the team's speed rises, against the quasi-static rollover threshold g·SSF (SSF ${t.ssf.toFixed(3)}, crew as placed) and the sliding threshold μg (μ ${t.lateralFriction}), with the ${rollover.id} and ${sliding.id} limits; the dot is the planned speed.`,
    xLabel: 'team speed (km/h)',
    yLabel: 'lateral acceleration (m/s²)',
    lines: [
      { label: 'lateral acceleration in the turn', x: v.map(kmh), y: v.map((s) => lateralAccelAt(s, t.yokeRadius, t.reach)), style: 'solid' },
      { label: 'planned speed', x: [kmh(t.speed)], y: [t.lateralAccel], style: 'dots' },
    ],
    rules: [
      { label: 'rollover threshold g·SSF', axis: 'y', value: t.rolloverAccel, kind: 'threshold' },
      ...line(`hard limit, ${rollover.id}`, allowed.rollover.hard, 'hard'),
      ...line(`advisory limit, ${rollover.id}`, allowed.rollover.advisory, 'advisory'),
      { label: 'sliding threshold μg', axis: 'y', value: t.slideAccel, kind: 'threshold' },
      ...line(`hard limit, ${sliding.id}`, allowed.sliding.hard, 'hard'),
      ...line(`advisory limit, ${sliding.id}`, allowed.sliding.advisory, 'advisory'),
    ],
  };
}
