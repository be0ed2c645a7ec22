// The stock planner on the OR-Library bin-packing sets u120 and u250 (read
// from ../shared/data/, never copied): bin packing is cutting stock with one
// stock length, no kerf and demand one per item. Targets (issue 4): the
// optimum on every u120 instance, on at least 18 of the 20 u250, never more
// than one bin above it, each solved in under 2 s on this 2-core machine.
// `npx tsx bench/stock-planner.ts --compare` runs every method.
import { existsSync, readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import { loadLpSolver } from '../src/node/load-lp-solver.ts';
import type { CuttingInstance, LpSolver } from '../src/core/stock/cutting-types.ts';
import { DEFAULT_METHOD, planCutting, type CuttingMethod } from '../src/core/stock/plan-cutting.ts';
import { planProblems } from '../src/core/stock/validate-plan.ts';

const DATA = new URL('../../shared/data/', import.meta.url);
const SETS = [
  { file: 'orlib-binpack1.txt', name: 'u120', mustMeet: 20 },
  { file: 'orlib-binpack2.txt', name: 'u250', mustMeet: 18 },
];
const TARGET_S = 2;
/** Per-instance budget handed to the planner, leaving room under the 2 s target. */
const TIME_LIMIT_S = 1.5;
// The optimum is ceil(sum / capacity) on every instance but these two.
// u250_07: 103, proved by an exact solve (../shared/data/README.md).
// u250_13: 103, not the 102 that README's rule gives: the Gilmore-Gomory LP
// bound is 102.037 (sum / capacity is 101.96), so no packing into 102 bins
// exists; checked with a dual certificate from a plain LP and a separate
// unbounded-knapsack DP, apart from the planner's own code. The set's header
// also says 103. A plan of 103 bins is found and validated below.
const ABOVE_BOUND: Record<string, number> = { u250_07: 103, u250_13: 103 };

interface BinPacking {
  name: string;
  capacity: number;
  sizes: number[];
  optimum: number;
}

export function readOrLibrary(file: string): BinPacking[] {
  const lines = readFileSync(new URL(file, DATA), 'utf8').split('\n').map((l) => l.trim()).filter(Boolean);
  const count = Number(lines[0]);
  const out: BinPacking[] = [];
  let at = 1;
  for (let k = 0; k < count; k++) {
    const name = lines[at++];
    const [capacity, n] = lines[at++].split(/\s+/).map(Number);
    const sizes = lines.slice(at, at + n).map(Number);
    at += n;
    const bound = Math.ceil(sizes.reduce((s, x) => s + x, 0) / capacity);
    out.push({ name, capacity, sizes, optimum: ABOVE_BOUND[name] ?? bound });
  }
  return out;
}

export function asInstance(b: BinPacking): CuttingInstance {
  const counts = new Map<number, number>();
  for (const s of b.sizes) counts.set(s, (counts.get(s) ?? 0) + 1);
  return { kerf_mm: 0, stock: [{ length_mm: b.capacity }], pieces: [...counts].map(([length_mm, quantity]) => ({ length_mm, quantity })) };
}

export interface SetSummary {
  set: string;
  method: CuttingMethod;
  instances: number;
  atOptimum: number;
  worstExcess: number;
  worstSeconds: number;
  meanSeconds: number;
  ffdAtOptimum: number;
  invalid: number;
  met: boolean;
}

/** Runs one set with one method; prints a row per instance and a summary line. */
export function benchSet(lp: LpSolver, set: (typeof SETS)[number], method: CuttingMethod): SetSummary {
  console.log(`  ${set.name} (${method}, time limit ${TIME_LIMIT_S} s)`);
  console.log(`    ${'instance'.padEnd(9)} optimum  ours  ffd   bound  proved  time s  valid`);
  const rows = readOrLibrary(set.file).map((b) => {
    const inst = asInstance(b);
    const t0 = performance.now();
    const plan = planCutting(inst, lp, { method, timeLimit_s: TIME_LIMIT_S });
    const seconds = (performance.now() - t0) / 1000;
    const problems = planProblems(inst, plan);
    // A reference below a proved bound would make the target unreachable.
    if (Math.ceil(plan.lower_bound - 1e-7) > b.optimum) problems.push(`the reference optimum ${b.optimum} is below the LP bound ${plan.lower_bound}`);
    console.log(`    ${b.name.padEnd(9)} ${String(b.optimum).padStart(7)} ${String(plan.pieces_used).padStart(5)} ${String(plan.baseline.pieces_used).padStart(4)} ${plan.lower_bound.toFixed(2).padStart(7)}  ${(plan.optimal ? 'yes' : 'no').padEnd(6)} ${seconds.toFixed(2).padStart(7)}  ${problems.length ? `NO: ${problems[0]}` : 'yes'}`);
    return { excess: plan.pieces_used - b.optimum, ffdExcess: plan.baseline.pieces_used - b.optimum, seconds, valid: problems.length === 0 };
  });
  const summary: SetSummary = {
    set: set.name,
    method,
    instances: rows.length,
    atOptimum: rows.filter((r) => r.excess <= 0).length,
    worstExcess: Math.max(...rows.map((r) => r.excess)),
    worstSeconds: Math.max(...rows.map((r) => r.seconds)),
    meanSeconds: rows.reduce((s, r) => s + r.seconds, 0) / rows.length,
    ffdAtOptimum: rows.filter((r) => r.ffdExcess <= 0).length,
    invalid: rows.filter((r) => !r.valid).length,
    met: false,
  };
  summary.met = summary.atOptimum >= set.mustMeet && summary.worstExcess <= 1 && summary.worstSeconds < TARGET_S && summary.invalid === 0;
  console.log(
    `    ${set.name}: optimum on ${summary.atOptimum}/${summary.instances} (target ${set.mustMeet}), worst +${Math.max(0, summary.worstExcess)} bin (target +1), ` +
      `time mean ${summary.meanSeconds.toFixed(2)} s, worst ${summary.worstSeconds.toFixed(2)} s (target < ${TARGET_S} s), invalid ${summary.invalid}; ` +
      `first-fit decreasing alone: optimum on ${summary.ffdAtOptimum}/${summary.instances}  ${summary.met ? 'met' : 'MISSED'}`,
  );
  return summary;
}

/**
 * Bin-packing instances of the same kind as u120/u250 (uniform integer sizes
 * 20 to 100, capacity 150; Falkenauer's class), drawn from a seeded generator
 * so every run sees the same ones. Their optimum is unknown: the reference is
 * the planner's own LP bound, rounded up.
 */
function generatedSet(name: string, items: number, count: number, seed: number): BinPacking[] {
  // A small linear congruential generator (Numerical Recipes' constants): enough for test data, and the same everywhere.
  let x = seed >>> 0;
  const next = () => (x = (Math.imul(x, 1664525) + 1013904223) >>> 0) / 2 ** 32;
  return Array.from({ length: count }, (_, k) => {
    const sizes = Array.from({ length: items }, () => 20 + Math.floor(next() * 81));
    return { name: `${name}_${String(k).padStart(2, '0')}`, capacity: 150, sizes, optimum: Math.ceil(sizes.reduce((s, v) => s + v, 0) / 150) };
  });
}

/** The generated sets, where the reference sets are absent: at most one bin above ceil(sum/capacity) on each is the target. */
function benchGenerated(lp: LpSolver): number {
  let missed = 0;
  for (const [name, items] of [['g120', 120], ['g250', 250]] as const) {
    const rows = generatedSet(name, items, 10, items).map((b) => {
      const inst = asInstance(b);
      const t0 = performance.now();
      const plan = planCutting(inst, lp, { timeLimit_s: TIME_LIMIT_S });
      const seconds = (performance.now() - t0) / 1000;
      return { b, plan, seconds, valid: planProblems(inst, plan).length === 0 };
    });
    const atBound = rows.filter((r) => r.plan.pieces_used <= Math.ceil(r.plan.lower_bound - 1e-7)).length;
    const worst = Math.max(...rows.map((r) => r.plan.pieces_used - r.b.optimum));
    const ffd = rows.filter((r) => r.plan.baseline.pieces_used <= Math.ceil(r.plan.lower_bound - 1e-7)).length;
    const worstS = Math.max(...rows.map((r) => r.seconds));
    const met = worst <= 1 && worstS < TARGET_S && rows.every((r) => r.valid);
    console.log(`  ${name} (10 generated, seed ${items}): at the rounded LP bound on ${atBound}/10, worst +${Math.max(0, worst)} bin over ceil(sum/capacity) (target +1), worst time ${worstS.toFixed(2)} s (target < ${TARGET_S} s); first-fit decreasing at the bound on ${ffd}/10  ${met ? 'met' : 'MISSED'}`);
    if (!met) missed++;
  }
  return missed;
}

/** The default method on both sets; returns how many sets missed their targets. */
export async function benchStockPlanner(methods: CuttingMethod[] = [DEFAULT_METHOD]): Promise<number> {
  const lp = await loadLpSolver();
  if (!SETS.every((set) => existsSync(new URL(set.file, DATA)))) {
    console.log(`  the reference sets are not in ${fileURLToPath(DATA)} (they are kept outside the repository); running seeded generated instances instead`);
    return benchGenerated(lp);
  }
  // The first solve in a process pays for compiling the WebAssembly code paths.
  planCutting(asInstance(readOrLibrary(SETS[0].file)[0]), lp, { timeLimit_s: TIME_LIMIT_S });
  let missed = 0;
  for (const method of methods) for (const set of SETS) if (!benchSet(lp, set, method).met) missed++;
  return missed;
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const compare = process.argv.includes('--compare');
  process.exitCode = (await benchStockPlanner(compare ? ['arc flow', 'column generation', 'first-fit decreasing'] : undefined)) ? 1 : 0;
}
