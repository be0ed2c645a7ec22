import type { CutListItem, HideNeed, LeatherItem, StockPlan } from '../../../core/cutlist/cutting-result.ts';
import { formatNumber } from '../../../core/format/number-format.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Cell, Section, TableBlock } from '../document.ts';
import { blank, dimsCell, left, numberCell, right, row, textCell } from '../cells.ts';
import { allowancesTable, distinctAllowances, itemKeys } from '../cut-allowance-keys.ts';
import { heading, paragraph } from '../runs.ts';
import { section } from '../section-titles.ts';
import { sourceNumbers } from '../source-numbers.ts';

const LWT = ['L', 'W', 'T'];

function cutListTable(items: readonly CutListItem[]): TableBlock {
  const rows = items.map((c) =>
    row([
      textCell(c.part), numberCell(c.quantity, 'count'), numberCell(c.spares, 'count'), textCell(c.species),
      dimsCell([c.finished.length_mm, c.finished.width_mm, c.finished.thickness_mm], 'mm'),
      dimsCell([c.rough.length_mm, c.rough.width_mm, c.rough.thickness_mm], 'mm'),
      textCell(c.grain), textCell(c.steam_bent ? 'yes' : 'no'), numberCell(c.volume_m3, 'm³'), numberCell(c.mass_kg, 'kg'), textCell(c.basis),
    ]),
  );
  // Rough volume counts spares (they are bought); finished mass does not (they are not fitted).
  const volume = items.reduce((s, c) => s + c.volume_m3 * (c.quantity + c.spares), 0);
  const mass = items.reduce((s, c) => s + c.mass_kg * c.quantity, 0);
  if (items.length > 0) {
    rows.push(row([textCell('Total: rough volume with spares; finished mass of the parts fitted'), ...new Array<Cell>(7).fill(blank), numberCell(volume, 'm³'), numberCell(mass, 'kg'), blank], { total: true }));
  }
  const columns = [
    left('Part'), right('Qty', { unit: 'count' }), right('Spares', { unit: 'count' }), left('Species'),
    right('Finished', { unit: 'mm', parts: LWT }), right('Rough', { unit: 'mm', parts: LWT }), left('Grain'), left('Steam-bent'),
    right('Volume, one piece rough', { unit: 'm³' }), right('Mass, one piece finished', { unit: 'kg' }), left('Basis'),
  ];
  return { kind: 'table', id: 'cut-list', columns, rows, empty: 'No parts.' };
}

function leatherTable(items: readonly LeatherItem[]): TableBlock {
  const rows = items.map((i) =>
    row([textCell(i.item), textCell(i.material), numberCell(i.quantity, 'count'), numberCell(i.width_mm, 'mm'), numberCell(i.thickness_mm, 'mm'), numberCell(i.length_mm, 'mm'), numberCell(i.area_m2, 'm²'), textCell(i.basis)]),
  );
  const columns = [
    left('Item'), left('Material'), right('Qty', { unit: 'count' }), right('Width', { unit: 'mm' }), right('Thickness', { unit: 'mm' }),
    right('Length, one piece', { unit: 'mm' }), right('Area, all pieces', { unit: 'm²' }), left('Basis'),
  ];
  return { kind: 'table', id: 'leather-items', columns, rows, empty: 'No straps or lashings.' };
}

function hidesTable(hides: readonly HideNeed[]): TableBlock {
  const rows = hides.map((h) => row([textCell(h.material), numberCell(h.area_m2, 'm²'), numberCell(h.usable_hide_m2, 'm²'), numberCell(h.waste_factor, ''), numberCell(h.hides, 'count'), textCell(h.basis)]));
  const columns = [left('Material'), right('Area', { unit: 'm²' }), right('Usable hide', { unit: 'm²' }), right('Waste factor', { unit: '' }), right('Hides', { unit: 'count' }), left('Basis')];
  return { kind: 'table', id: 'hides', columns, rows, empty: 'No hides needed.' };
}

/** The stock a part is cut from: its group in the stock plan and the lengths its patterns use, or why none serves it. */
function cutFromText(part: string, plan: StockPlan): string {
  const unserved = plan.unserved.find((u) => u.part === part);
  if (unserved) return `no listed stock: ${unserved.buy}`;
  const uses = plan.groups.flatMap((g, i) => {
    const lengths = [...new Set(g.plan.patterns.filter((p) => p.cuts.some((c) => c.label === part)).map((p) => p.stock_length_mm))].sort((a, b) => b - a);
    return lengths.length ? [`group ${i + 1}: ${lengths.map((l) => formatNumber(l, 'mm')).join(', ')} mm`] : [];
  });
  return uses.length ? uses.join('; ') : 'not in the stock plan';
}

/** The cut list as a dense table, a line a part: sizes, count, the stock it comes from, its allowances by key. */
function denseTable(result: CheckResult): TableBlock {
  const items = result.cutting.cut_list;
  const distinct = distinctAllowances(items);
  const rows = items.map((c) =>
    row([
      textCell(c.part), textCell(c.species), numberCell(c.quantity, 'count'), numberCell(c.spares, 'count'),
      dimsCell([c.finished.length_mm, c.finished.width_mm, c.finished.thickness_mm], 'mm'),
      dimsCell([c.rough.length_mm, c.rough.width_mm, c.rough.thickness_mm], 'mm'),
      textCell(cutFromText(c.part, result.cutting.stock_plan)), textCell(itemKeys(c, distinct)),
    ]),
  );
  const columns = [
    left('Part'), left('Species'), right('Qty', { unit: 'count' }), right('Spares', { unit: 'count' }),
    right('Finished', { unit: 'mm', parts: LWT }), right('Rough', { unit: 'mm', parts: LWT }), left('Cut from (stock plan)'), left('Allowances'),
  ];
  return { kind: 'table', id: 'cut-list-dense', columns, rows, empty: 'No parts.' };
}

/** Every part to cut in a line, then the allowances' key with their sources; the full table with each size's working is in the appendix. */
export function cutListSection(result: CheckResult): Section {
  const distinct = distinctAllowances(result.cutting.cut_list);
  return section('cutList', [
    denseTable(result),
    paragraph('The allowances, by the key the table gives:'),
    allowancesTable(result, distinct, sourceNumbers(result)),
  ]);
}

/** Every part with its grain, volume, mass and how its rough size was found, with the totals. */
export function cutListBasisSection(result: CheckResult): Section {
  return section('cutListBasis', [cutListTable(result.cutting.cut_list)]);
}

/** The straps and lashings, and the hides to buy for them. */
export function leatherSection(result: CheckResult): Section {
  const { items, hides } = result.cutting.leather;
  return section('leather', [heading(3, 'Straps and lashings'), leatherTable(items), heading(3, 'Hides to buy'), hidesTable(hides)]);
}
