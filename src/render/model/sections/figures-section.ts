import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Section } from '../document.ts';
import { left, numberCell, right, row, textCell } from '../cells.ts';
import { section } from '../section-titles.ts';

/** The result's key figures, each with its unit in a column of its own. */
export function figuresSection(result: CheckResult): Section {
  const rows = Object.entries(result.figures).map(([name, fig]) => row([textCell(name), numberCell(fig.value, fig.unit), textCell(fig.unit)]));
  const missing = Object.entries(result.figures_not_applicable);
  return section('figures', [
    { kind: 'table', id: 'figures', columns: [left('Figure'), right('Value', { bare: true }), left('Unit')], rows, empty: 'No figures.' },
    // A figure the models could not reach is named with its reason, never printed as a number.
    ...(missing.length === 0
      ? []
      : [
          { kind: 'table' as const, id: 'figures-not-applicable', columns: [left('Figure not given'), left('Why')], rows: missing.map(([name, why]) => row([textCell(name), textCell(why)])), empty: '' },
        ]),
  ]);
}
