import { gradeUpper, makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import type { LoadCaseResult } from '../../model/load-case-result.ts';
import { G } from '../../units/units.ts';

export const horseLoad: Rule = {
  id: 'balance.horse-load',
  title: 'Load on each horse',
  checks: "The yoke load each horse carries, standing with the crew as placed and in the worst load case, as a fraction of the lightest horse's body weight.",
  kind: 'check',
  limits: ['advisory_fraction', 'hard_fraction'],
  run(ctx) {
    const { team } = ctx.spec;
    const adv = ctx.limit('advisory_fraction');
    const hard = ctx.limit('hard_fraction');
    const weight = team.horse_mass_kg * G;
    const advN = adv.value * weight;
    const hardN = hard.value * weight;
    const cases = ctx.analysis.loadCases;
    const stat = cases.find((c) => c.id === 'static')!;
    const worst = cases.reduce((w, c) => (c.per_horse_N > w.per_horse_N ? c : w));
    const subjects = worst.id === stat.id ? [stat] : [stat, worst];
    return subjects.map((c: LoadCaseResult) => {
      const severity = gradeUpper(c.per_horse_N, advN, hardN);
      const over = severity === 'fail' ? { level: 'hard', lim: hard, N: hardN } : { level: 'advisory', lim: adv, N: advN };
      return makeFinding(this.id, {
        severity,
        subject: c.title,
        value: c.per_horse_N,
        unit: 'N',
        limit: over.N,
        message: severity === 'pass' ? 'horseLoadWithin' : 'horseLoadOver',
        params: { value: c.per_horse_N.toFixed(0), case: c.title, pct: ((100 * c.per_horse_N) / weight).toFixed(1), level: over.level, limitPct: (100 * over.lim.value).toFixed(1) },
        fix: severity === 'pass'
          ? 'None needed; confirm the load with an equine professional before driving.'
          : 'Move the axle forward (towards the floor centre), move the crew or load back, or lighten the pole and yoke; confirm any limit with an equine professional.',
        source: over.lim.source,
        working: `${c.working}\nlimit per horse = fraction × m_horse × g: advisory ${adv.value} × ${team.horse_mass_kg} kg × ${G} = ${advN.toFixed(1)} N; hard ${hard.value} × ${team.horse_mass_kg} × ${G} = ${hardN.toFixed(1)} N\nutilisation = ${c.per_horse_N.toFixed(1)} / ${over.N.toFixed(1)} = ${(c.per_horse_N / over.N).toFixed(3)}`,
      });
    });
  },
};
