import type { CheckResult } from '../../../core/result/check-result.ts';
import { formatNumber } from '../../../core/format/number-format.ts';
import { TOLERANCE } from '../../../core/decisive/break-even.ts';
import { left, numberCell, percentCell, right, row, severityCell, textCell } from '../cells.ts';
import type { Block, Section } from '../document.ts';
import { paragraph } from '../runs.ts';
import { section } from '../section-titles.ts';

const STATUS_WORDS = { given: 'given (an estimate)', defaulted: 'default', 'from-memory': 'from memory' } as const;

/**
 * The builder's guesses and the remembered data values the verdict hangs on:
 * for each failing or warning finding (or, for a build with none, the three
 * highest utilisations) the inputs that move it most, and the value at which
 * its severity would change. Shown near the top, where a reviewer starts.
 */
export function decisiveSection(result: CheckResult): Section | null {
  const list = result.decisive_inputs;
  const search = result.decisive_search;
  if (!list || !search) return null;
  const rows = list.map((d) =>
    row([
      textCell(`${d.rule} (${d.subject})`),
      severityCell(d.severity),
      textCell(d.input),
      textCell(STATUS_WORDS[d.status]),
      numberCell(d.value, d.unit),
      d.break_even === null ? textCell(d.reason ?? '') : numberCell(d.break_even, d.unit),
      d.to_severity === null ? textCell('') : severityCell(d.to_severity),
      percentCell(d.change),
    ]),
  );
  const count = (n: number) => formatNumber(n, 'count');
  const blocks: Block[] = [
    paragraph(
      `The inputs below are estimates, defaults or values from memory that the decisive findings depend on. Each was moved on its own until the finding's severity changed (found to within ${formatNumber(TOLERANCE * 100)} %, by re-running the parts of the check it reaches). A change of a few per cent means the verdict hangs on that input: measure or source it before relying on the verdict.`,
    ),
    {
      kind: 'table',
      id: 'decisive-inputs',
      columns: [left('Finding'), left('Severity'), left('Input'), left('Status'), right('Value'), right('Changes at'), left('To'), right('Move')],
      rows,
      empty: 'No estimate, default or remembered value moves a decisive finding.',
    },
    paragraph(
      `The search looked at ${count(search.findings)} findings and ${count(search.candidates)} candidate inputs in ${count(search.reruns)} partial re-runs` +
        (search.unsearched > 0 ? `; ${count(search.unsearched)} pairs of finding and input were left unsearched when its work limit was reached.` : '.'),
    ),
  ];
  return section('decisive', blocks);
}
