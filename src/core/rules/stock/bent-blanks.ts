import { cutlistFactor } from '../../cutlist/cutlist-factors.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { partSubject } from './stock-subject.ts';

export const bentBlanks = defineRule({
  id: 'stock.bent-blanks',
  title: 'Blanks for steam bending',
  checks: "For each steam-bent part: how many blanks to cut, spares for the bends that fail included, their rough size with the bending form's end allowances, and the grain they need.",
  kind: 'note',
  method: ['design-basis-cutting'],
  needs: ['cutting'],
  limits: {},
  params: [],
  messages: {
    note: { code: 2721, text: '{part}: cut {blanks:1} {blankWord} ({quantity:1} + {spares:1} spare at {good:%} good bends), {length:1} × {width:1} × {thickness:mm} rough, from straight-grained {species} free of knots and run-out.' },
  },
  run(ctx) {
    const good = cutlistFactor(ctx.data, 'bend_good_fraction');
    const ends = cutlistFactor(ctx.data, 'bend_end_allowance_mm');
    for (const i of ctx.models.cutting.cut_list.filter((x) => x.steam_bent)) {
      const blanks = i.quantity + i.spares;
      ctx.report({
        subject: partSubject(i.part),
        label: i.part,
        message: 'note',
        params: { part: i.part, blanks, blankWord: blanks === 1 ? 'blank' : 'blanks', quantity: i.quantity, spares: i.spares, good: good.value, length: i.rough.length_mm, width: i.rough.width_mm, thickness: i.rough.thickness_mm, species: i.species },
        value: blanks,
        unit: 'blanks',
        severity: 'info',
        sources: [...good.sources, ...ends.sources],
        fix: 'Riven or straight-sawn stock with the grain running the whole length bends best; keep the spares until every bend has set, and replace the good fraction in rules/parameters/cutting.yaml with your own record of trial bends.',
        working: i.basis.split('\n'),
      });
    }
  },
});
