import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { sectionSubject } from './stock-subject.ts';

const HEAD = '{species} {width:1} × {thickness:mm}: stock lengths to buy {stock:1}';
const BODY = 'parts cut {cuts:1}, waste {waste:%}';

export const stockPlanNote = defineRule({
  id: 'stock.plan',
  title: 'Stock to buy and how to cut it',
  checks: 'For each group of parts of one species and stock section: the stock lengths to buy, their cost, the waste, and how close the plan is to the least stock (the lower bound beside it).',
  kind: 'note',
  method: ['design-basis-cutting'],
  needs: ['cutting'],
  limits: {},
  params: [],
  messages: {
    proven: { code: 2711, text: `${HEAD}; ${BODY}; proven the least stock ({method}).{bent}` },
    pricedProven: { code: 2712, text: `${HEAD} costing {cost:1}; ${BODY}; proven the least cost ({method}).{bent}` },
    gap: { code: 2713, text: `${HEAD}; ${BODY}; {gap:%} above the lower bound of {bound:1} stock lengths ({method}).{bent}` },
    pricedGap: { code: 2714, text: `${HEAD} costing {cost:1}; ${BODY}; {gap:%} above the lower bound of {bound:1} in cost ({method}).{bent}` },
  },
  run(ctx) {
    const { cut_list, stock_plan } = ctx.models.cutting;
    for (const g of stock_plan.groups) {
      const p = g.plan;
      const labels = [...new Set(p.patterns.flatMap((x) => x.cuts.map((c) => c.label)))];
      const bent = labels.filter((l) => cut_list.find((i) => i.part === l)?.steam_bent);
      const cuts = p.patterns.reduce((s, x) => s + x.count * x.cuts.length, 0);
      const priced = p.cost !== null;
      const unit = priced ? 'in cost' : 'stock lengths';
      const buy = p.bought.map((b) => `${num(b.count)} × ${num(b.length_mm, 'mm')} mm`).join(', ');
      ctx.report({
        subject: sectionSubject(g.species, g.section),
        label: `${g.species} ${num(g.section.width_mm, 'mm')} × ${num(g.section.thickness_mm, 'mm')} mm`,
        message: priced ? (p.optimal ? 'pricedProven' : 'pricedGap') : p.optimal ? 'proven' : 'gap',
        params: {
          species: g.species,
          width: g.section.width_mm,
          thickness: g.section.thickness_mm,
          stock: p.pieces_used,
          ...(p.cost !== null ? { cost: p.cost } : {}),
          cuts,
          waste: p.waste_pct / 100,
          ...(p.optimal ? {} : { gap: p.gap, bound: p.lower_bound }),
          method: p.method,
          bent: bent.length ? ` Steam-bent blanks (${bent.join(', ')}): pick the straightest-grained lengths, free of knots and run-out, for them.` : '',
        },
        value: p.pieces_used,
        unit: 'stock pieces',
        severity: 'info',
        fix: p.optimal
          ? `Buy ${buy}; cut the patterns in the order shown, longest piece first.`
          : `Buy ${buy} and cut the patterns as shown; run the check with the solver loaded (the command line does) for a plan proven least or with a smaller gap.`,
        working: [
          `one-dimensional cutting stock over the listed lengths with saw kerf ${num(ctx.spec.stock.kerf_mm, 'mm')} mm; ${p.method}`,
          ...p.bought.map((b) => step(`buy ${num(b.length_mm, 'mm')} mm lengths`, '', b.count, 'pieces')),
          ...p.patterns.map((x) => `${num(x.count)} × ${num(x.stock_length_mm, 'mm')} mm: ${x.cuts.map((c) => `${c.label} ${num(c.length_mm, 'mm')}`).join(' | ')} | offcut ${num(x.offcut_mm, 'mm')}`),
          step('waste = (stock bought − pieces cut) / stock bought', `${num(p.waste_mm, 'mm')} mm of stock`, p.waste_pct, '%'),
          step(`lower bound, ${unit}`, '', p.lower_bound, priced ? '' : 'pieces'),
          step(`first-fit decreasing alone, ${unit}`, '', priced ? p.baseline.cost : p.baseline.pieces_used, priced ? '' : 'pieces'),
        ],
      });
    }
  },
});
