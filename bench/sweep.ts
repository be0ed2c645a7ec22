// The sweep's benchmark: whole sweeps of specs/demo-two-crew.yaml, each
// `axletree sweep` run as one process as a user runs it (the bundle's worker
// threads started, the points, the envelope's edges, the outputs written),
// timed by the clock and by the CPU time of the process (all its threads,
// read at its exit, cpu-at-exit.mjs): the machine is shared, so the CPU time over the
// threads is the time the sweep takes on two idle cores, and the clock is
// printed beside it. Targets: a statics-only sweep of 10,000 variants in
// under 10 s on two threads; with the ride model, at least 30 variants a
// second per core. Each is measured on a sweep where most points reuse the
// design point's floor (the axle and the horses' mass: the floor is solved
// once per axle position) and on the sweep the lead named, axle and crew
// position, where every point moves the crew on the floor and re-solves it
// (timed on two smaller grids: the larger one's time, plus the cost of each
// point between the two, the threads warm, for the points it lacks, gives
// the 10,000). Returns the count of missed targets.
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse } from 'yaml';
import { defaultRulesDir, loadRulesData } from '../src/node/load-rules-data.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { parseVaries } from '../src/core/sweep/sweep-axis.ts';
import { sweepPoints } from '../src/core/sweep/sweep-points.ts';
import { valueAtKey } from '../src/core/sweep/spec-diff.ts';
import { binArgs, ranBundle, timeProcess } from './bin-command.ts';
import { verdict } from './median.ts';

const DEMO = fileURLToPath(new URL('../specs/demo-two-crew.yaml', import.meta.url));
const CPU_AT_EXIT = fileURLToPath(new URL('./cpu-at-exit.mjs', import.meta.url));
const THREADS = 2;
const STATICS_TARGET_S = 10;
const STATICS_POINTS = 10_000;
const RIDE_TARGET_PER_CORE = 30;

interface Timed {
  points: number;
  wallS: number;
  cpuS: number;
}

/** The points of a grid sweep over `varies` (the count the command checks). */
function gridPoints(varies: string[]): number {
  const p = prepareSpec(parse(readFileSync(DEMO, 'utf8')), loadRulesData(defaultRulesDir()));
  if (!p.ok) throw new Error('the demo does not validate');
  const axes = parseVaries(varies, p.spec);
  if (!axes.ok) throw new Error(axes.message);
  const design = axes.value.map((a) => valueAtKey(p.spec, a.steps) as number);
  return sweepPoints({ axes: axes.value, mode: { kind: 'grid' }, design }).length;
}

/** One whole sweep as a user runs it: `axletree sweep` as one process (its outputs written to a scratch folder). */
function timeSweep(varies: string[], ride: boolean): Timed {
  const cwd = mkdtempSync(join(tmpdir(), 'axletree-sweep-bench-'));
  try {
    const args = ['--import', CPU_AT_EXIT, ...binArgs(), 'sweep', DEMO, ...varies.flatMap((v) => ['--vary', v]), ...(ride ? [] : ['--statics']), '--jobs', String(THREADS), '--out', 'sweep'];
    const r = timeProcess(args, cwd);
    // Read at the process's exit on any system (GNU time, where timeProcess finds it, gives the same).
    const cpu = /^cpu-us (\d+)$/m.exec(r.err);
    if (!cpu) throw new Error('the sweep did not report its CPU time');
    return { points: gridPoints(varies), wallS: r.ms / 1000, cpuS: Number(cpu[1]) / 1e6 };
  } finally {
    rmSync(cwd, { recursive: true, force: true });
  }
}

const line = (label: string, t: Timed, extra: string) => console.log(`  ${label}: ${t.points} points, ${t.wallS.toFixed(1)} s by the clock, ${t.cpuS.toFixed(1)} s CPU; ${extra}`);

