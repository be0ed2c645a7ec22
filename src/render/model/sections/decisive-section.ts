import type { DecisiveInput } from '../../../core/decisive/decisive-input.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import { formatNumber } from '../../../core/format/number-format.ts';
import { TOLERANCE } from '../../../core/decisive/break-even.ts';
import { left, numberCell, percentCell, right, row, runsCell, severityCell, textCell } from '../cells.ts';
import type { Block, Row, Section, TableBlock } from '../document.ts';
import { numberedFindings } from '../numbered-findings.ts';
import { badge, paragraph, plain } from '../runs.ts';
import { section } from '../section-titles.ts';

export const STATUS_WORDS = { given: 'given (an estimate)', defaulted: 'default', 'from-memory': 'from memory' } as const;

/** How many inputs of each decisive finding the summary names: those nearest their break-even. */
const BRIEF_PER_FINDING = 2;
/** The most rows the short table holds, so the summary stays on two pages. */
const BRIEF_ROWS = 6;
/** How many findings the summary names as setting the verdict. */
const NAMED_FINDINGS = 4;

const count = (n: number) => formatNumber(n, 'count');

/** How near an input is to changing its finding: the size of the move, none found counting as furthest. */
export const nearness = (d: DecisiveInput) => (d.change === null ? Infinity : Math.abs(d.change));

function inputRow(d: DecisiveInput): Row {
  return row([
    textCell(`${d.rule} (${d.subject})`),
    severityCell(d.severity),
    textCell(d.input),
    textCell(STATUS_WORDS[d.status]),
    numberCell(d.value, d.unit),
    d.break_even === null ? textCell(d.reason ?? '') : numberCell(d.break_even, d.unit),
    d.to_severity === null ? textCell('') : severityCell(d.to_severity),
    percentCell(d.change),
  ]);
}

function inputsTable(list: readonly DecisiveInput[]): TableBlock {
  return {
    kind: 'table',
    id: 'decisive-inputs',
    columns: [left('Finding'), left('Severity'), left('Input'), left('Status'), right('Value'), right('Changes at'), left('To'), right('Move')],
    rows: list.map(inputRow),
    empty: 'No estimate, default or remembered value moves a decisive finding.',
  };
}

function searchLine(result: CheckResult): Block[] {
  const search = result.decisive_search;
  if (!search) return [];
  return [
    paragraph(
      `The search looked at ${count(search.findings)} findings and ${count(search.candidates)} candidate inputs in ${count(search.reruns)} partial re-runs` +
        (search.unsearched > 0 ? `; ${count(search.unsearched)} pairs of finding and input were left unsearched when its work limit was reached.` : '.'),
    ),
  ];
}

/**
 * The builder's guesses and the remembered data values the verdict hangs on:
 * for each failing or warning finding (or, for a build with none, the three
 * highest utilisations) the inputs that move it most, and the value at which
 * its severity would change. The whole table, in the body of the report.
 */
export function decisiveSection(result: CheckResult): Section | null {
  const list = result.decisive_inputs;
  if (!list || !result.decisive_search) return null;
  return section('decisive', [
    paragraph(
      `The inputs below are estimates, defaults or values from memory that the decisive findings depend on. Each was moved on its own until the finding's severity changed (found to within ${formatNumber(TOLERANCE * 100)} %, by re-running the parts of the check it reaches). A change of a few per cent means the verdict hangs on that input: measure or source it before relying on the verdict.`,
    ),
    inputsTable(list),
    ...searchLine(result),
  ]);
}

/** The short form: the finding and its severity in one cell, the status in a word. */
function briefTable(list: readonly DecisiveInput[]): TableBlock {
  const rows = list.map((d) =>
    row([
      runsCell([badge(d.severity), plain(` ${d.rule} (${d.subject})`)]),
      textCell(`${d.input} (${STATUS_WORDS[d.status]})`),
      numberCell(d.value, d.unit),
      numberCell(d.break_even, d.unit),
      d.to_severity === null ? textCell('') : severityCell(d.to_severity),
      percentCell(d.change),
    ]),
  );
  const columns = [left('Finding'), left('Input'), right('Value'), right('Changes at'), left('To'), right('Move')];
  return { kind: 'table', id: 'decisive-brief', columns, rows, empty: 'No estimate, default or remembered value moves a decisive finding.' };
}

/** The findings whose severity is the verdict's, by their numbers in the findings table. */
function decidedBy(result: CheckResult): Block {
  if (result.verdict === 'pass') return paragraph('Every graded finding is a pass.');
  const at = numberedFindings(result.findings).graded.filter((g) => g.finding.severity === result.verdict);
  const named = at.slice(0, NAMED_FINDINGS).map((g) => `${g.ref}. ${g.finding.rule} (${g.finding.subject_label})`);
  const more = at.length > NAMED_FINDINGS ? `, and ${count(at.length - NAMED_FINDINGS)} more` : '';
  return paragraph(`The verdict is set by ${count(at.length)} ${at.length === 1 ? 'finding' : 'findings'} at ${result.verdict.toUpperCase()}: ${named.join('; ')}${more}.`);
}

/**
 * The summary's short form: the findings that set the verdict, and for each
 * decisive finding the inputs nearest to changing it. The whole table is in
 * the section "Decisive inputs" of the report.
 */
export function decisiveBriefSection(result: CheckResult): Section {
  const list = result.decisive_inputs;
  if (!list) {
    return section('decisiveBrief', [decidedBy(result), paragraph('The search for the inputs these findings hang on was not run (check --no-decisive).')]);
  }
  const findings = [...new Set(list.map((d) => `${d.rule} ${d.subject}`))];
  const brief = findings
    .flatMap((key) =>
      list
        .filter((d) => `${d.rule} ${d.subject}` === key && d.break_even !== null)
        .sort((a, b) => nearness(a) - nearness(b))
        .slice(0, BRIEF_PER_FINDING),
    )
    .slice(0, BRIEF_ROWS);
  return section('decisiveBrief', [
    decidedBy(result),
    paragraph(`Inputs nearest to changing a decisive finding (each moved on its own; the full list is under "Decisive inputs"):`),
    briefTable(brief),
  ]);
}
