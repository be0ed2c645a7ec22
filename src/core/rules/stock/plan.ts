import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';

const f2 = (v: number) => Number(v.toFixed(2)).toString();

export const stockPlanNote: Rule = {
  id: 'stock.plan',
  title: 'Stock to buy and how to cut it',
  checks: 'For each group of parts of one species and stock section: the stock lengths to buy, their cost, the waste, and how close the plan is to the least stock (the lower bound beside it).',
  kind: 'note',
  limits: [],
  run(ctx) {
    const { cut_list, stock_plan } = ctx.analysis.cutting;
    return stock_plan.groups.map((g) => {
      const p = g.plan;
      const section = `${g.section.width_mm} × ${g.section.thickness_mm}`;
      const labels = [...new Set(p.patterns.flatMap((x) => x.cuts.map((c) => c.label)))];
      const bent = labels.filter((l) => cut_list.find((i) => i.part === l)?.steam_bent);
      const cuts = p.patterns.reduce((s, x) => s + x.count * x.cuts.length, 0);
      const unit = p.cost === null ? 'stock pieces' : 'in cost';
      const proof = p.optimal ? `proven least (${p.method})` : `${f2(100 * p.gap)} % above the lower bound of ${f2(p.lower_bound)} ${unit} (${p.method})`;
      return makeFinding(this.id, {
        severity: 'advice',
        subject: `${g.species} ${section} mm`,
        value: p.pieces_used,
        unit: 'stock pieces',
        limit: null,
        message: 'stockPlanGroup',
        params: {
          species: g.species,
          section,
          bought: p.bought.map((b) => `${b.count} × ${b.length_mm} mm`).join(', '),
          cost: p.cost === null ? '' : ` for ${f2(p.cost)}`,
          cuts: `${cuts} piece${cuts === 1 ? '' : 's'}`,
          waste: f2(p.waste_pct),
          proof,
          note: bent.length ? ` Steam-bent blanks (${bent.join(', ')}): pick the straightest-grained lengths, free of knots and run-out, for them.` : '',
        },
        fix: p.optimal ? 'None needed; cut the patterns in the order shown, longest piece first.' : 'Cut the patterns as shown; run the check with the solver loaded (the command line does) for a plan proven least or with a smaller gap.',
        source: `mechanics note, section 9: one-dimensional cutting stock over the listed lengths with saw kerf ${ctx.spec.stock.kerf_mm} mm; ${p.method}`,
        working: [
          ...p.patterns.map((x) => `${x.count} × ${x.stock_length_mm} mm: ${x.cuts.map((c) => `${c.label} ${c.length_mm}`).join(' | ')} | offcut ${f2(x.offcut_mm)}`),
          `waste ${f2(p.waste_mm)} mm = ${f2(p.waste_pct)} % of the stock bought; lower bound ${f2(p.lower_bound)} ${unit}; first-fit decreasing alone: ${p.baseline.pieces_used} pieces${p.baseline.cost === null ? '' : ` for ${f2(p.baseline.cost)}`}`,
        ].join('\n'),
      });
    });
  },
};
