import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { bentParts } from '../../model/bent-parts.ts';

const f = (v: number, d = 2) => v.toFixed(d);

// Steaming and moisture practice for the fix text (reference figures, steam bending).
const PRACTICE = 'steam about one hour per 25 mm of thickness (common practice), bend at about 16 % moisture for mild bends and 20 to 25 % for severe ones, and make trial bends on your own stock: the species figures are from memory';

export const bendRadius: Rule = {
  id: 'bend.radius',
  title: 'Steam-bend radius',
  checks: "Each steam-bent part's inner bend radius over its thickness in the plane of the bend, against the least ratio the species takes, with or without a supporting strap as the specification says.",
  kind: 'check',
  limits: ['ratio_margin'],
  run(ctx) {
    const margin = ctx.limit('ratio_margin');
    return bentParts(ctx.spec).map((b) => {
      const sp = ctx.data.species[b.species];
      const mode = b.strap ? 'supported' : 'unsupported';
      const strapText = b.strap ? 'bent with a supporting strap' : 'bent without a strap';
      const figure = sp.steam_bend_ratio[mode];
      const ratio = b.innerRadius / b.thickness;
      const geometry = [
        `${b.key} = ${b.givenRadius} mm on the ${b.measuredOn}${b.measuredOn === 'centre line' ? `; inner face R_i = ${b.givenRadius} − ${b.thickness}/2 = ${f(b.innerRadius, 1)} mm` : ''}`,
        `thickness in the plane of the bend (${b.thicknessName}) t = ${b.thickness} mm`,
        `R_i/t = ${f(b.innerRadius, 1)} / ${b.thickness} = ${f(ratio, 3)}`,
      ];
      const params = { part: b.part, value: f(ratio), radius: f(b.innerRadius, 0), thickness: b.thickness, species: b.species, strap: strapText };
      if (figure === null) {
        return makeFinding(this.id, {
          severity: 'warning',
          subject: b.part,
          value: ratio,
          unit: '',
          limit: null,
          message: 'bendNoData',
          params,
          fix: `Choose a species with a known bending record (ash, elm, oak, hickory, beech bend well), or bend trial pieces of this one to the same radius before relying on it; ${PRACTICE}.`,
          source: `rules/materials/species.yaml: ${b.species} holds no ${mode} steam_bend_ratio`,
          working: [...geometry, `${b.species} steam_bend_ratio.${mode}: no figure held`].join('\n'),
        });
      }
      const limit = margin.value * figure.value;
      const severity = ratio < limit ? 'fail' : 'pass';
      const other = sp.steam_bend_ratio[b.strap ? 'unsupported' : 'supported'];
      return makeFinding(this.id, {
        severity,
        subject: b.part,
        value: ratio,
        unit: '',
        limit,
        message: severity === 'pass' ? 'bendWithin' : 'bendTight',
        params: { ...params, limit: f(limit) },
        fix: severity === 'pass'
          ? `None needed; ${PRACTICE}.`
          : `Open the radius to at least ${f(limit * b.thickness + (b.measuredOn === 'centre line' ? b.thickness / 2 : 0), 0)} mm (${b.measuredOn}), or thin the part to about ${f(b.innerRadius / limit, 1)} mm${!b.strap && other ? `, or bend it against a strap (limit ${other.value})` : ''}; ${PRACTICE}.`,
        source: `${figure.source}; ${margin.source}`,
        working: [...geometry, `least ratio ${b.species} ${mode}: ${figure.value}${figure.note ? ` (${figure.note})` : ''}; × margin ${margin.value} = ${f(limit, 3)}`, `R_i/t over the least ratio = ${f(ratio / limit, 3)} (1 or more passes; equal to the limit passes)`].join('\n'),
      });
    });
  },
};
