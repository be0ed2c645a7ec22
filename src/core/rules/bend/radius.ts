import { formatQuantity } from '../../format/number-format.ts';
import { bentParts } from '../../model/bent-parts.ts';
import { defineRule, type LimitSpec } from '../../pipeline/define-rule.ts';
import { grade } from '../../pipeline/grade.ts';
import { num, step } from '../../pipeline/step.ts';

// Steaming and moisture practice for the fix text (reference figures, steam bending).
const PRACTICE = 'steam about one hour per 25 mm of thickness (common practice), bend at about 16 % moisture for mild bends and 20 to 25 % for severe ones, and make trial bends on your own stock: the species figures are from memory';

const RADIUS_RATIO: LimitSpec = { direction: 'min', unit: "times the species' least radius / thickness" };

export const bendRadius = defineRule({
  id: 'bend.radius',
  title: 'Steam-bend radius',
  checks: "Each steam-bent part's inner bend radius over its thickness in the plane of the bend, against the least ratio the species takes, with or without a supporting strap as the specification says.",
  kind: 'check',
  method: ['design-basis-members'],
  needs: [],
  limits: { radius_ratio: RADIUS_RATIO },
  params: [],
  messages: {
    within: { code: 2401, text: '{part}: bend radius over thickness {value:1} ({radius:mm} / {thickness:mm}) is not below the {species} limit {limit:1} {strap}.' },
    tight: { code: 2402, text: '{part}: bend radius over thickness {value:1} ({radius:mm} / {thickness:mm}) is below the {species} limit {limit:1} {strap}: expect the outer face to break or the inner face to buckle.' },
    noData: { code: 2403, text: '{part}: no steam-bending figure is held for {species} {strap}; the ratio {value:1} ({radius:mm} / {thickness:mm}) cannot be confirmed.' },
  },
  run(ctx) {
    const lim = ctx.limit('radius_ratio');
    for (const b of bentParts(ctx.spec)) {
      const sp = ctx.data.species[b.species];
      const mode = b.strap ? 'supported' : 'unsupported';
      const figure = sp.steam_bend_ratio[mode];
      const ratio = b.innerRadius / b.thickness;
      const common = {
        subject: `part.${b.id}`,
        label: b.part,
        params: { part: b.part, radius: b.innerRadius, thickness: b.thickness, species: b.species, strap: b.strap ? 'bent with a supporting strap' : 'bent without a strap' },
        value: ratio,
        unit: '',
      };
      const geometry = [
        step(`${b.key} (on the ${b.measuredOn})`, '', b.givenRadius, 'mm'),
        ...(b.measuredOn === 'centre line' ? [step('inner face R_i = R − t/2', `${num(b.givenRadius)} − ${num(b.thickness)}/2`, b.innerRadius, 'mm')] : []),
        step(`t, the ${b.thicknessName} (in the plane of the bend)`, '', b.thickness, 'mm'),
        step('R_i / t', `${num(b.innerRadius)} / ${num(b.thickness)}`, ratio, '1'),
      ];
      if (figure === null) {
        // No figure to compare with: flagged, never passed.
        ctx.report({
          ...common,
          message: 'noData',
          severity: 'warning',
          fix: `Choose a species with a known bending record (ash, elm, oak, hickory, beech bend well), or bend trial pieces of this one to the same radius before relying on it; ${PRACTICE}.`,
          working: [...geometry, `rules/materials/species.yaml: ${b.species} holds no steam_bend_ratio.${mode}`],
        });
        continue;
      }
      // The least ratio this part must reach: the limit's level times the species' figure.
      const level = lim.hard ?? lim.advisory!;
      const least = level * figure.value;
      const other = sp.steam_bend_ratio[b.strap ? 'unsupported' : 'supported'];
      const radius = least * b.thickness + (b.measuredOn === 'centre line' ? b.thickness / 2 : 0);
      ctx.report({
        ...common,
        message: { pass: 'within', warning: 'tight', fail: 'tight' },
        against: { limit: 'radius_ratio', times: figure.value },
        fix:
          grade(ratio, lim, RADIUS_RATIO, figure.value).severity === 'pass'
            ? `None needed; ${PRACTICE}.`
            : `Open the radius to at least ${formatQuantity(radius, 'mm')} (${b.measuredOn}), or thin the part to about ${formatQuantity(b.innerRadius / least, 'mm')}${!b.strap && other ? `, or bend it against a strap (limit ${num(other.value)})` : ''}; ${PRACTICE}.`,
        sources: figure.sources,
        working: [
          ...geometry,
          step(`least ratio, ${b.species} ${mode}`, '', figure.value, '1'),
          ...(figure.note ? [figure.note] : []),
          step('limit = level × least ratio', `${num(level)} × ${num(figure.value)}`, least, '1'),
          step('(R_i / t) / limit', `${num(ratio)} / ${num(least)}`, ratio / least, '1'),
          'equal to the limit passes',
        ],
      });
    }
  },
});
