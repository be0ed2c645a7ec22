import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Section } from '../document.ts';
import { left, numberCell, right, row, textCell } from '../cells.ts';
import { section } from '../section-titles.ts';

/** Every load the models computed, by model, part and load case. */
export function loadsSection(result: CheckResult): Section {
  const rows = result.loads.map((l) => row([textCell(l.group), textCell(l.item), textCell(l.case), textCell(l.quantity), numberCell(l.value, l.unit), textCell(l.unit)]));
  const columns = [left('Model'), left('Part'), left('Load case'), left('Quantity'), right('Value', { bare: true }), left('Unit')];
  return section('loads', [{ kind: 'table', id: 'loads', columns, rows, empty: 'No loads.' }]);
}
