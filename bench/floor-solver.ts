// The strap-floor solver on each demo specification, standing and at a bump:
// build the net, solve it, read the results. Target: well under 100 ms each.
import { performance } from 'node:perf_hooks';
import type { RulesData } from '../src/core/data/rules-data.ts';
import { floorModel } from '../src/core/model/cable-net/floor-model.ts';
import type { CheckedSpecification } from '../src/core/spec/spec.types.ts';

export const FLOOR_TARGET_MS = 100;
const RUNS = 10;

/** Prints one line per case; returns how many missed the target. */
export function benchFloor(name: string, spec: CheckedSpecification, data: RulesData): number {
  let missed = 0;
  for (const factor of [1, 2]) {
    const times: number[] = [];
    let last = floorModel(spec, data, { value: factor, source: 'bench' });
    for (let i = 0; i < RUNS; i++) {
      const t0 = performance.now();
      last = floorModel(spec, data, { value: factor, source: 'bench' });
      times.push(performance.now() - t0);
    }
    times.sort((a, b) => a - b);
    const median = times[Math.floor(RUNS / 2)];
    const ok = median < FLOOR_TARGET_MS && last.converged;
    if (!ok) missed++;
    console.log(`  floor ×${factor} ${name.padEnd(22)} median ${median.toFixed(1)} ms (worst ${times[RUNS - 1].toFixed(1)}), ${last.nodes} nodes, ${last.iterations} steps, ${last.converged ? 'converged' : 'NOT CONVERGED'}  target < ${FLOOR_TARGET_MS} ms  ${ok ? 'met' : 'MISSED'}`);
  }
  return missed;
}
