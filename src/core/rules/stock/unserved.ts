import { holds } from '../../cutlist/group-parts.ts';
import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import type { Finding } from '../../findings/finding.ts';

const SOURCE = 'mechanics note, section 9: each part is cut from the smallest listed section of its species that holds its rough section, in a listed length at least as long as the part';

export const stockUnserved: Rule = {
  id: 'stock.unserved',
  title: 'Parts no listed stock serves',
  checks: 'Each part of the cut list has listed stock of its species, in a section that holds its rough section either way round and a length at least as long as the part; where none does, it says what to buy instead.',
  kind: 'note',
  limits: [],
  run(ctx) {
    const { cut_list, stock_plan } = ctx.analysis.cutting;
    const lumber = ctx.spec.stock.lumber;
    if (stock_plan.unserved.length === 0) {
      return [makeFinding(this.id, { severity: 'pass', subject: 'stock', value: null, unit: '', limit: null, message: 'stockAllServed', params: { groups: stock_plan.groups.length }, fix: 'None needed; stock.plan gives the cutting.', source: SOURCE, working: stock_plan.groups.map((g) => `${g.species} ${g.section.width_mm} × ${g.section.thickness_mm} mm: ${g.plan.patterns.flatMap((p) => p.cuts.map((c) => c.label)).filter((v, i, a) => a.indexOf(v) === i).join(', ')}`).join('\n') })];
    }
    const rows = stock_plan.unserved.map((u) => ({ u, item: cut_list.find((i) => i.part === u.part)! }));
    const out: Finding[] = [];
    const unlisted = [...new Set(rows.filter((r) => !lumber.some((l) => l.species === r.item.species)).map((r) => r.item.species))];
    for (const species of unlisted) {
      const mine = rows.filter((r) => r.item.species === species);
      out.push(makeFinding(this.id, {
        severity: 'advice',
        subject: `${species} stock`,
        value: null,
        unit: '',
        limit: null,
        message: 'stockNoSpecies',
        params: { species, parts: mine.map((r) => r.u.part).join(', '), buy: mine.map((r) => `for the ${r.u.part}, ${r.u.buy.replace(`${species} `, '')}`).join('; ') },
        fix: `List the ${species} you can buy under stock.lumber (species, width_mm, thickness_mm, lengths_mm and price_per_m3), or buy the sizes shown.`,
        source: SOURCE,
        working: mine.map((r) => `${r.u.part}: rough ${r.item.rough.length_mm} × ${r.item.rough.width_mm} × ${r.item.rough.thickness_mm} mm × ${r.item.quantity + r.item.spares}`).join('\n'),
      }));
    }
    for (const { u, item } of rows) {
      const own = lumber.filter((l) => l.species === item.species);
      if (own.length === 0) continue;
      const sectionFits = own.some((l) => holds(l, item.rough.width_mm, item.rough.thickness_mm));
      out.push(makeFinding(this.id, {
        severity: 'advice',
        subject: u.part,
        value: sectionFits ? item.rough.length_mm : null,
        unit: sectionFits ? 'mm' : '',
        limit: sectionFits ? Math.max(...own.filter((l) => holds(l, item.rough.width_mm, item.rough.thickness_mm)).flatMap((l) => l.lengths_mm)) : null,
        message: sectionFits ? 'stockTooLong' : 'stockNoSection',
        params: { part: u.part, reason: u.reason, buy: u.buy },
        fix: sectionFits ? 'Ask for a longer length, or list one under stock.lumber; or scarf the part from two lengths if the design allows a joint there.' : 'Add a larger section to stock.lumber, or buy the section shown.',
        source: SOURCE,
        working: [
          `${u.part}: rough ${item.rough.length_mm} × ${item.rough.width_mm} × ${item.rough.thickness_mm} mm (${item.quantity} + ${item.spares} spare)`,
          ...own.map((l) => `listed ${l.species} ${l.width_mm} × ${l.thickness_mm} mm in ${l.lengths_mm.join(', ')} mm: ${holds(l, item.rough.width_mm, item.rough.thickness_mm) ? 'holds the section' : 'too small in section'}`),
        ].join('\n'),
      }));
    }
    return out;
  },
};
