import type { CheckResult } from '../core/result/check-result.ts';
import type { CutListItem, HideNeed, LeatherItem, WheelSettingOut } from '../core/cutlist/cutting-result.ts';
import { degreesList, sizeText } from './cutting-text.ts';
import { escapeInline as esc, fencedBlock, table } from './markdown-escape.ts';
import { formatNumber, UNIT_SPACE } from './number-format.ts';
import { SECTIONS } from './report-sections.ts';
import { SETTING_OUT_SVG_FILE } from './report-figures.ts';
import { settingOutRows } from './setting-out-rows.ts';

/** The cut list, leather list and wheel setting-out sections of the report. */
export function cutListSections(result: CheckResult): string[] {
  const { cut_list, leather, setting_out } = result.cutting;
  return [
    `## ${SECTIONS.cutList.title}`,
    cutListTable(cut_list),
    cutListTotals(cut_list),
    `## ${SECTIONS.leather.title}`,
    '### Straps and lashings',
    leatherTable(leather.items),
    '### Hides to buy',
    hidesTable(leather.hides),
    `## ${SECTIONS.settingOut.title}`,
    'Each wheel; both wheels are set out alike.',
    `![Wheel setting-out drawing](${SETTING_OUT_SVG_FILE})`,
    settingOutTable(setting_out),
    `Mortises at ${degreesList(setting_out.mortise_positions_deg)}${UNIT_SPACE}° from the first; felloe joints and dowels at ${degreesList(setting_out.dowel_positions_deg)}${UNIT_SPACE}°.`,
    fencedBlock(setting_out.basis.join('\n')),
  ];
}

function cutListTable(items: readonly CutListItem[]): string {
  if (items.length === 0) return 'No parts.';
  const rows = items.map((c) => [
    esc(c.part),
    String(c.quantity),
    String(c.spares),
    esc(c.species),
    sizeText(c.finished),
    sizeText(c.rough),
    esc(c.grain),
    c.steam_bent ? 'yes' : 'no',
    formatNumber(c.volume_m3, 'm³'),
    formatNumber(c.mass_kg, 'kg'),
    esc(c.basis),
  ]);
  const header = ['Part', 'Qty', 'Spares', 'Species', 'Finished L x W x T (mm)', 'Rough L x W x T (mm)', 'Grain', 'Steam-bent', 'Volume, one rough (m³)', 'Mass, one finished (kg)', 'Basis'];
  return table(header, rows, ['l', 'r', 'r', 'l', 'r', 'r', 'l', 'l', 'r', 'r', 'l']);
}

function cutListTotals(items: readonly CutListItem[]): string {
  const volume = items.reduce((s, c) => s + c.volume_m3 * (c.quantity + c.spares), 0);
  const mass = items.reduce((s, c) => s + c.mass_kg * c.quantity, 0);
  return `Rough timber, every piece with spares: ${formatNumber(volume, 'm³')}${UNIT_SPACE}m³. Finished mass of the parts fitted: ${formatNumber(mass, 'kg')}${UNIT_SPACE}kg.`;
}

function leatherTable(items: readonly LeatherItem[]): string {
  if (items.length === 0) return 'No straps or lashings.';
  const rows = items.map((i) => [
    esc(i.item),
    esc(i.material),
    String(i.quantity),
    formatNumber(i.width_mm, 'mm'),
    formatNumber(i.thickness_mm, 'mm'),
    formatNumber(i.length_mm, 'mm'),
    formatNumber(i.area_m2, 'm²'),
    esc(i.basis),
  ]);
  const header = ['Item', 'Material', 'Qty', 'Width (mm)', 'Thickness (mm)', 'Length, one (mm)', 'Area, all (m²)', 'Basis'];
  return table(header, rows, ['l', 'l', 'r', 'r', 'r', 'r', 'r', 'l']);
}

function hidesTable(hides: readonly HideNeed[]): string {
  if (hides.length === 0) return 'No hides needed.';
  const rows = hides.map((h) => [
    esc(h.material),
    formatNumber(h.area_m2, 'm²'),
    formatNumber(h.usable_hide_m2, 'm²'),
    formatNumber(h.waste_factor, ''),
    String(h.hides),
    esc(h.basis),
  ]);
  return table(['Material', 'Area (m²)', 'Usable hide (m²)', 'Waste factor', 'Hides', 'Basis'], rows, ['l', 'r', 'r', 'r', 'r', 'l']);
}

function settingOutTable(w: WheelSettingOut): string {
  const rows = settingOutRows(w)
    .filter((r) => !r.position) // the positions are listed on one line below the table
    .map((r) => [esc(r.label), r.value === null ? 'none (no tyre)' : `${formatNumber(r.value, r.unit)}${r.unit === 'count' ? '' : `${UNIT_SPACE}${r.unit}`}`]);
  return table(['Dimension', 'Value'], rows, ['l', 'r']);
}
