import { cutlistFactor } from '../../cutlist/cutlist-factors.ts';
import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';

export const bentBlanks: Rule = {
  id: 'stock.bent-blanks',
  title: 'Blanks for steam bending',
  checks: 'For each steam-bent part: how many blanks to cut, spares for the bends that fail included, their rough size with the bending form\'s end allowances, and the grain they need.',
  kind: 'note',
  limits: [],
  run(ctx) {
    const good = cutlistFactor(ctx.data, 'bend_good_fraction');
    const ends = cutlistFactor(ctx.data, 'bend_end_allowance_mm');
    return ctx.analysis.cutting.cut_list
      .filter((i) => i.steam_bent)
      .map((i) => {
        const blanks = i.quantity + i.spares;
        return makeFinding(this.id, {
          severity: 'advice',
          subject: i.part,
          value: blanks,
          unit: 'blanks',
          limit: null,
          message: 'bentBlanks',
          params: { part: i.part, blanks, plural: blanks > 1 ? 's' : '', quantity: i.quantity, spares: i.spares, good: Math.round(100 * good.value), size: `${i.rough.length_mm} × ${i.rough.width_mm} × ${i.rough.thickness_mm}`, species: i.species },
          fix: 'Riven or straight-sawn stock with the grain running the whole length bends best; keep the spares until every bend has set, and replace the good fraction in rules/limits/stock.yaml with your own record of trial bends.',
          source: `cutlist.bend_good_fraction: ${good.source}; cutlist.bend_end_allowance_mm: ${ends.source}`,
          working: i.basis,
        });
      });
  },
};
