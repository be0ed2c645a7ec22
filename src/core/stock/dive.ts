import { binsObjective, type Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import { roundUpBound } from './objective-step.ts';
import { patternBin } from './pattern.ts';
import type { PatternMaster } from './pattern-master.ts';

/** Rounds of fixing and re-pricing before a dive hands back what it fixed. */
export const MAX_DIVE_ROUNDS = 1000;

/**
 * Diving: fix every pattern the LP uses a whole number of times (or, if none,
 * one copy of the most used), re-price the master on what is left, repeat.
 * New patterns keep arising for the residual demand, which a MIP over the
 * root's patterns alone cannot see. A dive that can no longer beat `best` is
 * abandoned (null); one stopped by the clock returns what it fixed.
 */
export function dive(p: CuttingProblem, master: PatternMaster, until: number, best: number): Bin[] | null {
  const fixed: Bin[] = [];
  const demand = [...master.demand];
  const used = p.stocks.map(() => 0);
  // Each round fixes at least one stock piece; the clock or this limit stops a long dive, first-fit finishing it.
  for (let round = 0; round < MAX_DIVE_ROUNDS; round++) {
    const lp = master.converge(until);
    if (!lp) return fixed;
    if (lp.bound !== null && binsObjective(p, fixed) + roundUpBound(lp.bound, p.step) >= best - 1e-9) return null;
    const x = master.values();
    let took = false;
    let most = -1;
    x.forEach((v, j) => {
      if (most < 0 || v > x[most]) most = j;
      const n = Math.floor(v + 1e-6);
      for (let c = 0; c < n; c++) fixed.push(patternBin(master.patterns[j]));
      if (n > 0) took = true;
    });
    if (!took) {
      if (most < 0 || x[most] < 1e-9) return fixed;
      fixed.push(patternBin(master.patterns[most]));
    }
    demand.fill(0);
    p.types.forEach((t, i) => (demand[i] = t.demand));
    used.fill(0);
    for (const b of fixed) {
      used[b.stock]++;
      for (const i of b.items) demand[i]--;
    }
    for (let i = 0; i < demand.length; i++) demand[i] = Math.max(0, demand[i]);
    if (demand.every((d) => d === 0) || master.lp.now() > until) return fixed;
    master.reduce(demand, used);
  }
  return fixed;
}
