import type { TableBlock } from './document.ts';
import { left, numberCell, percentCell, right, row, severityCell, sourcesCell, textCell } from './cells.ts';
import type { NumberedFinding } from './findings-table.ts';
import { familyId, familyOf } from './rule-families.ts';

// The graded findings as a reviewer reads them: one table, a row each,
// grouped by rule family (families in the order the rules run, worst first
// within each, every finding keeping its number), with the combination and
// load case each was checked in and its sources by their numbers in the
// Sources section. Message, fix and working are elsewhere: the flagged
// findings' in a list under the table, every finding's in the appendix.

const COLUMNS = [
  right('No.'), left('Severity'), left('Rule'), left('Subject'), right('Value'), right('Limit'), right('Utilisation'),
  left('Combination'), left('Load case'), left('Sources'),
];

/** The title a family's rows are grouped under. */
export function familyHeading(rule: string): string {
  const family = familyOf(rule);
  return family.title === family.id ? family.id : `${family.title} (${family.id})`;
}

/** The findings in family order: families by first appearance in `ruleOrder`, the list's own order within each. */
function byFamily(list: readonly NumberedFinding[], ruleOrder: readonly string[]): NumberedFinding[] {
  const families = [...new Set([...ruleOrder, ...list.map((n) => n.finding.rule)].map(familyId))];
  return families.flatMap((family) => list.filter((n) => familyId(n.finding.rule) === family));
}

/**
 * The graded findings (numbered worst first) by rule family; `ruleOrder` is
 * the rules in the order they ran (the core's findings), which orders the
 * families; `numbers` gives each source's number in the Sources section.
 */
export function familyFindingsTable(list: readonly NumberedFinding[], ruleOrder: readonly string[], numbers: ReadonlyMap<string, number>): TableBlock {
  const ordered = byFamily(list, ruleOrder);
  const rows = ordered.map(({ ref, finding: f }, i) => {
    const opens = i === 0 || familyId(ordered[i - 1].finding.rule) !== familyId(f.rule);
    return row(
      [
        textCell(ref), severityCell(f.severity), textCell(f.rule), textCell(f.subject_label), numberCell(f.value, f.unit), numberCell(f.limit, f.unit),
        percentCell(f.utilisation), textCell(f.combination ?? ''), textCell(f.load_case ?? ''), sourcesCell(f.sources, numbers),
      ],
      opens ? { group: familyHeading(f.rule) } : {},
    );
  });
  return { kind: 'table', id: 'findings-by-family', columns: COLUMNS, rows, empty: 'No graded findings.' };
}
