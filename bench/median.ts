import { performance } from 'node:perf_hooks';

/** The middle value (the upper middle of an even count). */
export const median = (xs: readonly number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Median milliseconds by `elapsed` (a stopwatch started before each call, read after it) of `runs` calls of f, after `warm` untimed ones. */
function medianBy(elapsed: () => () => number, f: () => unknown, runs: number, warm: number): number {
  for (let i = 0; i < warm; i++) f();
  const times = Array.from({ length: runs }, () => {
    const read = elapsed();
    f();
    return read();
  });
  return median(times);
}

const wall = () => {
  const t0 = performance.now();
  return () => performance.now() - t0;
};

const cpu = () => {
  const t0 = process.cpuUsage();
  return () => {
    const d = process.cpuUsage(t0);
    return (d.user + d.system) / 1e3;
  };
};

/** Median milliseconds of `runs` calls of f, after `warm` untimed ones. */
export const medianMs = (f: () => unknown, runs: number, warm = 2) => medianBy(wall, f, runs, warm);

/** Median CPU milliseconds (user and system, this process) of `runs` calls of f: steadier than the clock on a loaded machine. */
export const medianCpuMs = (f: () => unknown, runs: number, warm = 2) => medianBy(cpu, f, runs, warm);

/** "met" or "MISSED" after a target, as every bench line ends. */
export const verdict = (ok: boolean) => (ok ? 'met' : 'MISSED');
