// The ride model's benchmark, all in one run, on the five ride cases of a
// specification: for the core's Dormand-Prince integrator and for odex, the
// loosest relative tolerance of a ladder (1e-2 down to 1e-9) that keeps every
// crew member's rise and every wheel's peak force within 0.1 % of odex at
// 1e-10 on all five cases; odex also at the cheapest of a few ways of reading
// its solution (at points inside each step, or on an even grid). Each case is
// then timed at those settings (median CPU time of many runs; the system built
// once outside the timing, so that only the static equilibrium, the
// integration and the reading of the peaks are timed for both; the core
// without its plotted series, which odex does not make, and that series'
// cost printed beside it), and their ratio printed against the target. Then
// the floor-damping tuner's short and full runs and its time. Returns the
// count of missed targets.
import type { RulesData } from '../src/core/data/rules-data.ts';
import { ModelGraph } from '../src/core/pipeline/model-graph.ts';
import { MODELS } from '../src/core/pipeline/models.ts';
import { floorDampingNeeded } from '../src/core/ride/damping-tuner.ts';
import { buildRide, type BuiltRide } from '../src/core/ride/ride-build.ts';
import { runSettings } from '../src/core/ride/ride-model.ts';
import { RIDE_TOLERANCE, runRide } from '../src/core/ride/ride-run.ts';
import { RIDE_CASES, type RideCase } from '../src/core/ride/ride-types.ts';
import type { CheckedSpecification } from '../src/core/spec/spec.types.ts';
import { rideByOdex, type OdexReading } from '../src/node/ride-odex.ts';
import { medianCpuMs, verdict } from './median.ts';

const LADDER = [1e-2, 3e-3, 1e-3, 3e-4, 1e-4, 3e-5, 1e-5, 3e-6, 1e-6, 1e-7, 1e-8, 1e-9];
const REFERENCE_TOLERANCE = 1e-10;
const WITHIN = 1e-3;
const SPEEDUP_TARGET = 5;
const SHORT_RUNS_TARGET = 3;
const RUNS = 21;
const TUNER_RUNS = 11;
/** Ways of reading odex's solution for the peaks: points evenly inside each step (its end among them), or an even grid, s. */
const ODEX_READINGS: readonly OdexReading[] = [{ perStep: 3 }, { perStep: 6 }, { perStep: 12 }, { interval: 1e-3 }, { interval: 2.5e-4 }];
const readingLabel = (r: OdexReading) => ('perStep' in r ? `read at ${r.perStep} points a step` : `read every ${r.interval * 1e3} ms`);

interface Figures {
  rise_mm: readonly number[];
  wheel_dlf: readonly number[];
}

interface Case {
  which: RideCase;
  built: BuiltRide;
  ref: Figures;
}

interface Integrator {
  label: string;
  run(c: Case, tol: number): Figures;
}

/** The largest relative difference of the crew's rise and the wheels' peak force from the reference. */
function worstOf(f: Figures, ref: Figures): number {
  const rel = (a: readonly number[], b: readonly number[]) => Math.max(...a.map((v, i) => Math.abs(v / b[i] - 1)));
  return Math.max(rel(f.rise_mm, ref.rise_mm), rel(f.wheel_dlf, ref.wheel_dlf));
}

/** The loosest tolerance of the ladder at which every case is within WITHIN of the reference, with the worst difference there. */
function loosest(integrator: Integrator, cases: readonly Case[]): { tol: number; worst: number } | null {
  for (const tol of LADDER) {
    const worst = Math.max(...cases.map((c) => worstOf(integrator.run(c, tol), c.ref)));
    if (worst <= WITHIN) return { tol, worst };
  }
  return null;
}

/** An integrator at its loosest tolerance, timed case by case. */
interface Tuned {
  label: string;
  tol: number;
  worst: number;
  ms: number[];
}

function tune(integrator: Integrator, cases: readonly Case[]): Tuned | null {
  const at = loosest(integrator, cases);
  return at && { label: integrator.label, ...at, ms: cases.map((k) => medianCpuMs(() => integrator.run(k, at.tol), RUNS)) };
}

const sum = (a: readonly number[]) => a.reduce((x, y) => x + y, 0);

