import type { Limit, RulesData } from '../data/rules-data.ts';
import type { CutAllowance } from './cutting-result.ts';
import type { Size } from './size.ts';
import { shrinkDirections } from './orientation.ts';
import { fmt, type PartDemand } from './part-demand.ts';
import { greenSize, shrinkageTo } from './shrinkage.ts';

// Rough size of a blank (mechanics note, section 9): machining allowance on
// each face and end; a steam-bent blank takes the bending form's end
// allowance instead where it is larger; green work is cut oversize across
// the grain by the Wood Handbook shrinkage relation (shrinkage.ts). Length
// is not sized for shrinkage: along the grain wood shrinks only 0.1 to 0.2 %
// (Wood Handbook, FPL-GTR-190, chapter 4), well inside the end allowance.
// Rough sizes are rounded up to the whole millimetre.

export interface Allowances {
  face_mm: number;
  end_mm: number;
  bendEnd: Limit;
  green: boolean;
  /** Moisture content the parts dry to, %. */
  M: number;
}

const up = (v: number) => Math.ceil(v - 1e-6);

export function roughSize(d: PartDemand, a: Allowances, data: RulesData): { rough: Size; lines: string[]; allowances: CutAllowance[] } {
  const lines: string[] = [];
  const byForm = d.steamBent && a.bendEnd.value > a.end_mm;
  const endEach = byForm ? a.bendEnd.value : a.end_mm;
  const allowances: CutAllowance[] = [
    byForm
      ? { what: 'bending-form ends', from: 'cutlist.bend_end_allowance_mm', value: a.bendEnd.value, unit: 'mm', sources: a.bendEnd.sources }
      : { what: 'ends', from: 'stock.allowance.end_mm', value: a.end_mm, unit: 'mm', sources: [] },
    { what: 'faces', from: 'stock.allowance.face_mm', value: a.face_mm, unit: 'mm', sources: [] },
  ];
  const length = up(d.blank.length_mm + 2 * endEach);
  lines.push(
    `length ${fmt(d.blank.length_mm)} + 2 × ${fmt(endEach)} ${d.steamBent ? `(bending form ends, cutlist.bend_end_allowance_mm ${a.bendEnd.value} mm, or the machining allowance ${a.end_mm} mm if larger)` : '(machining, stock.allowance.end_mm)'} = ${length} mm`,
  );
  const dirs = shrinkDirections(d.orientation, d.round);
  const shrink = data.species[d.species].shrinkage_pct;
  const across = (name: 'width' | 'thickness', net: number): number => {
    const dry = net + 2 * a.face_mm;
    if (!a.green) {
      const r = up(dry);
      lines.push(`${name} ${fmt(net)} + 2 × ${a.face_mm} (stock.allowance.face_mm) = ${r} mm`);
      return r;
    }
    const dir = dirs[name];
    const S0 = shrink[dir].value;
    if (!allowances.some((x) => x.what === `green shrinkage, ${dir}`)) {
      allowances.push({ what: `green shrinkage, ${dir}`, from: `species ${d.species}, shrinkage_pct.${dir}`, value: S0, unit: '%', sources: shrink[dir].sources });
    }
    const SM = shrinkageTo(S0, a.M);
    const r = up(greenSize(dry, S0, a.M));
    lines.push(`${name} green: (${fmt(net)} + 2 × ${a.face_mm}) / (1 − ${fmt(SM, 3)}/100) = ${r} mm (${dir}: S_0 ${S0} %, ${shrink[dir].source}; S_M = ${S0} × (30 − ${a.M})/30 = ${fmt(SM, 3)} %)`);
    return r;
  };
  const width = across('width', d.blank.width_mm);
  const thickness = across('thickness', d.blank.thickness_mm);
  if (a.green) lines.push(`cut green and dried to ${a.M} % (stock.green): cut at d/(1 − S_M/100), S_M = S_0 (30 − M)/30 (Wood Handbook, FPL-GTR-190, chapter 4); ${dirs.why}`);
  lines.push('rough sizes rounded up to the whole mm');
  return { rough: { length_mm: length, width_mm: width, thickness_mm: thickness }, lines, allowances };
}
