import Qty from 'js-quantities';
import type { UnitDef } from './units.ts';

// A compound like "5 ft 4 in" is split where a unit is followed by a new
// number; each term is read by the units library and summed there.
const TERM_BREAK = /(?<=[A-Za-z°%"'])\s+(?=[-+]?\.?\d)/;

export type ParsedQuantity = { ok: true; value: number } | { ok: false; reason: string };

export function parseQuantity(text: string, unit: UnitDef): ParsedQuantity {
  const trimmed = text.trim();
  const terms = trimmed.split(TERM_BREAK);
  try {
    let total = Qty(terms[0].trim());
    for (const term of terms.slice(1)) total = total.add(Qty(term.trim()));
    if (!total.isCompatible(unit.qty)) {
      return { ok: false, reason: `"${text}" is in ${total.units()}, which cannot be converted to ${unit.symbol}` };
    }
    const value = total.to(unit.qty).scalar;
    if (!Number.isFinite(value)) return { ok: false, reason: `"${text}" is not a finite quantity` };
    return { ok: true, value };
  } catch (e) {
    return { ok: false, reason: `"${text}" is not a quantity the units library can read (${(e as Error).message})` };
  }
}
