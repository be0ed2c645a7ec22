import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { CuttingInstance } from '../stock/cutting-types.ts';
import type { CutListItem } from './cutting-result.ts';

// The cut list as cutting problems (mechanics note, section 9): each part
// goes to the smallest listed section of its species that holds its rough
// section either way round and comes in a length as long as the part; the
// parts of one species and section make one one-dimensional cutting-stock
// problem over that section's listed lengths. Parts no listed stock serves
// are set aside with what to buy instead.

type Stock = CheckedSpecification['stock'];

export interface StockSection {
  species: string;
  width_mm: number;
  thickness_mm: number;
  /** Each listed length with its price where one is given (the cheapest where a length is listed twice). */
  lengths: { length_mm: number; cost?: number }[];
}

export interface CuttingGroup {
  species: string;
  section: { width_mm: number; thickness_mm: number };
  instance: CuttingInstance;
}

export interface UnservedPart {
  part: string;
  reason: string;
  buy: string;
}

const M3_PER_MM3 = 1e-9;
const area = (s: { width_mm: number; thickness_mm: number }) => s.width_mm * s.thickness_mm;

/** True when a section w x t holds a rough section a x b, either way round. */
export function holds(s: { width_mm: number; thickness_mm: number }, a: number, b: number): boolean {
  return (s.width_mm >= a && s.thickness_mm >= b) || (s.width_mm >= b && s.thickness_mm >= a);
}

/** The listed stock merged by species and section (a section listed as w x t or t x w is one). */
export function stockSections(stock: Stock): StockSection[] {
  const out = new Map<string, StockSection>();
  for (const l of stock.lumber) {
    const key = `${l.species}|${Math.max(l.width_mm, l.thickness_mm)}|${Math.min(l.width_mm, l.thickness_mm)}`;
    const s = out.get(key) ?? { species: l.species, width_mm: l.width_mm, thickness_mm: l.thickness_mm, lengths: [] };
    for (const length_mm of l.lengths_mm) {
      const cost = l.price_per_m3 === undefined ? undefined : l.price_per_m3 * l.width_mm * l.thickness_mm * length_mm * M3_PER_MM3;
      const had = s.lengths.find((x) => x.length_mm === length_mm);
      if (!had) s.lengths.push({ length_mm, cost });
      else if (cost !== undefined && (had.cost === undefined || cost < had.cost)) had.cost = cost;
    }
    out.set(key, s);
  }
  return [...out.values()];
}

export function groupParts(items: CutListItem[], stock: Stock): { groups: CuttingGroup[]; unserved: UnservedPart[] } {
  const sections = stockSections(stock);
  const groups = new Map<StockSection, CuttingGroup>();
  const unserved: UnservedPart[] = [];
  for (const item of items) {
    const { length_mm: L, width_mm: w, thickness_mm: t } = item.rough;
    const count = item.quantity + item.spares;
    const own = sections.filter((s) => s.species === item.species);
    const holding = own.filter((s) => holds(s, w, t)).sort((a, b) => area(a) - area(b));
    const longest = (s: StockSection) => Math.max(...s.lengths.map((x) => x.length_mm));
    const chosen = holding.find((s) => longest(s) >= L);
    if (chosen) {
      const g: CuttingGroup = groups.get(chosen) ?? { species: chosen.species, section: { width_mm: chosen.width_mm, thickness_mm: chosen.thickness_mm }, instance: { kerf_mm: stock.kerf_mm, stock: chosen.lengths.map((x) => ({ ...x })), pieces: [] } };
      g.instance.pieces.push({ length_mm: L, quantity: count, label: item.part });
      groups.set(chosen, g);
      continue;
    }
    const need = `${item.species} at least ${w} × ${t} mm in section and ${L} mm long, ${count} piece${count > 1 ? 's' : ''}${item.spares ? ` (${item.quantity} + ${item.spares} spare for bending)` : ''}`;
    const bent = item.steam_bent ? ', straight-grained and free of knots and run-out for steam bending' : '';
    const listed = (list: StockSection[]) => list.map((s) => `${s.width_mm} × ${s.thickness_mm} mm`).join(', ');
    if (own.length === 0) {
      unserved.push({ part: item.part, reason: `no ${item.species} stock is listed`, buy: `${need}${bent}` });
    } else if (holding.length === 0) {
      unserved.push({ part: item.part, reason: `no listed ${item.species} section holds ${w} × ${t} mm (listed: ${listed(own)})`, buy: `${need}${bent}` });
    } else {
      const best = holding.reduce((a, b) => (longest(b) > longest(a) ? b : a));
      unserved.push({ part: item.part, reason: `${L} mm is longer than any listed ${item.species} length of a section that holds it (longest ${longest(best)} mm, ${best.width_mm} × ${best.thickness_mm} mm)`, buy: `${need}, or ${best.width_mm} × ${best.thickness_mm} mm in ${L} mm or longer${bent}` });
    }
  }
  return { groups: [...groups.values()], unserved };
}