export function benchRide(spec: CheckedSpecification, data: RulesData): number {
  const input = new ModelGraph(MODELS, { spec, data, ride: true }).get('rideInput');
  const duration = runSettings(input, 'drop').duration;
  const cases: Case[] = RIDE_CASES.map((which) => {
    const built = buildRide(input, which);
    return { which, built, ref: rideByOdex(built, duration, REFERENCE_TOLERANCE) };
  });
  /** The core's run, with its plotted series (as a check runs it) or without (no sample beyond the first). */
  const coreRun = (series: boolean): Integrator['run'] => ({ which, built }, tol) => {
    const s = runSettings(input, which, { tolerance: tol });
    const r = runRide(built, which, series ? s : { ...s, sampleInterval: Infinity });
    return { rise_mm: r.crew.map((c) => c.rise_mm), wheel_dlf: r.wheels.map((w) => w.dlf) };
  };
  const core = tune({ label: 'core Dormand-Prince', run: coreRun(false) }, cases);
  const odexes = ODEX_READINGS.map((reading) => tune({ label: `odex, ${readingLabel(reading)}`, run: ({ built }, tol) => rideByOdex(built, duration, tol, reading) }, cases));

  console.log(`ride model, five cases of ${duration} s, at equal accuracy (every crew rise and peak wheel force within ${WITHIN * 100} % of odex at rel. tol. ${REFERENCE_TOLERANCE}; each integrator at the loosest of ${LADDER.map((t) => t.toExponential(0)).join(', ')} that keeps them), median CPU time of ${RUNS} runs, the system built outside the timing:`);
  for (const t of [core, ...odexes]) if (t) console.log(`  ${t.label.padEnd(36)} rel. tol. ${t.tol.toExponential(0)}: worst difference ${(t.worst * 100).toFixed(4)} %, five cases ${sum(t.ms).toFixed(2)} ms`);
  const failed = [core, ...odexes].filter((t) => !t).length;
  if (failed) console.log(`  ${failed} of the integrators and readings keep no case within ${WITHIN * 100} % at any tolerance of the ladder`);
  const odex = odexes.filter((t): t is Tuned => t !== null).sort((a, b) => sum(a.ms) - sum(b.ms))[0];
  let missed = 0;
  if (!core || !odex) missed++;
  else {
    console.log(`  against the fastest odex (${odex.label}):`);
    cases.forEach((k, i) => console.log(`  ${k.which.padEnd(16)} core ${core.ms[i].toFixed(2)} ms, odex ${odex.ms[i].toFixed(2)} ms: ${(odex.ms[i] / core.ms[i]).toFixed(1)} times`));
    const ratio = sum(odex.ms) / sum(core.ms);
    console.log(`  five cases: core ${sum(core.ms).toFixed(2)} ms, odex ${sum(odex.ms).toFixed(2)} ms: odex / core ${ratio.toFixed(1)} times  target at least ${SPEEDUP_TARGET} times faster  ${verdict(ratio >= SPEEDUP_TARGET)}`);
    const withSeries = sum(cases.map((k) => medianCpuMs(() => coreRun(true)(k, RIDE_TOLERANCE), RUNS)));
    console.log(`  (the core as a check runs it, at rel. tol. ${RIDE_TOLERANCE} and with its series every ${runSettings(input, 'drop').sampleInterval * 1e3} ms for the plots: five cases ${withSeries.toFixed(2)} ms)`);
    missed += ratio >= SPEEDUP_TARGET ? 0 : 1;
  }
  let need = floorDampingNeeded(input);
  const tunerMs = medianCpuMs(() => (need = floorDampingNeeded(input)), TUNER_RUNS);
  const met = need.shortRuns <= SHORT_RUNS_TARGET;
  console.log(`floor-damping tuner: ${need.shortRuns} short drop runs and ${need.simulations - need.shortRuns} full runs, median CPU ${tunerMs.toFixed(1)} ms, least ratio ${need.ratio === null ? 'none' : need.ratio.toFixed(4)}  target at most ${SHORT_RUNS_TARGET} short runs  ${verdict(met)}`);
  return missed + (met ? 0 : 1);
}
