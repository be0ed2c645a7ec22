import type { WheelSettingOut } from '../core/cutlist/cutting-result.ts';
import { SETTING_OUT_SVG_FILE } from './report-figures.ts';

/** One dimension the wheelwright marks out; value null where it does not apply. */
export interface SettingOutRow {
  label: string;
  value: number | null;
  unit: string;
  /** One of a list of angular positions (mortises, felloe joints) rather than a single dimension. */
  position?: true;
}

/** The setting-out as rows, in the order the work is marked out; shared by the sheet and the report. */
export function settingOutRows(w: WheelSettingOut): SettingOutRow[] {
  return [
    { label: 'Spokes per wheel', value: w.spokes, unit: 'count' },
    { label: 'Spoke length between shoulders', value: w.spoke_length_shoulders_mm, unit: 'mm' },
    { label: 'Spoke length overall, with tenons', value: w.spoke_length_overall_mm, unit: 'mm' },
    { label: 'Tenon into the nave', value: w.tenon_nave_mm, unit: 'mm' },
    { label: 'Tenon into the felloe', value: w.tenon_felloe_mm, unit: 'mm' },
    { label: 'Mortise spacing round the nave', value: w.mortise_spacing_deg, unit: '°' },
    ...w.mortise_positions_deg.map((v, i) => ({ label: `Mortise ${i + 1}, from the first`, value: v, unit: '°', position: true as const })),
    { label: 'Felloe pieces per wheel', value: w.felloe_pieces, unit: 'count' },
    { label: 'Felloe piece arc length', value: w.felloe_arc_mm, unit: 'mm' },
    { label: 'Felloe piece chord', value: w.felloe_chord_mm, unit: 'mm' },
    { label: 'Felloe end face to chord', value: w.felloe_end_angle_deg, unit: '°' },
    ...w.dowel_positions_deg.map((v, i) => ({ label: `Felloe joint and dowel ${i + 1}, round the wheel`, value: v, unit: '°', position: true as const })),
    { label: 'Tyre length', value: w.tyre_length_mm, unit: 'mm' },
  ];
}

/** Where the drawing is, since a spreadsheet cell cannot hold it. */
export const DRAWING_NOTE = `The dimensioned drawing is in the report: inline in report.html, and as ${SETTING_OUT_SVG_FILE} beside report.md.`;
