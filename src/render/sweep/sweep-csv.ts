import type { SweepResult } from '../../core/sweep/sweep-result.ts';
import { SHORT_CAUTION } from '../../core/cautions.ts';
import { csvField } from '../ride-csv.ts';

// sweep.csv: one row per point of the sweep, the varied values first (the
// unit in each header), then the verdict, the worst utilisation and the
// finding it is of, the chosen figures, and the reason a point was refused.
// The caution goes first, on a comment line of its own (# ...), as every
// output carries it; a reader that takes comments skips it.

const number = (v: number | null): string => (v === null || !Number.isFinite(v) ? '' : String(Number(v.toPrecision(12))));
const titled = (name: string, unit: string) => (unit && unit !== '1' ? `${name} (${unit})` : name);

export function sweepCsv(r: SweepResult): string {
  const header = ['point', ...r.varied.map((v) => titled(v.path, v.unit)), 'verdict', 'worst utilisation', 'worst rule', 'worst subject', ...r.figures.map((f) => titled(f.name, f.unit)), 'reason'];
  const rows = r.points.map((p) =>
    [String(p.index), ...p.values.map(number), p.verdict, number(p.worst_utilisation), p.worst?.rule ?? '', p.worst?.subject ?? '', ...p.figures.map(number), p.reason ?? ''].map(csvField).join(','),
  );
  return [`# ${SHORT_CAUTION}`, header.map(csvField).join(','), ...rows].join('\n') + '\n';
}
