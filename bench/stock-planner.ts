// The stock planner on bin-packing sets: the OR-Library u120 and u250 (where
// ../shared/data/ is present) and seeded generated sets of 500 and 1000 items
// of the same class. Targets (the speed issue): the optimum (the length bound
// ceil(sum / 150) for the generated sets) on every instance, each in under
// 2 s of process CPU time. The planner's limits are counted in work, so its
// plans do not depend on this machine's load; only the CPU times do.
// First-fit decreasing runs on the same instances as the in-run reference.
// `npx tsx bench/stock-planner.ts --rows` also prints a row per instance.
import { fileURLToPath } from 'node:url';
import { asInstance, type BinPacking } from './bin-packing.ts';
import { generatedBinPacking } from './generated-bin-packing.ts';
import { hasOrLibrary, readOrLibrary, DATA } from './or-library.ts';
import { loadLpSolver } from '../src/node/load-lp-solver.ts';
import type { CuttingPlan, LpSolver } from '../src/core/stock/cutting-types.ts';
import { planCutting } from '../src/core/stock/plan-cutting.ts';
import { planProblems } from '../src/core/stock/validate-plan.ts';

const TARGET_CPU_S = 2;
// The modified integer round-up property (Scheithauer and Terno, European
// Journal of Operational Research 84 (1995)): no known instance needs more
// than one bin above the rounded-up LP bound.
const TARGET_LP_GAP = 1;

interface Row {
  b: BinPacking;
  plan: CuttingPlan;
  cpu_s: number;
  ffd: number;
  ffdCpu_s: number;
  problems: string[];
}

/** Process CPU time (user + system) of one call, in seconds. */
function cpu<T>(f: () => T): { value: T; s: number } {
  const t0 = process.cpuUsage();
  const value = f();
  const t = process.cpuUsage(t0);
  return { value, s: (t.user + t.system) / 1e6 };
}

function run(lp: LpSolver, b: BinPacking): Row {
  const inst = asInstance(b);
  const ours = cpu(() => planCutting(inst, lp));
  const ffd = cpu(() => planCutting(inst, undefined));
  const problems = planProblems(inst, ours.value);
  // A target below a proved bound would be unreachable: then the bound is the target.
  if ((ours.value.lp_bound ?? 0) > b.target) problems.push(`the target ${b.target} is below the LP bound ${ours.value.lp_bound}`);
  return { b, plan: ours.value, cpu_s: ours.s, ffd: ffd.value.pieces_used, ffdCpu_s: ffd.s, problems };
}

const verdict = (ok: boolean) => (ok ? 'met' : 'MISSED');
const seconds = (s: number) => `${s.toFixed(2)} s`;

/** One set: a summary line and the first-fit reference; returns how many targets it missed. */
function benchSet(lp: LpSolver, name: string, set: BinPacking[], rows: boolean): number {
  const results = set.map((b) => run(lp, b));
  const n = results.length;
  const atTarget = results.filter((r) => r.plan.pieces_used <= r.b.target && r.problems.length === 0).length;
  const maxCpu = Math.max(...results.map((r) => r.cpu_s));
  const meanCpu = results.reduce((s, r) => s + r.cpu_s, 0) / n;
  const maxGap = Math.max(...results.map((r) => r.plan.lp_gap ?? Infinity));
  const ffdAt = results.filter((r) => r.ffd <= r.b.target).length;
  const ffdMean = results.reduce((s, r) => s + r.ffdCpu_s, 0) / n;
  const invalid = results.filter((r) => r.problems.length > 0);
  if (rows || atTarget < n)
    for (const r of results)
      console.log(`    ${r.b.name}: target ${r.b.target}, planned ${r.plan.pieces_used}, LP bound ${r.plan.lp_bound} (${r.plan.lp_value}), first-fit ${r.ffd}, CPU ${seconds(r.cpu_s)}, ${r.plan.method}${r.problems.length ? `; INVALID: ${r.problems[0]}` : ''}`);
  const checks = [atTarget === n, maxCpu < TARGET_CPU_S, maxGap <= TARGET_LP_GAP];
  console.log(
    `  ${name}, ${n} instances: at the target on ${atTarget}/${n} (target ${n}/${n}) ${verdict(checks[0])}; ` +
      `CPU per instance max ${seconds(maxCpu)} (target < ${seconds(TARGET_CPU_S)}) ${verdict(checks[1])}, mean ${seconds(meanCpu)}; ` +
      `largest LP gap ${maxGap} (target <= ${TARGET_LP_GAP}) ${verdict(checks[2])}${invalid.length ? `; ${invalid.length} INVALID plans` : ''}`,
  );
  console.log(`    first-fit decreasing, same instances: at the target on ${ffdAt}/${n}; planner CPU / first-fit CPU ${(meanCpu / ffdMean).toFixed(0)} (means)`);
  return checks.filter((ok) => !ok).length + (invalid.length > 0 ? 1 : 0);
}

/** Every set; returns how many targets were missed. */
export async function benchStockPlanner(rows = false): Promise<number> {
  const lp = await loadLpSolver();
  // The first solve in a process pays for compiling the WebAssembly code paths.
  planCutting(asInstance(generatedBinPacking('warm', 120, 1, 1)[0]), lp);
  let missed = 0;
  for (const [file, name] of [
    ['orlib-binpack1.txt', 'u120 (OR-Library, Falkenauer 1996; target the optimum)'],
    ['orlib-binpack2.txt', 'u250 (OR-Library, Falkenauer 1996; target the optimum)'],
  ]) {
    if (hasOrLibrary(file)) missed += benchSet(lp, name, readOrLibrary(file), rows);
    else console.log(`  ${name}: ${file} is not in ${fileURLToPath(DATA)} (kept outside the repository); set skipped`);
  }
  missed += benchSet(lp, 'g500 (generated, seed 500; target ceil(sum/150))', generatedBinPacking('g500', 500, 20, 500), rows);
  missed += benchSet(lp, 'g1000 (generated, seed 1000; target ceil(sum/150))', generatedBinPacking('g1000', 1000, 20, 1000), rows);
  return missed;
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  process.exitCode = (await benchStockPlanner(process.argv.includes('--rows'))) ? 1 : 0;
}
