import type { CheckResult } from '../../../core/result/check-result.ts';
import { formatNumber } from '../../../core/format/number-format.ts';
import { countBySeverity, GRADED_WORST_FIRST } from '../../severity-order.ts';
import type { Block, Section } from '../document.ts';
import { paragraph, plain, strong } from '../runs.ts';
import { section } from '../section-titles.ts';

const count = (n: number) => formatNumber(n, 'count');

/** The verdict, the graded findings by severity, and the notes apart: they never count towards it. */
export function verdictSection(result: CheckResult): Section {
  const counts = countBySeverity(result.findings);
  const graded = result.findings.length - counts.info;
  const bySeverity = GRADED_WORST_FIRST.map((s) => `${count(counts[s])} ${s}`).join(', ');
  const notes = counts.info === 0 ? [] : [paragraph(`${count(counts.info)} ${counts.info === 1 ? 'note informs' : 'notes inform'} without grading the build; listed apart under Notes.`)];
  // A verdict resting on a bound rather than a model's result says so before anything else is read.
  const provisional: Block[] =
    result.provisional.length === 0
      ? []
      : [paragraph(strong('Provisional verdict.'), ' It rests on bounds, not on the models, for these reasons; run the full check before relying on it:'), { kind: 'list', items: result.provisional.map((r) => [plain(r)]) }];
  return section(
    'verdict',
    [paragraph(`${count(graded)} graded findings: ${bySeverity}.`), ...provisional, ...notes, paragraph(`Checked by ${result.tool.name} ${result.tool.version}.`)],
    result.verdict,
  );
}
