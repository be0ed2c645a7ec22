import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Section } from '../document.ts';
import { left, numberCell, right, row, textCell } from '../cells.ts';
import { section } from '../section-titles.ts';

/** The result's key figures, each with its unit in a column of its own. */
export function figuresSection(result: CheckResult): Section {
  const rows = Object.entries(result.figures).map(([name, fig]) => row([textCell(name), numberCell(fig.value, fig.unit), textCell(fig.unit)]));
  return section('figures', [
    { kind: 'table', id: 'figures', columns: [left('Figure'), right('Value', { bare: true }), left('Unit')], rows, empty: 'No figures.' },
  ]);
}
