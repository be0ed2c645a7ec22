import type { ReviewTable } from '../../core/review/review-table.ts';
import type { Cell } from '../model/document.ts';
import { headerText } from '../model/cell-text.ts';
import { csvField } from '../ride-csv.ts';
import { reviewCautions } from './review-cautions.ts';
import { reviewTableBlock } from './review-table-block.ts';

// The review table as CSV for scripts and spreadsheets: the header row first
// (units in the headers), numbers raw, a severity as its word, a cell of
// several lines quoted whole. The cautions follow the table after an empty
// line, each a row of its own, so a reader that stops at the table's end
// still reads a clean table.

function csvCell(c: Cell): string {
  switch (c.kind) {
    case 'number':
    case 'percent':
      // Nine significant digits: more than any input carries; none where there is no value.
      return c.value === null || !Number.isFinite(c.value) ? '' : String(Number(c.value.toPrecision(9)));
    case 'severity':
      return c.severity;
    case 'dims':
      return c.values.join(' x ');
    case 'text':
      return csvField(c.text);
  }
}

export function reviewCsv(review: ReviewTable): string {
  const t = reviewTableBlock(review.rows);
  const lines = [t.columns.map((c) => csvField(headerText(c))).join(','), ...t.rows.map((r) => r.cells.map(csvCell).join(','))];
  return `${lines.join('\n')}\n\n${reviewCautions(review)
    .map((c) => `${csvField(`caution: ${c}`)}`)
    .join('\n')}\n`;
}
