import type { WheelSettingOut } from '../../../core/cutlist/cutting-result.ts';
import type { CheckResult } from '../../../core/result/check-result.ts';
import type { Section, TableBlock } from '../document.ts';
import { left, numberCell, right, row, textCell } from '../cells.ts';
import { shownUnit } from '../cell-text.ts';
import { settingOutFigure } from '../figure-blocks.ts';
import { paragraph, workingLines } from '../runs.ts';
import { section } from '../section-titles.ts';

/** One dimension the wheelwright marks out; value null where it does not apply. */
interface Dimension {
  label: string;
  value: number | null;
  unit: string;
}

/** The setting-out in the order the work is marked out. */
function dimensions(w: WheelSettingOut): Dimension[] {
  return [
    { label: 'Spokes per wheel', value: w.spokes, unit: 'count' },
    { label: 'Spoke length between shoulders', value: w.spoke_length_shoulders_mm, unit: 'mm' },
    { label: 'Spoke length overall, with tenons', value: w.spoke_length_overall_mm, unit: 'mm' },
    { label: 'Tenon into the nave', value: w.tenon_nave_mm, unit: 'mm' },
    { label: 'Tenon into the felloe', value: w.tenon_felloe_mm, unit: 'mm' },
    { label: 'Mortise spacing round the nave', value: w.mortise_spacing_deg, unit: '°' },
    ...w.mortise_positions_deg.map((v, i) => ({ label: `Mortise ${i + 1}, from the first`, value: v, unit: '°' })),
    { label: 'Felloe pieces per wheel', value: w.felloe_pieces, unit: 'count' },
    { label: 'Felloe piece arc length', value: w.felloe_arc_mm, unit: 'mm' },
    { label: 'Felloe piece chord', value: w.felloe_chord_mm, unit: 'mm' },
    { label: 'Felloe end face to chord', value: w.felloe_end_angle_deg, unit: '°' },
    ...w.dowel_positions_deg.map((v, i) => ({ label: `Felloe joint and dowel ${i + 1}, round the wheel`, value: v, unit: '°' })),
    { label: 'Tyre length', value: w.tyre_length_mm, unit: 'mm' },
  ];
}

function settingOutTable(w: WheelSettingOut): TableBlock {
  const rows = dimensions(w).map((d) => row([textCell(d.label), numberCell(d.value, d.unit, { none: 'none (no tyre)' }), textCell(shownUnit(d.unit))]));
  return { kind: 'table', id: 'setting-out', columns: [left('Dimension, each wheel'), right('Value', { bare: true }), left('Unit')], rows, empty: '' };
}

/** The drawing, every dimension the wheelwright marks out, and how they were found. */
export function settingOutSection(result: CheckResult): Section {
  const w = result.cutting.setting_out;
  return section('settingOut', [paragraph('Each wheel; both wheels are set out alike.'), settingOutFigure(result), settingOutTable(w), workingLines(w.basis)]);
}
