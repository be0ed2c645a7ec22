import type { CuttingPattern, CuttingPlan } from '../core/stock/cutting-types.ts';
import { formatNumber, formatPercent } from '../core/format/number-format.ts';

// Plain-text forms of the cutting results, shared by the report model and the
// stock command so both say the same thing the same way.

const count = (n: number) => formatNumber(n, 'count');

export function sectionText(s: { width_mm: number; thickness_mm: number }): string {
  return `${formatNumber(s.width_mm, 'mm')} x ${formatNumber(s.thickness_mm, 'mm')}`;
}

/** Stock bought, shortest first: "1 x 2400 mm, 3 x 3000 mm". */
export function boughtText(plan: CuttingPlan): string {
  if (plan.bought.length === 0) return 'none';
  return [...plan.bought]
    .sort((a, b) => a.length_mm - b.length_mm)
    .map((b) => `${count(b.count)} x ${formatNumber(b.length_mm, 'mm')} mm`)
    .join(', ');
}

/**
 * The cuts in cutting order, a run of equal parts written once with its count.
 * Semicolons separate them, as part names may hold commas.
 */
export function cutsText(p: CuttingPattern): string {
  const runs: { label: string; length_mm: number; n: number }[] = [];
  for (const c of p.cuts) {
    const last = runs.at(-1);
    if (last && last.label === c.label && last.length_mm === c.length_mm) last.n += 1;
    else runs.push({ ...c, n: 1 });
  }
  return runs.map((r) => `${r.n > 1 ? `${count(r.n)} x ` : ''}${r.label} (${formatNumber(r.length_mm, 'mm')} mm)`).join('; ');
}

/** Said beside every table of groups, so "optimal" next to a gap does not read as a contradiction. */
export const BOUND_NOTE =
  'The LP bound and the gap to it are counted in what the plan minimises: cost, or stock pieces where no price is given. ' +
  'Stock is bought in whole pieces and the bound is fractional, so a plan proven optimal may still show a gap.';

/** What the plan's objective, bound and gap are counted in. */
export function minimisesText(plan: CuttingPlan): string {
  return plan.cost === null ? 'stock pieces' : 'cost';
}

export function gapText(plan: CuttingPlan): string {
  return formatPercent(plan.gap);
}

export function baselineText(plan: CuttingPlan): string {
  const { pieces_used, cost } = plan.baseline;
  const pieces = `${count(pieces_used)} ${pieces_used === 1 ? 'piece' : 'pieces'}`;
  return cost === null ? pieces : `${pieces}, cost ${formatNumber(cost, 'currency')}`;
}
