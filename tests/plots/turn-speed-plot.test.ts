import { limitLevel } from '../../src/core/data/param.ts';
import { describe, expect, it } from 'vitest';
import type { RulesData } from '../../src/core/data/rules-data.ts';
import { Analysis } from '../support/analysis.ts';
import { turnSpeedPlot, TURN_SPEED_SAMPLES } from '../../src/core/plots/turn-speed-plot.ts';
import { G, UNITS } from '../../src/core/units/units.ts';
import { dataWithGround, findingsOf, handSpec, prepared } from '../support/fixtures.ts';

// The hand-calculation spec: yoke path R_y = 12 m, reach L = 2.25 m, so the
// axle runs on R_a = √(12² − 2.25²) m. The whole rolling assembly turns at
// the yaw rate ω = v / R_y, so the axle's lateral acceleration is
// ω² R_a = v² R_a / R_y² (rigid-body kinematics, e.g. Meriam & Kraige,
// Engineering Mechanics: Dynamics, plane motion: a_n = ω² r).
const kmh = UNITS.kmh.si;
// A grippy ground (μ = 0.9, above this build's SSF) so rollover, not sliding, is the first threshold.
const base = dataWithGround('hand-rigid', 0);
const ground = base.grounds['hand-rigid'];
const rulesData: RulesData = { ...base, grounds: { ...base.grounds, 'hand-rigid': { ...ground, lateral_friction: { ...ground.lateral_friction, value: 0.9 } } } };

function plotOf(patch: (s: Record<string, any>) => void = () => {}) {
  const s = handSpec();
  patch(s);
  const a = new Analysis(prepared(s, rulesData), rulesData);
  return { a, plot: turnSpeedPlot(a.turn, rulesData) };
}

describe('lateral acceleration over speed in the planned turn', () => {
  const { a, plot } = plotOf();
  const curve = plot!.lines[0];
  const Ra = Math.sqrt(12 ** 2 - 2.25 ** 2);

  it('follows ω² R_a at every sampled speed', () => {
    expect(curve.x).toHaveLength(TURN_SPEED_SAMPLES);
    curve.x.forEach((v, i) => expect(curve.y[i]).toBeCloseTo((v * kmh) ** 2 * Ra / 144, 10));
  });

  it("marks the planned speed where the rollover rule's finding puts it", async () => {
    const [f] = await findingsOf('turn.rollover', handSpec(), {}, rulesData);
    const dot = plot!.lines.find((l) => l.style === 'dots')!;
    expect(dot.x).toEqual([15]);
    // The rule compares 1.5 a_lat with 0.9 g·SSF (EQU); the plot draws the unfactored a_lat and each limit as
    // the a_lat it allows: level × 0.9 / 1.5 × g·SSF (EN 1990 Table A1.2(A)).
    expect(dot.y[0]).toBeCloseTo(f.params.lateral as number, 10);
    expect(f.value!).toBeCloseTo(1.5 * dot.y[0], 10);
    expect(f.severity).toBe('pass');
    expect(plot!.rules.find((r) => r.label === 'advisory limit, turn.rollover')!.value).toBeCloseTo((f.params.advisory as number) / 1.5, 10);
    expect(plot!.rules.find((r) => r.label === 'hard limit, turn.rollover')!.value).toBeCloseTo(f.limit! / 1.5, 10);
  });

  it('crosses the rollover threshold g·SSF at the rollover speed R_y √(g SSF / R_a)', () => {
    const t = a.turn;
    const threshold = plot!.rules.find((r) => r.label === 'rollover threshold g·SSF')!.value;
    expect(threshold).toBeCloseTo(G * (1.6 / (2 * t.cgHeight)), 10);
    expect(t.rolloverAccel).toBeLessThan(t.slideAccel);
    const i = curve.y.findIndex((y) => y >= threshold);
    expect(i).toBeGreaterThan(0);
    const v = curve.x[i - 1] + ((threshold - curve.y[i - 1]) / (curve.y[i] - curve.y[i - 1])) * (curve.x[i] - curve.x[i - 1]);
    // Linear interpolation on a parabola over one sample: within 0.5 %.
    const closed = 12 * Math.sqrt(threshold / Ra);
    expect(Math.abs(v * kmh - closed) / closed).toBeLessThan(0.005);
    expect(t.rolloverSpeed).toBeCloseTo(closed, 10);
  });

  it('runs past the lower threshold, within 1.5 to 4 times the planned speed', () => {
    const t = a.turn;
    const first = Math.min(t.rolloverAccel, t.slideAccel);
    const firstSpeed = (12 * Math.sqrt(first / Ra)) / kmh;
    expect(curve.x.at(-1)).toBeCloseTo(Math.min(60, Math.max(22.5, 1.15 * firstSpeed)), 9);
  });

  it('draws the sliding threshold μg and the sliding limits as the a_lat they allow, level × 0.9/1.5 × μg', () => {
    const mu = rulesData.grounds[a.spec.operation.ground].lateral_friction.value;
    expect(plot!.rules.find((r) => r.label === 'sliding threshold μg')!.value).toBeCloseTo(mu * G, 10);
    const hard = limitLevel(rulesData, 'turn.sliding', 'lateral_fraction', 'hard');
    expect(plot!.rules.find((r) => r.label === 'hard limit, turn.sliding')!.value).toBeCloseTo((hard * 0.9 * mu * G) / 1.5, 10);
  });

  it('approaches v²/R for a turn far wider than the reach', () => {
    const wide = plotOf((s) => (s.operation.turn_radius_m = 1000)).plot!.lines[0];
    // v² R_a / R² = (v²/R) √(1 − L²/R²): relative difference L²/(2R²) = 2.5e-6.
    wide.x.forEach((v, i) => i > 0 && expect(Math.abs(wide.y[i] / ((v * kmh) ** 2 / 1000) - 1)).toBeLessThan(3e-6));
  });

  it('is left out where the turn is too tight for a steady path', () => {
    expect(plotOf((s) => (s.operation.turn_radius_m = 2)).plot).toBeNull();
  });
});
