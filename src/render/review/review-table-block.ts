import { formatPercent, formatQuantity } from '../../core/format/number-format.ts';
import type { ReviewDecisive, ReviewFinding, ReviewRow } from '../../core/review/review-row.ts';
import type { Cell, TableBlock } from '../model/document.ts';
import { blank, left, numberCell, right, row, severityCell, textCell } from '../model/cells.ts';

// The review table as a model table: the HTML, the workbook and the CSV are
// all written from it, so they cannot disagree. A cell of several findings
// or inputs holds one a line.

/** The columns' labels, in order (the CSV header and the workbook read them from here). */
export const REVIEW_COLUMNS = {
  file: 'File',
  build: 'Build',
  verdict: 'Verdict',
  worst: 'Worst findings',
  decisive: 'Decisive inputs (value, break-even)',
  cost: 'Stock cost',
  mass: 'Total mass',
  perHorse: 'Load per horse',
  axle: 'Axle load',
  error: 'Not checked because',
  report: 'Report',
} as const;

/** The index of the report column, which the HTML and the workbook make a link. */
export const REPORT_COLUMN = Object.keys(REVIEW_COLUMNS).indexOf('report');

/** "FAIL member.axle: axle arm, 286 % of its limit". */
export function findingLine(f: ReviewFinding): string {
  const share = f.utilisation === null ? '' : `, ${formatPercent(f.utilisation)} of its limit`;
  return `${f.severity.toUpperCase()} ${f.rule}: ${f.subject_label}${share}`;
}

/** "box.axle_x_mm = 350 mm, break-even 412 mm (to warning)"; without one, why (the search's own words). */
export function decisiveLine(d: ReviewDecisive): string {
  const at = d.break_even === null ? (d.reason ?? 'no break-even found') : `break-even ${formatQuantity(d.break_even, d.unit)}${d.to_severity ? ` (to ${d.to_severity})` : ''}`;
  return `${d.input} = ${formatQuantity(d.value, d.unit)}, ${at}`;
}

function verdictCell(r: ReviewRow): Cell {
  if (r.verdict) return severityCell(r.verdict);
  return textCell(r.status, 'strong');
}

function decisiveText(r: ReviewRow): string {
  if (r.status !== 'checked') return '';
  if (r.decisive === null) return 'not searched';
  return r.decisive.length ? r.decisive.map(decisiveLine).join('\n') : 'none found';
}

export function reviewTableBlock(rows: readonly ReviewRow[]): TableBlock {
  return {
    kind: 'table',
    id: 'review',
    columns: [
      left(REVIEW_COLUMNS.file),
      left(REVIEW_COLUMNS.build),
      left(REVIEW_COLUMNS.verdict),
      left(REVIEW_COLUMNS.worst),
      left(REVIEW_COLUMNS.decisive),
      right(REVIEW_COLUMNS.cost, { unit: 'currency' }),
      right(REVIEW_COLUMNS.mass, { unit: 'kg' }),
      right(REVIEW_COLUMNS.perHorse, { unit: 'N' }),
      right(REVIEW_COLUMNS.axle, { unit: 'N' }),
      left(REVIEW_COLUMNS.error),
      left(REVIEW_COLUMNS.report),
    ],
    rows: rows.map((r) => {
      const checked = r.status === 'checked';
      const number = (v: number | null, unit: string, none?: string) => (checked ? numberCell(v, unit, none ? { none } : {}) : blank);
      return row([
        textCell(r.file),
        textCell(r.build ?? ''),
        verdictCell(r),
        textCell(r.worst.map(findingLine).join('\n')),
        textCell(decisiveText(r)),
        number(r.cost, 'currency', 'not priced'),
        number(r.total_mass_kg, 'kg'),
        number(r.load_per_horse_n, 'N'),
        number(r.axle_load_n, 'N'),
        textCell(r.error ?? ''),
        textCell(r.report ?? ''),
      ]);
    }),
    empty: 'No proposal was finished.',
  };
}
