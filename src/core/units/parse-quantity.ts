import Qty from 'js-quantities';
import { echo } from '../diagnostics/echo.ts';
import type { UnitDef } from './units.ts';

// A compound like "5 ft 4 in" is split where a unit is followed by a new
// number; each term is read by the units library and summed there.
const TERM_BREAK = /(?<=[A-Za-z°%"'])\s+(?=[-+]?\.?\d)/;

// The units library looks unit names up in plain objects, where these names
// are inherited properties, not units: "5 constructor" would reach its
// internals instead of being refused as an unknown unit.
const INHERITED = new Set(Object.getOwnPropertyNames(Object.prototype));

export type ParsedQuantity = { ok: true; value: number } | { ok: false; reason: string };

export function parseQuantity(text: string, unit: UnitDef): ParsedQuantity {
  const shown = `"${echo(text)}"`;
  const trimmed = text.trim();
  const inherited = (trimmed.match(/[A-Za-z_$]+/g) ?? []).find((word) => INHERITED.has(word));
  if (inherited !== undefined) return { ok: false, reason: `${shown} is not a quantity the units library can read ("${inherited}" is not a unit)` };
  const terms = trimmed.split(TERM_BREAK);
  try {
    let total = Qty(terms[0].trim());
    for (const term of terms.slice(1)) total = total.add(Qty(term.trim()));
    if (!total.isCompatible(unit.qty)) {
      return { ok: false, reason: `${shown} is in ${total.units()}, which cannot be converted to ${unit.symbol}` };
    }
    const value = total.to(unit.qty).scalar;
    if (!Number.isFinite(value)) return { ok: false, reason: `${shown} is not a finite quantity` };
    return { ok: true, value };
  } catch (e) {
    // The library's own refusals name the trouble; anything else is its internals and says nothing to a reader.
    const why = e instanceof Qty.Error ? ` (${e.message})` : '';
    return { ok: false, reason: `${shown} is not a quantity the units library can read${why}` };
  }
}
