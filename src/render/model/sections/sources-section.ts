import { citationText } from '../../../core/data/source-text.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Section } from '../document.ts';
import { left, row, textCell } from '../cells.ts';
import { section } from '../section-titles.ts';

/** The catalogue entry of every source the findings and the data cite, by the id the findings name. */
export function sourcesSection(result: CheckResult): Section {
  const rows = result.sources.map((s) => row([textCell(s.id), textCell(citationText(s)), textCell(s.kind), textCell(s.note ?? '')], { anchor: s.id }));
  const columns = [left('Id'), left('Source'), left('Kind'), left('Note')];
  return section('sources', [{ kind: 'table', id: 'sources', columns, rows, empty: 'No sources cited.' }]);
}
