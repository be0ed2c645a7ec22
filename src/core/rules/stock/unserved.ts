import { holds } from '../../cutlist/group-parts.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { partSubject, speciesSubject } from './stock-subject.ts';

const RULE = 'each part is cut from the smallest listed section of its species that holds its rough section, in a listed length at least as long as the part';
const BENT = ' The blank is steam-bent: it must be straight-grained and free of knots and run-out for steam bending.';

export const stockUnserved = defineRule({
  id: 'stock.unserved',
  title: 'Parts no listed stock serves',
  checks: 'Each part of the cut list has listed stock of its species, in a section that holds its rough section either way round and a length at least as long as the part; where none does, it says what to buy instead.',
  kind: 'note',
  method: ['design-basis-cutting'],
  needs: ['cutting'],
  limits: {},
  params: [],
  messages: {
    noSpecies: { code: 2701, text: 'No {species} stock is listed, so {parts} cannot be planned: list it under stock.lumber, or buy the sizes the working gives.' },
    noSection: { code: 2702, text: '{part}: no listed {species} section holds its rough section of {width:1} × {thickness:mm}; buy {species} at least that large in section and {length:mm} long, {count:1} in all.{bent}' },
    tooLong: { code: 2703, text: '{part}: its rough length of {value:mm} is longer than any listed {species} length of a section that holds it (the longest is {longest:mm}); buy it that long or longer, {count:1} in all.{bent}' },
    allServed: { code: 2704, text: 'Every part of the cut list is cut from the listed stock ({groups:1} groups by species and section).' },
  },
  run(ctx) {
    const { cut_list, stock_plan } = ctx.models.cutting;
    const lumber = ctx.spec.stock.lumber;
    if (stock_plan.unserved.length === 0) {
      ctx.report({
        subject: 'stock',
        label: 'listed stock',
        message: 'allServed',
        params: { groups: stock_plan.groups.length },
        severity: 'info',
        fix: 'None needed; stock.plan gives the cutting.',
        working: [RULE, ...stock_plan.groups.map((g) => `${g.species} ${num(g.section.width_mm, 'mm')} × ${num(g.section.thickness_mm, 'mm')} mm: ${[...new Set(g.plan.patterns.flatMap((p) => p.cuts.map((c) => c.label)))].join(', ')}`)],
      });
      return;
    }
    const rows = stock_plan.unserved.map((u) => ({ u, item: cut_list.find((i) => i.part === u.part)! }));
    const size = (r: (typeof rows)[number]) => `rough ${num(r.item.rough.length_mm, 'mm')} × ${num(r.item.rough.width_mm, 'mm')} × ${num(r.item.rough.thickness_mm, 'mm')} mm × ${r.item.quantity + r.item.spares}`;
    const unlisted = [...new Set(rows.filter((r) => !lumber.some((l) => l.species === r.item.species)).map((r) => r.item.species))];
    for (const species of unlisted) {
      const mine = rows.filter((r) => r.item.species === species);
      ctx.report({
        subject: speciesSubject(species),
        label: `${species} stock`,
        message: 'noSpecies',
        params: { species, parts: mine.map((r) => r.u.part).join(', ') },
        severity: 'info',
        fix: `List the ${species} you can buy under stock.lumber (species, width_mm, thickness_mm, lengths_mm and price_per_m3), or buy the sizes the working gives.`,
        working: [RULE, ...mine.flatMap((r) => [`${r.u.part}: ${size(r)}`, `buy for the ${r.u.part}: ${r.u.buy}`])],
      });
    }
    for (const { u, item } of rows) {
      const own = lumber.filter((l) => l.species === item.species);
      if (own.length === 0) continue;
      const { length_mm, width_mm, thickness_mm } = item.rough;
      const holding = own.filter((l) => holds(l, width_mm, thickness_mm));
      const count = item.quantity + item.spares;
      const common = {
        subject: partSubject(u.part),
        label: u.part,
        severity: 'info' as const,
        working: [
          RULE,
          `${u.part}: rough ${num(length_mm, 'mm')} × ${num(width_mm, 'mm')} × ${num(thickness_mm, 'mm')} mm (${item.quantity} + ${item.spares} spare)`,
          ...own.map((l) => `listed ${l.species} ${num(l.width_mm, 'mm')} × ${num(l.thickness_mm, 'mm')} mm in ${l.lengths_mm.map((x) => num(x, 'mm')).join(', ')} mm: ${holds(l, width_mm, thickness_mm) ? 'holds the section' : 'too small in section'}`),
          `${u.reason}; buy ${u.buy}`,
        ],
      };
      const bent = item.steam_bent ? BENT : '';
      if (holding.length === 0) {
        ctx.report({
          ...common,
          message: 'noSection',
          params: { part: u.part, species: item.species, width: width_mm, thickness: thickness_mm, length: length_mm, count, bent },
          fix: 'Add a larger section to stock.lumber, or buy the section shown.',
        });
        continue;
      }
      const longest = Math.max(...holding.flatMap((l) => l.lengths_mm));
      ctx.report({
        ...common,
        message: 'tooLong',
        params: { part: u.part, species: item.species, longest, count, bent },
        value: length_mm,
        unit: 'mm',
        fix: 'Ask for a longer length, or list one under stock.lumber; or scarf the part from two lengths if the design allows a joint there.',
        working: [...common.working, step('the longest listed length of a section that holds it', '', longest, 'mm')],
      });
    }
  },
});
