import type { Finding } from '../../core/findings/finding.ts';
import type { TableBlock } from './document.ts';
import { left, numberCell, percentCell, right, row, severityCell, textCell } from './cells.ts';
import { stepLine } from './cell-text.ts';

/** A finding with the number it is listed under ("3", or "N2" for a note). */
export interface NumberedFinding {
  ref: string;
  finding: Finding;
}

// The findings as the workbook lists them, worst first: the subject in words,
// its stable id, the load case, the fix, the sources and the working in
// columns of their own. The text outputs show the same findings grouped by
// rule family instead (family-findings-table.ts), with the same numbers.
const COLUMNS = [
  right('No.'),
  left('Severity'),
  left('Rule'),
  right('Code', { unit: 'count' }),
  left('Subject'),
  right('Value'),
  right('Limit'),
  left('Unit', { only: 'sheet' }),
  right('Utilisation'),
  left('Message'),
  left('Subject id', { only: 'sheet' }),
  left('Load case', { only: 'sheet' }),
  left('Fix', { only: 'sheet' }),
  left('Sources', { only: 'sheet' }),
  left('Working', { only: 'sheet' }),
];

export function findingsTable(id: string, list: readonly NumberedFinding[], empty: string, only?: 'sheet'): TableBlock {
  const rows = list.map(({ ref, finding: f }) =>
    row([
      textCell(ref),
      severityCell(f.severity),
      textCell(f.rule),
      numberCell(f.code, 'count'),
      textCell(f.subject_label),
      numberCell(f.value, f.unit),
      numberCell(f.limit, f.unit),
      textCell(f.unit),
      percentCell(f.utilisation),
      textCell(f.message),
      textCell(f.subject),
      textCell(f.load_case ?? ''),
      textCell(f.fix),
      textCell(f.sources.join('; ')),
      textCell(f.working.map(stepLine).join('\n')),
    ]),
  );
  return { kind: 'table', id, columns: COLUMNS, rows, empty, ...(only ? { only } : {}) };
}
