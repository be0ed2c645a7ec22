import { citationText } from '../../../core/data/source-text.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import type { CitedSource } from '../../../core/sources.ts';
import type { Section, TableBlock } from '../document.ts';
import { left, numberCell, right, row, textCell } from '../cells.ts';
import { code, paragraph } from '../runs.ts';
import { section } from '../section-titles.ts';

/**
 * The catalogue entry of every source the findings and the data cite,
 * numbered as the findings tables give them and by the id the working names.
 * The design basis is a file of axletree's own, cited by section.
 */
export function sourcesSection(result: CheckResult): Section {
  const text = (s: CitedSource) => (s.url ? `${citationText(s)} (${s.url})` : citationText(s));
  const rows = result.sources.map((s, i) => row([numberCell(i + 1, 'count'), textCell(s.id), textCell(text(s)), textCell(s.kind), textCell(s.note ?? '')], { anchor: s.id }));
  const columns = [right('No.', { unit: 'count' }), left('Id'), left('Source'), left('Kind'), left('Note')];
  // The workbook's Sources sheet, by id: its findings name sources by id.
  const byId: TableBlock = {
    kind: 'table',
    id: 'sources',
    columns: [left('Id'), left('Source'), left('Kind'), left('Note')],
    rows: result.sources.map((s) => row([textCell(s.id), textCell(citationText(s)), textCell(s.kind), textCell(s.note ?? '')])),
    empty: 'No sources cited.',
    only: 'sheet',
  };
  return section('sources', [
    paragraph(
      'A source named "design basis, section N" (ids starting design-basis-) is the file ',
      code('docs/design-basis.md'),
      ' in axletree itself, headed by that section number; "from-memory" marks a value recalled, not read, which the check asks you to confirm.',
    ),
    { kind: 'table', id: 'sources-numbered', columns, rows, empty: 'No sources cited.' },
    byId,
  ]);
}
