import type { Finding } from '../../core/findings/finding.ts';
import type { TableBlock } from './document.ts';
import { left, numberCell, percentCell, right, row, severityCell, sourcesCell, textCell } from './cells.ts';
import { stepLine } from './cell-text.ts';
import { familyId, familyOf } from './rule-families.ts';

/** A finding with the number it is listed under ("3", or "N2" for a note). */
export interface NumberedFinding {
  ref: string;
  finding: Finding;
}

// The reader sees the subject in words, the combination and load case it was
// checked in, and its sources by their numbers in the Sources section; the
// workbook also keeps the message code, the stable subject id, the message,
// the fix and the working in columns of their own. The columns' order is the
// workbook's: new ones go after the subject id.
const COLUMNS = [
  right('No.'),
  left('Severity'),
  left('Rule'),
  right('Code', { unit: 'count', only: 'sheet' }),
  left('Subject'),
  right('Value'),
  right('Limit'),
  left('Unit', { only: 'sheet' }),
  right('Utilisation'),
  left('Message', { only: 'sheet' }),
  left('Subject id', { only: 'sheet' }),
  left('Combination'),
  left('Load case'),
  left('Fix', { only: 'sheet' }),
  left('Sources'),
  left('Working', { only: 'sheet' }),
];

/** The title a family's rows are grouped under. */
export function familyHeading(rule: string): string {
  const family = familyOf(rule);
  return family.title === family.id ? family.id : `${family.title} (${family.id})`;
}

/**
 * The findings in one table, a row each, each rule family opening with its
 * title; sources by their number in `numbers` (the Sources section's).
 */
export function findingsTable(id: string, list: readonly NumberedFinding[], empty: string, numbers: ReadonlyMap<string, number>): TableBlock {
  const rows = list.map(({ ref, finding: f }, i) => {
    const opens = i === 0 || familyId(list[i - 1].finding.rule) !== familyId(f.rule);
    return row(
      [
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
        textCell(f.combination ?? ''),
        textCell(f.load_case ?? ''),
        textCell(f.fix),
        sourcesCell(f.sources, numbers),
        textCell(f.working.map(stepLine).join('\n')),
      ],
      opens ? { group: familyHeading(f.rule) } : {},
    );
  });
  return { kind: 'table', id, columns: COLUMNS, rows, empty };
}
