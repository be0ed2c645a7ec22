// The yardstick: a fixed piece of plain arithmetic (a seeded sequence of
// numbers sorted, then summed through square roots), timed in the same run as
// the figures beside it. A figure divided by it travels between machines
// better than milliseconds do: a faster machine shrinks both.
import { performance } from 'node:perf_hooks';

const N = 200_000;

function work(): number {
  const xs = new Float64Array(N);
  let s = 12345;
  for (let i = 0; i < N; i++) {
    s = (s * 1103515245 + 12345) % 2147483648;
    xs[i] = s / 2147483648;
  }
  xs.sort();
  let sum = 0;
  for (let r = 0; r < 10; r++) for (let i = 0; i < N; i++) sum += Math.sqrt(xs[i] + r);
  return sum;
}

/** Median milliseconds of the yardstick over a few runs, after one to warm up. */
export function yardstickMs(runs = 7): number {
  work();
  const times = Array.from({ length: runs }, () => {
    const t0 = performance.now();
    work();
    return performance.now() - t0;
  });
  return times.sort((a, b) => a - b)[Math.floor(runs / 2)];
}
