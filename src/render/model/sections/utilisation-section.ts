import type { Finding } from '../../../core/findings/finding.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Section } from '../document.ts';
import { left, numberCell, percentCell, right, row, severityCell, textCell } from '../cells.ts';
import type { NumberedFinding } from '../findings-table.ts';
import { numberedFindings } from '../numbered-findings.ts';
import { section } from '../section-titles.ts';

/** How many of the highest utilisations the summary shows. */
const SHOWN = 3;

/** The graded findings with a utilisation, highest first (the core's order kept between equals). */
export function highestUtilisations(result: CheckResult, n = SHOWN): NumberedFinding[] {
  const withU = numberedFindings(result.findings).graded.filter((g): g is NumberedFinding & { finding: Finding & { utilisation: number } } => g.finding.utilisation !== null);
  return [...withU].sort((a, b) => b.finding.utilisation - a.finding.utilisation).slice(0, n);
}

/** The three findings nearest their limits (or beyond them), with the load case and combination each was checked in. */
export function utilisationSection(result: CheckResult): Section {
  const rows = highestUtilisations(result).map(({ ref, finding: f }) =>
    row([
      textCell(ref), severityCell(f.severity), textCell(`${f.rule}: ${f.subject_label}`), percentCell(f.utilisation),
      numberCell(f.value, f.unit), numberCell(f.limit, f.unit), textCell(f.load_case ?? 'none'), textCell(f.combination ?? 'none'),
    ]),
  );
  const columns = [left('No.'), left('Severity'), left('Finding'), right('Utilisation'), right('Value'), right('Limit'), left('Load case'), left('Combination')];
  return section('utilisation', [{ kind: 'table', id: 'highest-utilisations', columns, rows, empty: 'No finding is compared with a limit.' }]);
}
