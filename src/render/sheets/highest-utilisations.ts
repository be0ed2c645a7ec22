import type { CheckResult } from '../../core/result/check-result.ts';
import type { TableBlock } from '../model/document.ts';
import { left, percentCell, right, row, severityCell, textCell } from '../model/cells.ts';
import { numberedFindings } from '../model/numbered-findings.ts';

/** How many of the most used capacities the summary shows. */
export const HIGHEST_COUNT = 3;

/**
 * The graded findings nearest their limits (or furthest past them): the
 * highest utilisations, with the load case and combination each was checked
 * in and its number in the findings table. Ties keep the findings' order.
 * The subject comes first and the rule third, so the long texts share the
 * wide columns of the summary's other tables.
 */
export function highestUtilisations(result: CheckResult, count = HIGHEST_COUNT): TableBlock {
  const ranked = numberedFindings(result.findings)
    .graded.filter((n) => n.finding.utilisation !== null)
    .map((n, index) => ({ n, index }))
    .sort((a, b) => (b.n.finding.utilisation ?? 0) - (a.n.finding.utilisation ?? 0) || a.index - b.index)
    .slice(0, count);
  return {
    kind: 'table',
    id: 'highest-utilisations',
    columns: [left('Subject'), left('Severity'), left('Rule'), right('Utilisation'), left('Load case'), left('Combination'), right('Finding No.')],
    rows: ranked.map(({ n: { ref, finding: f } }) =>
      row([textCell(f.subject_label), severityCell(f.severity), textCell(f.rule), percentCell(f.utilisation), textCell(f.load_case ?? 'none'), textCell(f.combination ?? 'none'), textCell(ref)]),
    ),
    empty: 'No graded finding is compared with a limit.',
  };
}
