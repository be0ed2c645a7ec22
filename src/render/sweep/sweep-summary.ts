import { formatQuantity } from '../../core/format/number-format.ts';
import type { SweepResult } from '../../core/sweep/sweep-result.ts';
import { outcomeWords } from './sweep-document.ts';

// What the sweep command prints: the count of points by verdict, the design
// point, each value's envelope and robust range, and where the outputs went.

export function sweepSummary(r: SweepResult, written: readonly string[]): string {
  const verdicts = ['pass', 'advice', 'warning', 'fail', 'error', 'refused'] as const;
  const counts = verdicts.map((v) => [v, r.points.filter((p) => p.verdict === v).length] as const).filter(([, n]) => n > 0);
  const lines = [
    `sweep of ${r.spec_name}: ${r.points.length} points (${r.mode.kind === 'grid' ? 'grid' : `Latin hypercube, seed ${r.mode.seed}`}${r.statics ? ', statics only: the ride model off' : ''})${r.complete ? '' : ', stopped before the end'}: ${counts.map(([v, n]) => `${n} ${v}`).join(', ') || 'none finished'}`,
  ];
  if (r.design) lines.push(`design point: ${outcomeWords(r.design)}`);
  for (const e of r.envelope ?? []) {
    const spans = e.intervals.map((i) => `${formatQuantity(i.low, e.unit)} to ${formatQuantity(i.high, e.unit)}${i.low_edge || i.high_edge ? '' : ' (the whole range)'}`);
    lines.push(`envelope of ${e.path} (the others at the design point): ${spans.length ? `passes ${spans.join(' and ')}` : 'no value passes'}`);
  }
  for (const g of r.robust ?? []) {
    const spans = g.intervals.map((i) => `${formatQuantity(i.low, g.unit)} to ${formatQuantity(i.high, g.unit)}`);
    lines.push(`robust range of ${g.path} (passes with any of the others): ${spans.length ? spans.join(' and ') : 'none'}`);
  }
  for (const n of r.notes) lines.push(n);
  const dir = written.length ? written[0].slice(0, written[0].lastIndexOf('/') + 1) : '';
  lines.push(`wrote ${dir} (${written.map((w) => w.slice(w.lastIndexOf('/') + 1)).join(', ')})`);
  return `${lines.join('\n')}\n`;
}
