import type { CheckResult } from '../../../core/result/check-result.ts';
import type { SpecEntry } from '../../../core/spec/spec-entry.ts';
import { specValueText } from '../../spec-value.ts';
import type { Cell, Section } from '../document.ts';
import { blank, left, numberCell, right, row, textCell } from '../cells.ts';
import { section } from '../section-titles.ts';

/** The most significant figures the formatter writes: the specification's own values, echoed back. */
const ECHO_SIG = 4;

function valueCell(e: SpecEntry): Cell {
  // Finite numbers stay numbers (the workbook can reuse them); anything else is shown as text.
  return typeof e.value === 'number' && Number.isFinite(e.value) ? numberCell(e.value, e.unit, { sig: ECHO_SIG }) : textCell(specValueText(e.value));
}

/** Every value the check used, defaults marked and set apart. */
export function specSection(result: CheckResult): Section {
  const rows = result.spec_as_checked.map((e) =>
    row([textCell(e.path), valueCell(e), textCell(e.unit), e.defaulted ? textCell('default', 'em') : blank, textCell(e.note ?? '')], e.defaulted ? { muted: true } : {}),
  );
  const columns = [left('Path'), right('Value', { bare: true }), left('Unit'), left('Default'), left('Note')];
  return section('spec', [{ kind: 'table', id: 'spec', columns, rows, empty: 'No entries.' }]);
}
