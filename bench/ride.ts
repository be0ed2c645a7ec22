// The ride model's benchmark, all in one run: for the core's Dormand-Prince
// integrator and for odex, the loosest relative tolerance (1e-3 to 1e-9) that
// keeps the crew's rise and the peak wheel force of the 3-second rough-ground
// ridge case within 0.1 % of odex at 1e-10; both timed at those tolerances
// (median after warm-up) and their ratio against the target; then the
// floor-damping tuner's short runs and time on the demo. Returns the count of
// missed targets.
import { performance } from 'node:perf_hooks';
import type { RulesData } from '../src/core/data/rules-data.ts';
import { ModelGraph } from '../src/core/pipeline/model-graph.ts';
import { MODELS } from '../src/core/pipeline/models.ts';
import { floorDampingNeeded } from '../src/core/ride/damping-tuner.ts';
import type { RideInput } from '../src/core/ride/ride-build.ts';
import { rideCaseOf } from '../src/core/ride/ride-model.ts';
import type { CheckedSpecification } from '../src/core/spec/spec.types.ts';
import { rideByOdex } from '../src/node/ride-odex.ts';

const CASE = 'rough-ridge';
const TOLERANCES = [1e-3, 1e-4, 1e-5, 1e-6, 1e-7, 1e-8, 1e-9];
const WITHIN = 1e-3;
const SPEEDUP_TARGET = 5;
const SHORT_RUNS_TARGET = 3;
const WARM = 3;
const RUNS = 11;
/**
 * odex's dense output is read every 0.25 ms (the reference every 0.05 ms),
 * peaks refined as the core refines its own; the core reads each step at its
 * end and two inner points and the series every 2 ms.
 */
const ODEX_INTERVAL = 2.5e-4;

interface Figures {
  rise_mm: readonly number[];
  wheel_dlf: readonly number[];
}

const ours = (input: RideInput, tol: number): Figures => {
  const r = rideCaseOf(input, CASE, { tolerance: tol });
  return { rise_mm: r.crew.map((c) => c.rise_mm), wheel_dlf: r.wheels.map((w) => w.dlf) };
};
const odex = (input: RideInput, tol: number): Figures => rideByOdex(input, CASE, tol, ODEX_INTERVAL);

function median(run: () => unknown): number {
  for (let i = 0; i < WARM; i++) run();
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    run();
    times.push(performance.now() - t0);
  }
  return times.sort((a, b) => a - b)[Math.floor(RUNS / 2)];
}

/** The largest relative difference of the crew's rise and the wheels' peak force from the reference. */
function worstOf(f: Figures, ref: Figures): { rise: number; wheel: number } {
  const rel = (a: readonly number[], b: readonly number[]) => Math.max(...a.map((v, i) => Math.abs(v / b[i] - 1)));
  return { rise: rel(f.rise_mm, ref.rise_mm), wheel: rel(f.wheel_dlf, ref.wheel_dlf) };
}

function loosest(label: string, run: (tol: number) => Figures, ref: Figures): { tol: number; ms: number } | null {
  for (const tol of TOLERANCES) {
    const w = worstOf(run(tol), ref);
    if (w.rise > WITHIN || w.wheel > WITHIN) continue;
    const ms = median(() => run(tol));
    console.log(`  ${label.padEnd(22)} rel. tol. ${tol.toExponential(0)}: crew rise within ${(w.rise * 100).toFixed(4)} %, peak wheel force within ${(w.wheel * 100).toFixed(4)} %; median ${ms.toFixed(2)} ms`);
    return { tol, ms };
  }
  console.log(`  ${label.padEnd(22)} no tolerance from 1e-3 to 1e-9 keeps both within ${WITHIN * 100} %  MISSED`);
  return null;
}

export function benchRide(spec: CheckedSpecification, data: RulesData): number {
  const input = new ModelGraph(MODELS, { spec, data, ride: true }).get('rideInput');
  void input.floorStatic; // the floor is solved once, outside the timing
  const ref = rideByOdex(input, CASE, 1e-10);
  console.log(`ride model, ${CASE} case 3 s, at equal accuracy (crew rise and peak wheel force within ${WITHIN * 100} % of odex at rel. tol. 1e-10, the loosest tolerance that keeps them):`);
  const core = loosest('core Dormand-Prince', (tol) => ours(input, tol), ref);
  const other = loosest(`odex (read every ${ODEX_INTERVAL * 1e3} ms)`, (tol) => odex(input, tol), ref);
  let missed = core && other ? 0 : 1;
  if (core && other) {
    const ratio = other.ms / core.ms;
    const met = ratio >= SPEEDUP_TARGET;
    console.log(`  odex / core ${ratio.toFixed(1)} times  target at least ${SPEEDUP_TARGET} times faster  ${met ? 'met' : 'MISSED'}`);
    missed += met ? 0 : 1;
  }
  let need = floorDampingNeeded(input);
  const tunerMs = median(() => (need = floorDampingNeeded(input)));
  const met = need.shortRuns <= SHORT_RUNS_TARGET;
  console.log(`floor-damping tuner: ${need.shortRuns} short drop runs and ${need.simulations - need.shortRuns} full runs, median ${tunerMs.toFixed(1)} ms, least ratio ${need.ratio === null ? 'none' : need.ratio.toFixed(4)}  target at most ${SHORT_RUNS_TARGET} short runs  ${met ? 'met' : 'MISSED'}`);
  return missed + (met ? 0 : 1);
}
