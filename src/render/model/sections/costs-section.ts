import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Row, Section } from '../document.ts';
import { left, numberCell, right, row, textCell } from '../cells.ts';
import { section } from '../section-titles.ts';

/** A figure of the result as a row, or its reason where the models gave none. */
function figureRow(result: CheckResult, name: string, label: string, note: string): Row {
  const f = result.figures[name];
  if (f) return row([textCell(label), numberCell(f.value, f.unit), textCell(f.unit === 'count' || f.unit === 'currency' ? '' : f.unit), textCell(note)]);
  return row([textCell(label), numberCell(null, ''), textCell(''), textCell(result.figures_not_applicable[name] ?? 'not computed')]);
}

/** What the build takes: timber as bought, the stock plan's pieces, cost and waste, the hides, and the finished mass. */
export function costsSection(result: CheckResult): Section {
  const plan = result.cutting.stock_plan;
  const priced = plan.cost !== null;
  const unserved = plan.unserved.length === 0 ? '' : `; ${plan.unserved.length === 1 ? 'one part' : `${plan.unserved.length} parts`} no listed stock serves, bought apart (see the stock plan)`;
  const rows = [
    figureRow(result, 'timber_volume', 'Timber, rough, spares included', 'as cut from the stock'),
    figureRow(result, 'stock_pieces', 'Stock pieces to buy', `from the listed stock${unserved}`),
    priced
      ? figureRow(result, 'stock_cost', 'Stock cost', 'in the currency of the stock prices; timber only')
      : row([textCell('Stock cost'), numberCell(null, '', { none: 'no prices' }), textCell(''), textCell('no stock prices given: the plan buys the fewest pieces')]),
    figureRow(result, 'stock_waste_pct', 'Waste', 'of the stock length bought'),
    ...result.cutting.leather.hides.map((h) => row([textCell(`Hides, ${h.material}`), numberCell(h.hides, 'count'), textCell(''), textCell('whole hides for the straps and lashings')])),
    figureRow(result, 'total_mass', 'Mass, all aboard', 'the build with its crew and loads, as checked'),
  ];
  const columns = [left('What'), right('Amount', { bare: true }), left('Unit'), left('Note')];
  return section('costs', [{ kind: 'table', id: 'costs', columns, rows, empty: '' }]);
}
