import { SHORT_CAUTION } from '../src/core/cautions.ts';
import type { ReviewTable } from '../src/core/review/review-table.ts';

/** The terminal summary of a batch: a line per proposal (its verdict, or why it was not checked) and where the table went. */
export function reviewSummary(table: ReviewTable, written: string[]): string {
  const width = Math.max(0, ...table.rows.map((r) => r.name.length));
  const lines = table.rows.map((r) => {
    const word = (r.verdict ?? r.status).toUpperCase().padEnd(8);
    const worst = r.worst[0] && r.worst[0].severity !== 'pass' ? `; worst: ${r.worst[0].rule}, ${r.worst[0].subject_label}` : '';
    return `  ${word} ${r.name.padEnd(width)}  ${r.error ?? `${r.build}${worst}`}`;
  });
  return [
    `review of ${table.rows.length} proposal${table.rows.length === 1 ? '' : 's'}${table.stopped ? ` (stopped: ${table.not_checked.length} not checked)` : ''}`,
    ...lines,
    'written:',
    ...written.map((w) => `  ${w}`),
    `  and each proposal's outputs in the folder of its name beside the table`,
    SHORT_CAUTION,
  ].join('\n') + '\n';
}
