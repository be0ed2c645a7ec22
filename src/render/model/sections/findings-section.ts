import { SEVERITY_MEANING } from '../../../core/findings/severity.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import { countBySeverity, SEVERITIES_WORST_FIRST } from '../../severity-order.ts';
import type { FindingBlock, Section, TableBlock } from '../document.ts';
import { left, numberCell, right, row, severityCell, textCell } from '../cells.ts';
import { findingsTable, type NumberedFinding } from '../findings-table.ts';
import { numberedFindings } from '../numbered-findings.ts';
import { paragraph } from '../runs.ts';
import { section } from '../section-titles.ts';

/** What each severity means, in one line each, with how many findings carry it (info: the notes). */
function severitiesTable(result: CheckResult): TableBlock {
  const counts = countBySeverity(result.findings);
  return {
    kind: 'table',
    id: 'severities',
    columns: [left('Severity'), right('Findings', { unit: 'count' }), left('Meaning')],
    rows: SEVERITIES_WORST_FIRST.map((s) => row([severityCell(s), numberCell(counts[s], 'count'), textCell(SEVERITY_MEANING[s])])),
    empty: '',
  };
}

function findingBlock({ ref, finding: f }: NumberedFinding): FindingBlock {
  return { kind: 'finding', ref, severity: f.severity, rule: f.rule, subject_label: f.subject_label, message: f.message, fix: f.fix, sources: f.sources, steps: f.working };
}

/** The severities' meanings, then the graded findings worst first. */
export function findingsSection(result: CheckResult): Section {
  const { graded } = numberedFindings(result.findings);
  return section('findings', [severitiesTable(result), findingsTable('findings', graded, 'No graded findings.')]);
}

/** Each graded finding that is not a pass, numbered as in the findings table. */
export function workingSection(result: CheckResult): Section {
  const flagged = numberedFindings(result.findings).graded.filter((n) => n.finding.severity !== 'pass');
  return section('working', flagged.length ? flagged.map(findingBlock) : [paragraph('Every graded finding is a pass.')]);
}

/** The notes (info findings), apart from the graded ones: a table, then each with its working. */
export function notesSection(result: CheckResult): Section {
  const { notes } = numberedFindings(result.findings);
  return section('notes', [
    paragraph('Notes inform; they grade nothing and never count towards the verdict.'),
    findingsTable('notes', notes, 'No notes.'),
    ...notes.map(findingBlock),
  ]);
}
