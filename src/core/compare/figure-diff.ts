import type { CheckResult } from '../result/check-result.ts';
import type { FigureComparison } from './compare-result.ts';

const finite = (v: number | null): v is number => v !== null && Number.isFinite(v);

/**
 * Every figure of every build side by side, in the baseline's order (then any
 * the others add), with the difference and the ratio against the baseline.
 * A ratio against a baseline of zero, or a figure a build does not have, is
 * null (and the build's reason is given): never NaN or Infinity.
 */
export function compareFigures(results: readonly Pick<CheckResult, 'figures' | 'figures_not_applicable'>[]): FigureComparison[] {
  const names: string[] = [];
  for (const r of results) for (const n of [...Object.keys(r.figures), ...Object.keys(r.figures_not_applicable)]) if (!names.includes(n)) names.push(n);
  return names.map((name) => {
    const values = results.map((r) => (r.figures[name] && Number.isFinite(r.figures[name].value) ? r.figures[name].value : null));
    const not_applicable = results.map((r) => (r.figures[name] ? null : (r.figures_not_applicable[name] ?? 'the check of this build gives no such figure')));
    const base = values[0];
    const difference = values.map((v, i) => (i > 0 && finite(v) && finite(base) ? v - base : null));
    const ratio = values.map((v, i) => (i > 0 && finite(v) && finite(base) && base !== 0 ? v / base : null));
    const unit = results.map((r) => r.figures[name]?.unit).find((u) => u !== undefined) ?? '';
    return { name, unit, values, not_applicable, difference, ratio };
  });
}
