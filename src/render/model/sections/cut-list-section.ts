import type { CutListItem, HideNeed, LeatherItem } from '../../../core/cutlist/cutting-result.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Cell, Section, TableBlock } from '../document.ts';
import { blank, dimsCell, left, numberCell, right, row, textCell } from '../cells.ts';
import { heading } from '../runs.ts';
import { section } from '../section-titles.ts';

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

/** Every part to cut, rough and finished, with the totals. */
export function cutListSection(result: CheckResult): Section {
  return section('cutList', [cutListTable(result.cutting.cut_list)]);
}

/** The straps and lashings, and the hides to buy for them. */
export function leatherSection(result: CheckResult): Section {
  const { items, hides } = result.cutting.leather;
  return section('leather', [heading(3, 'Straps and lashings'), leatherTable(items), heading(3, 'Hides to buy'), hidesTable(hides)]);
}
