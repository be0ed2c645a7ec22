// The ride model's benchmark: one 3-second rough-ground ridge case on the central-axle
// demo against a target time after warm-up, and its accuracy against odex at
// relative tolerance 1e-10 on the crew's rise. Returns the count of missed targets.
import { performance } from 'node:perf_hooks';
import type { RulesData } from '../src/core/data/rules-data.ts';
import { ModelGraph } from '../src/core/pipeline/model-graph.ts';
import { MODELS } from '../src/core/pipeline/models.ts';
import { rideCaseOf } from '../src/core/ride/ride-model.ts';
import type { CheckedSpecification } from '../src/core/spec/spec.types.ts';
import { rideByOdex } from '../src/node/ride-odex.ts';

const TARGET_MS = 20;
const TOLERANCE_MM = 0.05;
const WARM = 5;
const RUNS = 21;

export function benchRide(spec: CheckedSpecification, data: RulesData): number {
  const input = new ModelGraph(MODELS, { spec, data, ride: true }).get('rideInput');
  void input.floorStatic; // the floor is solved once, outside the timing
  for (let i = 0; i < WARM; i++) rideCaseOf(input, 'rough-ridge');
  const times: number[] = [];
  let result = rideCaseOf(input, 'rough-ridge');
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    result = rideCaseOf(input, 'rough-ridge');
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const ours = times[Math.floor(RUNS / 2)];
  rideByOdex(input, 'rough-ridge', 1e-10); // warm-up
  const t0 = performance.now();
  const ref = rideByOdex(input, 'rough-ridge', 1e-10);
  const odexMs = performance.now() - t0;
  const errorOf = (rise: readonly number[]) => Math.max(...rise.map((r, i) => Math.abs(r - ref.rise_mm[i])));
  const worst = errorOf(result.crew.map((c) => c.rise_mm));
  const fast = ours < TARGET_MS, close = worst < TOLERANCE_MM;
  console.log(`ride model, rough-ground ridge case 3 s: median ${ours.toFixed(2)} ms (${result.steps} RK4 steps)  target < ${TARGET_MS} ms  ${fast ? 'met' : 'MISSED'}`);
  console.log(`  reference: odex at rel. tol. 1e-10, ${odexMs.toFixed(1)} ms (${ref.nEval} evaluations)`);
  console.log(`  crew rise: ${result.crew.map((c, i) => `${c.role} ${c.rise_mm.toFixed(4)} / ${ref.rise_mm[i].toFixed(4)} mm`).join(', ')}; worst difference ${worst.toFixed(4)} mm  target < ${TOLERANCE_MM} mm  ${close ? 'met' : 'MISSED'}`);
  // At equal accuracy: odex at the loosest tolerance whose crew rise is as close to the reference as RK4's.
  const matched = [1e-3, 1e-4, 1e-5, 1e-6, 1e-7, 1e-8, 1e-9].map((tol) => {
    const run = rideByOdex(input, 'rough-ridge', tol);
    return { tol, error: errorOf(run.rise_mm) };
  }).find((x) => x.error <= worst);
  if (matched) {
    const times: number[] = [];
    for (let i = 0; i < 5; i++) {
      const t = performance.now();
      rideByOdex(input, 'rough-ridge', matched.tol);
      times.push(performance.now() - t);
    }
    const odexMatched = [...times].sort((a, b) => a - b)[2];
    console.log(`  at equal accuracy (odex at rel. tol. ${matched.tol}, crew rise within ${matched.error.toFixed(4)} mm of the reference): odex ${odexMatched.toFixed(1)} ms, ${(odexMatched / ours).toFixed(1)} times the core's RK4`);
  } else console.log('  at equal accuracy: no odex tolerance from 1e-3 to 1e-9 came as close to the reference as RK4');
  return (fast ? 0 : 1) + (close ? 0 : 1);
}
