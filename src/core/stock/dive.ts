import { binsObjective, type Bin } from './bin.ts';
import type { CuttingProblem } from './cutting-problem.ts';
import { diveMoves, type DiveMove } from './dive-moves.ts';
import { roundUpBound } from './objective-step.ts';
import { patternBin } from './pattern.ts';
import type { PatternMaster } from './pattern-master.ts';

/** Most times one dive may depart from its best move (limited discrepancy search). */
export const MAX_DISCREPANCIES = 3;

export interface DiveOptions {
  /** Objective of the best plan so far: only a plan below it is worth finding. */
  best: number;
  /** Stop as soon as a plan this good is found (the rounded-up root bound). */
  target: number;
  /** Each complete plan met on the way (fixed pieces plus a rounded residual), for the caller to keep the best. */
  offer: (bins: Bin[]) => number;
}

/**
 * Diving with limited discrepancy search over column generation: fix
 * patterns the LP uses (diveMoves), re-price the master on what is left,
 * repeat; a node whose fixed stock plus rounded-up residual bound cannot
 * beat the best plan is left, and the search backs up to try the next move
 * (at most MAX_DISCREPANCIES departures from the first choice on one path).
 * New patterns keep arising for residual demands the root never prices. At
 * every node the fixed pieces plus the residual LP rounded down, completed
 * by first-fit, are offered as a plan (residual rounding). Each node draws
 * one dive node from the master's meter; the search ends when the meter
 * runs out, the target is met, or nothing is left to try.
 */
export function dive(p: CuttingProblem, master: PatternMaster, opts: DiveOptions): void {
  let best = opts.best;
  const done = () => best <= opts.target + 1e-9 || master.meter.exhausted('diveNodes');
  const visit = (fixed: Bin[], discrepancies: number, tabu: Set<string>): void => {
    master.meter.spend('diveNodes', 1);
    master.reduce(...residual(p, fixed));
    const lp = master.converge();
    if (!lp) return;
    const fixedCost = binsObjective(p, fixed);
    if (lp.bound !== null && fixedCost + roundUpBound(lp.bound, p.step) >= best - 1e-9) return;
    const x = Float64Array.from(master.values());
    const patterns = [...master.patterns];
    const floors = patterns.flatMap((pat, j) => Array.from({ length: Math.floor(x[j] + 1e-6) }, () => patternBin(pat)));
    best = Math.min(best, opts.offer([...fixed, ...floors]));
    const moves = diveMoves(patterns, x, tabu);
    const tried = new Set(tabu);
    for (let k = 0; k < moves.length && k <= discrepancies && !done(); k++) {
      visit([...fixed, ...binsOf(moves[k])], discrepancies - k, tried);
      if (moves[k].key !== null) tried.add(moves[k].key!);
    }
  };
  if (!done()) visit([], MAX_DISCREPANCIES, new Set());
}

const binsOf = (m: DiveMove): Bin[] => m.fixes.flatMap((f) => Array.from({ length: f.copies }, () => patternBin(f.pattern)));

/** Demand left and stock used once these bins are cut (demand never below zero). */
function residual(p: CuttingProblem, fixed: Bin[]): [number[], number[]] {
  const demand = p.types.map((t) => t.demand);
  const used = p.stocks.map(() => 0);
  for (const b of fixed) {
    used[b.stock]++;
    for (const i of b.items) demand[i]--;
  }
  return [demand.map((d) => Math.max(0, d)), used];
}
