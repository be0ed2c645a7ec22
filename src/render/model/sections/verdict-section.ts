import type { CheckResult } from '../../../core/result/check-result.ts';
import { formatNumber } from '../../../core/format/number-format.ts';
import { countBySeverity, GRADED_WORST_FIRST, SEVERITIES_WORST_FIRST } from '../../severity-order.ts';
import type { Block, Section, TableBlock } from '../document.ts';
import { left, numberCell, right, row, severityCell, textCell } from '../cells.ts';
import { paragraph, plain, strong } from '../runs.ts';
import { section } from '../section-titles.ts';

const count = (n: number) => formatNumber(n, 'count');

/** What each severity means (the result's own words), in one line each, with how many findings carry it (info: the notes). */
function severitiesTable(result: CheckResult): TableBlock {
  const counts = countBySeverity(result.findings);
  return {
    kind: 'table',
    id: 'severities',
    columns: [left('Severity'), right('Findings', { unit: 'count' }), left('Meaning')],
    rows: SEVERITIES_WORST_FIRST.map((s) => row([severityCell(s), numberCell(counts[s], 'count'), textCell(result.severity_meanings[s])])),
    empty: '',
  };
}

/** The verdict, the graded findings by severity, the notes apart (they never count towards it), and what each severity means. */
export function verdictSection(result: CheckResult): Section {
  const counts = countBySeverity(result.findings);
  const graded = result.findings.length - counts.info;
  const bySeverity = GRADED_WORST_FIRST.map((s) => `${count(counts[s])} ${s}`).join(', ');
  const notes = counts.info === 0 ? '' : ` ${count(counts.info)} ${counts.info === 1 ? 'note informs' : 'notes inform'} without grading the build.`;
  // A verdict resting on a bound rather than a model's result says so before anything else is read.
  const provisional: Block[] =
    result.provisional.length === 0
      ? []
      : [paragraph(strong('Provisional verdict.'), ' It rests on bounds, not on the models, for these reasons; run the full check before relying on it:'), { kind: 'list', items: result.provisional.map((r) => [plain(r)]) }];
  return section(
    'verdict',
    [paragraph(`${count(graded)} graded findings: ${bySeverity}.${notes} Checked by ${result.tool.name} ${result.tool.version}.`), ...provisional, severitiesTable(result)],
    result.verdict,
  );
}
