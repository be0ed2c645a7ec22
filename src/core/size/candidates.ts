import { stockSections } from '../cutlist/group-parts.ts';
import { inputRange } from '../decisive/input-range.ts';
import { specKey } from '../decisive/recording-proxy.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { bySize, dimsOf, type Dims, type Slot } from './members.ts';

// The sections a slot may take. From the stock list: each listed section of
// the part's species, either way round, less the machining allowance on each
// face (what planing leaves of the board). From the size series: whole steps
// of SERIES_STEP_MM in each dimension from SERIES_LOW to SERIES_HIGH times the
// section as given, within the range the specification's schema allows.

export const SERIES_STEP_MM = 5;
export const SERIES_LOW = 0.5;
export const SERIES_HIGH = 3;

export type Basis = 'stock' | 'series';

export const SERIES_TEXT = `whole ${SERIES_STEP_MM} mm steps in each dimension, from ${SERIES_LOW} to ${SERIES_HIGH} times the section as given, within the range the specification allows; the part's species kept`;
export const STOCK_TEXT = "each section the stock list gives in the part's species, either way round, less the machining allowance on each face (stock.allowance.face_mm); the part's species kept";

/** One dimension's series values, smallest first. */
export function seriesValues(slot: Slot, field: string, value: number): number[] {
  const range = inputRange({ key: specKey([...slot.at, field]), input: [...slot.at, field].join('.'), origin: 'spec', value, unit: 'mm', status: 'given' });
  const low = Math.max(range?.low ?? value, value * SERIES_LOW);
  const high = Math.min(range?.high ?? value, value * SERIES_HIGH);
  const out: number[] = [];
  for (let v = Math.ceil(low / SERIES_STEP_MM) * SERIES_STEP_MM; v <= high + 1e-9; v += SERIES_STEP_MM) out.push(v);
  return out;
}

/** The series in each of the slot's dimensions. */
export function seriesAxes(spec: CheckedSpecification, slot: Slot): number[][] {
  const dims = dimsOf(spec, slot);
  return slot.fields.map((f, i) => seriesValues(slot, f, dims[i]));
}

/** The finished sections the stock list gives for the slot, smallest first; null where it lists none of the part's species (or the part is not cut from stock). */
export function stockCandidates(spec: CheckedSpecification, slot: Slot): Dims[] | null {
  if (!slot.fromStock) return null;
  const own = stockSections(spec.stock).filter((s) => s.species === slot.species);
  if (own.length === 0) return null;
  const face = 2 * spec.stock.allowance.face_mm;
  const seen = new Set<string>();
  const out: Dims[] = [];
  for (const s of own) {
    const a = s.width_mm - face;
    const b = s.thickness_mm - face;
    const options: Dims[] = slot.fields.length === 1 ? [[Math.min(a, b)]] : [[a, b], [b, a]];
    for (const d of options) {
      const key = d.join('x');
      if (d.every((v) => v > 0) && !seen.has(key)) {
        seen.add(key);
        out.push(d);
      }
    }
  }
  return out.sort(bySize);
}
