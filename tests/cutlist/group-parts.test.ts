import { describe, expect, it } from 'vitest';
import type { CutListItem } from '../../src/core/cutlist/cutting-result.ts';
import { groupParts, holds, stockSections } from '../../src/core/cutlist/group-parts.ts';
import { stockPlan } from '../../src/core/cutlist/stock-plan.ts';
import type { CheckedSpecification } from '../../src/core/spec/spec.types.ts';

// Parts and stock here are made up for the test (demo data).

type Stock = CheckedSpecification['stock'];
const stock = (lumber: Stock['lumber'], kerf_mm = 3): Stock => ({ grade: 'sawn', kerf_mm, allowance: { face_mm: 3, end_mm: 25 }, green: false, lumber, extra_parts: [] });

function part(p: string, species: string, L: number, w: number, t: number, quantity = 1, spares = 0): CutListItem {
  const size = { length_mm: L, width_mm: w, thickness_mm: t };
  return { part: p, quantity, species, finished: size, rough: size, grain: 'straight grain, sawn', steam_bent: spares > 0, spares, volume_m3: L * w * t * 1e-9, mass_kg: 0, basis: '', allowances: [] };
}

const ASH = [
  { species: 'white-ash', width_mm: 75, thickness_mm: 50, lengths_mm: [1800, 2400], price_per_m3: 1000 },
  { species: 'white-ash', width_mm: 100, thickness_mm: 100, lengths_mm: [3600] },
  { species: 'white-ash', width_mm: 50, thickness_mm: 75, lengths_mm: [3000], price_per_m3: 1200 },
];

describe('grouping parts into cutting problems', () => {
  it('a section holds a rough section either way round', () => {
    expect(holds({ width_mm: 75, thickness_mm: 50 }, 70, 45)).toBe(true);
    expect(holds({ width_mm: 75, thickness_mm: 50 }, 45, 70)).toBe(true);
    expect(holds({ width_mm: 75, thickness_mm: 50 }, 75, 50)).toBe(true); // equal fits
    expect(holds({ width_mm: 75, thickness_mm: 50 }, 76, 40)).toBe(false);
    expect(holds({ width_mm: 75, thickness_mm: 50 }, 51, 51)).toBe(false);
  });

  it('merges a section listed both ways round, keeping every length and its price', () => {
    const s = stockSections(stock(ASH));
    expect(s).toHaveLength(2);
    const small = s.find((x) => x.width_mm === 75)!;
    // price_per_m3 × section × length: 1000 × 0.075 × 0.05 × 1.8 = 6.75; 1200 × 0.05 × 0.075 × 3 = 13.5.
    expect(small.lengths).toEqual([{ length_mm: 1800, cost: 6.75 }, { length_mm: 2400, cost: 9 }, { length_mm: 3000, cost: 13.5 }]);
  });

  it('puts each part in the smallest section of its species that holds it, either way round', () => {
    const items = [part('rail', 'white-ash', 1200, 70, 45, 2), part('turned rail', 'white-ash', 900, 45, 70), part('beam', 'white-ash', 2000, 80, 40), part('long rail', 'white-ash', 3400, 60, 40)];
    const { groups, unserved } = groupParts(items, stock(ASH, 4));
    expect(unserved).toEqual([]);
    expect(groups).toHaveLength(2);
    const [small, big] = [groups.find((g) => g.section.width_mm === 75)!, groups.find((g) => g.section.width_mm === 100)!];
    expect(small.instance.kerf_mm).toBe(4);
    expect(small.instance.pieces).toEqual([{ length_mm: 1200, quantity: 2, label: 'rail' }, { length_mm: 900, quantity: 1, label: 'turned rail' }]);
    // 80 mm does not fit 75 × 50 either way; 3400 mm fits the 75 × 50 section's section but not its lengths (longest 3000).
    expect(big.instance.pieces.map((p) => p.label)).toEqual(['beam', 'long rail']);
    // No price for 100 × 100: its stock carries no cost, and the planner counts pieces.
    expect(big.instance.stock).toEqual([{ length_mm: 3600, cost: undefined }]);
  });

  it('orders the spares of steam-bent blanks with the parts', () => {
    const { groups } = groupParts([part('pole', 'white-ash', 2300, 70, 45, 1, 1)], stock(ASH));
    expect(groups[0].instance.pieces).toEqual([{ length_mm: 2300, quantity: 2, label: 'pole' }]);
  });

  it('sets aside what no listed stock serves, and says what to buy', () => {
    const items = [part('yoke', 'white-oak', 1100, 60, 60), part('nave', 'white-ash', 380, 166, 166, 2), part('pole', 'white-ash', 3700, 70, 70, 1, 1), part('boundary', 'white-ash', 3600, 100, 100)];
    const { groups, unserved } = groupParts(items, stock(ASH));
    expect(unserved.map((u) => u.part)).toEqual(['yoke', 'nave', 'pole']);
    expect(unserved[0].reason).toBe('no white-oak stock is listed');
    expect(unserved[0].buy).toBe('white-oak at least 60 × 60 mm in section and 1100 mm long, 1 piece');
    expect(unserved[1].reason).toContain('no listed white-ash section holds 166 × 166 mm');
    expect(unserved[1].buy).toBe('white-ash at least 166 × 166 mm in section and 380 mm long, 2 pieces');
    expect(unserved[2].reason).toContain('3700 mm is longer than any listed white-ash length');
    expect(unserved[2].buy).toContain('100 × 100 mm in 3700 mm or longer');
    expect(unserved[2].buy).toContain('straight-grained and free of knots and run-out for steam bending');
    // A part exactly as long and as large as the stock is served.
    expect(groups.flatMap((g) => g.instance.pieces.map((p) => p.label))).toEqual(['boundary']);
  });

  it('totals the groups: pieces, cost where every group is priced, waste over the stock bought', () => {
    const items = [part('rail', 'white-ash', 1200, 70, 45, 3), part('beam', 'white-ash', 2000, 80, 40, 2)];
    const { groups, unserved } = groupParts(items, stock(ASH));
    const plan = stockPlan(groups, unserved, undefined);
    expect(plan.groups).toHaveLength(2);
    expect(plan.pieces).toBe(plan.groups.reduce((s, g) => s + g.plan.pieces_used, 0));
    expect(plan.cost).toBeNull(); // the 100 × 100 section has no price
    const bought = plan.groups.reduce((s, g) => s + g.plan.bought.reduce((t, b) => t + b.length_mm * b.count, 0), 0);
    const cut = 3 * 1200 + 2 * 2000;
    expect(plan.waste_pct).toBeCloseTo((100 * (bought - cut)) / bought, 9);
    const priced = stockPlan(groupParts([items[0]], stock(ASH)).groups, [], undefined);
    expect(priced.cost).toBe(priced.groups[0].plan.cost);
  });
});
