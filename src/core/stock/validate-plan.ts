import type { CuttingInstance, CuttingPlan } from './cutting-types.ts';

const EPS = 1e-6;

/**
 * Everything wrong with a plan for an instance, in words; empty when it is
 * sound: each pattern fits its stock with its kerfs, every piece is cut
 * exactly its quantity, no stock is used beyond what is available, and the
 * totals agree with the patterns.
 */
export function planProblems(instance: CuttingInstance, plan: CuttingPlan): string[] {
  const problems: string[] = [];
  const kerf = instance.kerf_mm;
  const stock = new Map(instance.stock.map((s) => [s.length_mm, s]));
  const need = new Map<string, number>();
  for (const p of instance.pieces) {
    const key = pieceKey(p.length_mm, p.label ?? `${p.length_mm} mm`);
    need.set(key, (need.get(key) ?? 0) + p.quantity);
  }
  const used = new Map<number, number>();
  let count = 0;
  let bought_mm = 0;
  let cut_mm = 0;
  plan.patterns.forEach((pat, k) => {
    const at = `pattern ${k + 1} (${pat.stock_length_mm} mm)`;
    if (!stock.has(pat.stock_length_mm)) problems.push(`${at}: no stock of that length is listed`);
    if (!Number.isInteger(pat.count) || pat.count < 1) problems.push(`${at}: count ${pat.count} is not a whole number of at least 1`);
    const length = pat.cuts.reduce((s, c) => s + c.length_mm, 0);
    const withKerfs = length + kerf * Math.max(0, pat.cuts.length - 1);
    if (withKerfs > pat.stock_length_mm + EPS) problems.push(`${at}: cuts of ${withKerfs} mm with kerfs exceed the stock`);
    const offcut = Math.max(0, pat.stock_length_mm - length - kerf * pat.cuts.length);
    if (Math.abs(offcut - pat.offcut_mm) > EPS) problems.push(`${at}: offcut ${pat.offcut_mm} mm, should be ${offcut} mm`);
    for (let j = 1; j < pat.cuts.length; j++) if (pat.cuts[j].length_mm > pat.cuts[j - 1].length_mm) problems.push(`${at}: cuts not in cutting order (longest first)`);
    for (const c of pat.cuts) {
      const key = pieceKey(c.length_mm, c.label);
      if (!need.has(key)) problems.push(`${at}: cuts "${c.label}" of ${c.length_mm} mm, which the instance does not ask for`);
      need.set(key, (need.get(key) ?? 0) - pat.count);
    }
    used.set(pat.stock_length_mm, (used.get(pat.stock_length_mm) ?? 0) + pat.count);
    count += pat.count;
    bought_mm += pat.stock_length_mm * pat.count;
    cut_mm += length * pat.count;
  });
  for (const [key, left] of need) if (left !== 0) problems.push(`${key}: cut ${left > 0 ? `${left} too few` : `${-left} too many`}`);
  for (const [length, n] of used) {
    const s = stock.get(length);
    if (s?.available !== undefined && n > s.available) problems.push(`stock ${length} mm: ${n} used, only ${s.available} available`);
  }
  if (plan.pieces_used !== count) problems.push(`pieces_used ${plan.pieces_used}, but the patterns use ${count}`);
  for (const b of plan.bought) if (used.get(b.length_mm) !== b.count) problems.push(`bought ${b.count} × ${b.length_mm} mm, but the patterns use ${used.get(b.length_mm) ?? 0}`);
  if (plan.bought.reduce((s, b) => s + b.count, 0) !== count) problems.push('bought does not list every stock piece used');
  const priced = instance.stock.every((s) => s.cost !== undefined);
  const cost = [...used].reduce((s, [length, n]) => s + (stock.get(length)?.cost ?? 0) * n, 0);
  if (priced ? plan.cost === null || Math.abs(plan.cost - cost) > EPS * Math.max(1, cost) : plan.cost !== null) problems.push(`cost ${plan.cost}, but the patterns cost ${priced ? cost : 'nothing (no prices given)'}`);
  if (Math.abs(plan.waste_mm - (bought_mm - cut_mm)) > EPS * Math.max(1, bought_mm)) problems.push(`waste ${plan.waste_mm} mm, should be ${bought_mm - cut_mm} mm`);
  const objective = priced ? cost : count;
  if (plan.lower_bound > objective + EPS * Math.max(1, objective)) problems.push(`lower bound ${plan.lower_bound} is above the plan's ${objective}`);
  return problems;
}

const pieceKey = (length_mm: number, label: string) => `piece "${label}" ${length_mm} mm`;
