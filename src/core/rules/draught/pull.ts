import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';

// The pull the team must give to take the build up the design grade, against
// the pull horses give (design basis, section 3, Draught). A band: beyond the
// pull the team keeps up it warns (the team takes the grade only in short
// pulls), beyond the short pull it fails. Loads as they are: a capacity of
// animals, not a strength, takes no partial factor.

export const pull = defineRule({
  id: 'draught.pull',
  title: 'The team can draw the build up the design grade',
  checks: "The pull needed to draw the chariot, crew and loads up the design grade on the design ground (soil and hub rolling resistance, as the balance model takes them, plus the grade), against the pull the team keeps up and the short pull it can give: fractions of the lightest horse's weight times the team factor.",
  kind: 'check',
  method: ['design-basis-balance', 'peace-corps-animal-traction', 'baker-1903-tractive'],
  needs: ['draught', 'horse'],
  limits: { pull_fraction: { direction: 'max', unit: "of the team's body weight" } },
  // Read by the draught model; declared here so the data must hold them.
  params: ['team_factor_2', 'team_factor_3', 'team_factor_4', 'default_grade_pct'],
  messages: {
    within: { code: 2101, text: 'The pull up the design grade of {grade:%} on {ground} is {value:N}, within the {advisory:N} the team keeps up ({horses:1} × {mass:kg}, {basis}).' },
    sustained: { code: 2102, text: 'The pull up the design grade of {grade:%} on {ground} is {value:N}, more than the {advisory:N} the team keeps up ({horses:1} × {mass:kg}, {basis}): it can take the grade only in short pulls, up to {hard:N}.' },
    short: { code: 2103, text: 'The pull up the design grade of {grade:%} on {ground} is {value:N}, more than even the short pull of {hard:N} the team can give ({horses:1} × {mass:kg}, {basis}): this team cannot draw this load up the grade.' },
  },
  run(ctx) {
    const d = ctx.models.draught;
    const horse = ctx.models.horse;
    const lim = ctx.limit('pull_fraction');
    const ground = ctx.data.grounds[ctx.spec.operation.ground].name;
    ctx.report({
      subject: 'team.draught',
      label: 'pull up the design grade',
      message: { pass: 'within', warning: 'sustained', fail: 'short' },
      params: { grade: d.grade, ground, horses: d.horses, mass: d.horse_kg, basis: horse.basis_text },
      value: d.pull_N,
      unit: 'N',
      against: { limit: 'pull_fraction', times: d.team_weight_N },
      // A capacity of animals: the loads as they are, no partial factor.
      combination: 'characteristic',
      sources: d.sources,
      fix:
        lim.advisory !== null && d.pull_N > lim.advisory * d.team_weight_N
          ? 'Lighten the chariot or the crew, add a horse or use heavier horses, or plan a gentler route (give operation.grade_pct the steepest grade you will really drive up); walk the crew up a short steep pitch.'
          : 'None needed.',
      working: [
        ...d.working,
        ...(lim.advisory !== null ? [step('sustained pull = f_sustained·W_team (what the team keeps up)', `${num(lim.advisory)} × ${num(d.team_weight_N)}`, lim.advisory * d.team_weight_N, 'N')] : []),
        ...(lim.hard !== null ? [step('short pull = f_short·W_team (up a short grade only)', `${num(lim.hard)} × ${num(d.team_weight_N)}`, lim.hard * d.team_weight_N, 'N')] : []),
      ],
    });
  },
});