export function benchSweep(): number {
  let missed = 0;
  const bundled = ranBundle(timeProcess([...binArgs(), '--version'], process.cwd()).err);
  const how = bundled ? 'the built bundle, dist/' : 'from the TypeScript source: dist/ is missing or stale, `npm run build` first';
  console.log(`sweep (specs/demo-two-crew.yaml; axletree sweep as one whole process, ${how}; ${THREADS} worker threads; its CPU time over ${THREADS} is the time on ${THREADS} idle cores):`);

  const reuse = timeSweep(['axle.x_mm=150..350:100', 'team.horse_mass_kg=300..600:100'], false);
  const reuseS = reuse.cpuS / THREADS;
  line('statics, axle position x horse mass, 100 x 100', reuse, `${reuseS.toFixed(1)} s on ${THREADS} cores (target under ${STATICS_TARGET_S} s) ${verdict(reuseS < STATICS_TARGET_S)}`);
  missed += reuseS < STATICS_TARGET_S ? 0 : 1;

  // What a sweep costs whatever its size (the threads started and their modules loaded, the design point traced), measured
  // as a sweep of one point; a large sweep's time is that once and each point's own cost over and over.
  const fixed = { statics: timeSweep(['axle.x_mm=200..200:1', 'crew[0].x_mm=260..260:1'], false), ride: timeSweep(['axle.x_mm=200..200:1', 'crew[0].x_mm=260..260:1'], true) };
  const perPoint = (t: Timed, ride: boolean) => Math.max(0, t.cpuS - fixed[ride ? 'ride' : 'statics'].cpuS) / (t.points - 1);
  console.log(`  a sweep of one point (threads started, design point traced): ${fixed.statics.cpuS.toFixed(1)} s CPU statics only, ${fixed.ride.cpuS.toFixed(1)} s with the ride model`);

  // Past the one-point sweep, a point's cost still holds each thread's warm-up (its first points run cold), which a
  // large sweep spreads thinner: the sweep of 10,000 is reckoned from two sizes, the larger one's time and the cost of
  // each point between them (the threads warm) for the points it lacks.
  const moved = timeSweep(['axle.x_mm=150..350:10', 'crew[0].x_mm=200..450:10'], false);
  const larger = timeSweep(['axle.x_mm=150..350:20', 'crew[0].x_mm=200..450:20'], false);
  const warm = Math.max(0, larger.cpuS - moved.cpuS) / (larger.points - moved.points);
  const movedS = (larger.cpuS + warm * (STATICS_POINTS - larger.points)) / THREADS;
  line('statics, axle position x crew position, 10 x 10 (every point re-solves the floor)', moved, `${(perPoint(moved, false) * 1000).toFixed(0)} ms CPU a point past the one-point sweep`);
  line(
    'the same, 20 x 20',
    larger,
    `${(warm * 1000).toFixed(0)} ms CPU a point from the 10 x 10 to it; ${STATICS_POINTS} points (this sweep and the rest at that cost) would take ${movedS.toFixed(0)} s on ${THREADS} cores (target under ${STATICS_TARGET_S} s) ${verdict(movedS < STATICS_TARGET_S)}`,
  );
  missed += movedS < STATICS_TARGET_S ? 0 : 1;

  for (const [label, varies] of [
    ['axle position x horse mass, 10 x 40', ['axle.x_mm=150..350:10', 'team.horse_mass_kg=300..600:40']],
    ['axle position x crew position, 6 x 6 (every point re-solves the floor and the ride)', ['axle.x_mm=150..350:6', 'crew[0].x_mm=200..450:6']],
  ] as const) {
    const t = timeSweep([...varies], true);
    const perCore = 1 / perPoint(t, true);
    line(`with the ride model, ${label}`, t, `${(t.points / t.cpuS).toFixed(1)} variants a second per core for the whole run, ${perCore.toFixed(1)} past the one-point sweep (target at least ${RIDE_TARGET_PER_CORE}) ${verdict(perCore >= RIDE_TARGET_PER_CORE)}`);
    missed += perCore >= RIDE_TARGET_PER_CORE ? 0 : 1;
  }
  return missed;
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const missed = benchSweep();
  console.log(`${missed ? `${missed} sweep target${missed > 1 ? 's' : ''} MISSED` : 'every sweep target met'}`);
}
