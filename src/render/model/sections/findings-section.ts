import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Block, FindingBlock, Section } from '../document.ts';
import { familyFindingsTable } from '../family-findings-table.ts';
import { findingsTable, type NumberedFinding } from '../findings-table.ts';
import { numberedFindings } from '../numbered-findings.ts';
import { badge, paragraph, plain, strong } from '../runs.ts';
import { section } from '../section-titles.ts';
import { sourceNumbers } from '../source-numbers.ts';

function findingBlock({ ref, finding: f }: NumberedFinding): FindingBlock {
  return { kind: 'finding', ref, severity: f.severity, rule: f.rule, subject_label: f.subject_label, message: f.message, fix: f.fix, sources: f.sources, steps: f.working };
}

/** Each graded finding that is not a pass, in a line: what it says and what to do; its working is in the appendix. */
function flaggedList(graded: readonly NumberedFinding[]): Block[] {
  const flagged = graded.filter((g) => g.finding.severity !== 'pass');
  if (flagged.length === 0) return [paragraph('Every graded finding is a pass.')];
  return [
    paragraph(strong('What the flagged findings say, and what to do'), plain(' (the working of each is in the appendix, under its number):')),
    {
      kind: 'list',
      items: flagged.map(({ ref, finding: f }) => [plain(`${ref}. `), badge(f.severity), plain(` ${f.rule}, ${f.subject_label}: ${f.message} `), strong('Fix:'), plain(` ${f.fix}`)]),
    },
  ];
}

/** The graded findings in one table by rule family, then what each flagged one says and what to do. */
export function findingsSection(result: CheckResult): Section {
  const { graded } = numberedFindings(result.findings);
  return section('findings', [
    paragraph('Every graded finding, grouped by rule family, worst first within each; a finding keeps its number (worst first over the whole check) everywhere. Sources are given by their number in the Sources section of the appendix.'),
    familyFindingsTable(graded, result.findings.map((f) => f.rule), sourceNumbers(result)),
    // The same findings worst first, as the workbook lists them.
    findingsTable('findings', graded, 'No graded findings.', 'sheet'),
    ...flaggedList(graded),
  ]);
}

/** The working of every graded finding, passes included, numbered as in the findings table. */
export function workingSection(result: CheckResult): Section {
  const { graded } = numberedFindings(result.findings);
  return section('working', graded.length ? graded.map(findingBlock) : [paragraph('No graded findings.')]);
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
