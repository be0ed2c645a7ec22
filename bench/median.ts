import { performance } from 'node:perf_hooks';

/** Median milliseconds of `runs` calls of f, after `warm` untimed ones. */
export function medianMs(f: () => unknown, runs: number, warm = 2): number {
  for (let i = 0; i < warm; i++) f();
  const times = Array.from({ length: runs }, () => {
    const t0 = performance.now();
    f();
    return performance.now() - t0;
  });
  return times.sort((a, b) => a - b)[Math.floor(runs / 2)];
}

/** "met" or "MISSED" after a target, as every bench line ends. */
export const verdict = (ok: boolean) => (ok ? 'met' : 'MISSED');
