import type { CompareResult, FigureComparison, FindingComparison, SpecDifference } from '../../core/compare/compare-result.ts';
import { ABSENT_WORD } from '../../core/compare/account-templates.ts';
import { blank, left, numberCell, right, row, runsCell, severityCell, textCell } from '../model/cells.ts';
import type { Cell, TableBlock } from '../model/document.ts';
import { plain } from '../model/runs.ts';
import { lineText } from '../../core/compare/account-text.ts';

// The comparison's tables, one function each; the report and the workbook
// both take them from the document, so they cannot disagree.

const others = (c: CompareResult) => c.builds.slice(1);
const base = (c: CompareResult) => c.builds[0].label;

/** The builds: label, name, file, verdict and the count of each severity. */
export function buildsTable(c: CompareResult): TableBlock {
  const counts = ['fail', 'warning', 'advice', 'pass', 'info'] as const;
  return {
    kind: 'table',
    id: 'compare-builds',
    columns: [left('Build'), left('Specification'), left('File'), left('Verdict'), ...counts.map((s) => right(s))],
    rows: c.builds.map((b, i) => row([textCell(i === 0 ? `${b.label} (baseline)` : b.label, 'strong'), textCell(b.spec_name), textCell(b.file), severityCell(b.verdict), ...counts.map((s) => numberCell(b.counts[s], 'count'))])),
    empty: 'No builds.',
  };
}

/** Every figure: each build's value, then each other build's difference and ratio against the baseline. */
export function figuresTable(c: CompareResult): TableBlock {
  const cells = (f: FigureComparison): Cell[] => [
    textCell(f.name),
    ...f.values.map((v) => numberCell(v, f.unit, { none: 'not applicable' })),
    textCell(f.unit),
    ...others(c).flatMap((_, j) => [numberCell(f.difference[j + 1], f.unit, { none: '' }), numberCell(f.ratio[j + 1], '', { none: '' })]),
  ];
  return {
    kind: 'table',
    id: 'compare-figures',
    columns: [
      left('Figure'),
      ...c.builds.map((b) => right(b.label, { bare: true })),
      left('Unit'),
      ...others(c).flatMap((b) => [right(`${b.label} − ${base(c)}`, { bare: true }), right(`${b.label} / ${base(c)}`)]),
    ],
    rows: c.figures.map((f) => row(cells(f))),
    empty: 'No figures.',
  };
}

/** The figures some build has no value for, each with that build's reason. */
export function notApplicableTable(c: CompareResult): TableBlock {
  const rows = c.figures.flatMap((f) => f.not_applicable.flatMap((why, i) => (why === null ? [] : [row([textCell(f.name), textCell(c.builds[i].label), textCell(why)])])));
  return { kind: 'table', id: 'compare-figures-not-applicable', columns: [left('Figure not given'), left('Build'), left('Why')], rows, empty: 'Every build has a value for every figure.' };
}

/** Findings across the builds: the severity and value in each; a build without the finding says so. */
export function findingsTable(id: string, c: CompareResult, list: readonly FindingComparison[], empty: string): TableBlock {
  const cells = (f: FindingComparison): Cell[] => [
    runsCell([plain(`${f.title} (${f.rule})`)]),
    textCell(f.subject_label),
    ...f.severities.map((s) => (s === null ? textCell(ABSENT_WORD) : severityCell(s))),
    ...f.values.map((v, i) => (f.severities[i] === null ? blank : numberCell(v, f.unit, { none: '' }))),
    textCell(f.unit),
  ];
  return {
    kind: 'table',
    id,
    columns: [left('Finding'), left('Subject'), ...c.builds.map((b) => left(b.label)), ...c.builds.map((b) => right(`${b.label} value`, { bare: true })), left('Unit')],
    rows: list.map((f) => row(cells(f))),
    empty,
  };
}

function valueCell(v: unknown, unit: string): Cell {
  if (v === null) return textCell(ABSENT_WORD);
  if (typeof v === 'number') return numberCell(v, unit);
  if (typeof v === 'string') return textCell(v);
  if (Array.isArray(v) && v.every((x) => typeof x !== 'object')) return textCell(v.join(', '));
  return textCell(JSON.stringify(v));
}

/** The values of the prepared specifications that are not the same in every build. */
export function specDifferencesTable(c: CompareResult, list: readonly SpecDifference[]): TableBlock {
  return {
    kind: 'table',
    id: 'compare-spec-differences',
    columns: [left('Path'), ...c.builds.map((b) => right(b.label, { bare: true })), left('Unit')],
    rows: list.map((d) => row([textCell(d.path), ...d.values.map((v) => valueCell(v, d.unit)), textCell(d.unit)])),
    empty: 'The specifications are the same, value for value.',
  };
}

/** The account sentence by sentence with its template code: the workbook's copy of the first section. */
export function accountTable(c: CompareResult): TableBlock {
  const rows = c.accounts.flatMap((a) => a.lines.map((l) => row([textCell(`${a.other} against ${a.base}`), numberCell(l.code, 'count'), textCell(lineText(l))])));
  return { kind: 'table', id: 'compare-account', columns: [left('Builds'), right('Code'), left('Why the verdicts differ')], rows, empty: 'Nothing to compare.', only: 'sheet' };
}
