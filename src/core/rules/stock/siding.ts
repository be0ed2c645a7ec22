import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';

export const sidingParts: Rule = {
  id: 'stock.siding',
  title: 'Siding in the cut list',
  checks: 'Whether the siding, given in the specification only as a mass, has its parts listed for the cut list and the stock plan.',
  kind: 'note',
  limits: [],
  run(ctx) {
    const mass = ctx.spec.box.siding_mass_kg;
    if (mass <= 0) return [];
    const extra = ctx.spec.stock.extra_parts;
    const listed = extra.length > 0;
    return [makeFinding(this.id, {
      severity: listed ? 'pass' : 'advice',
      subject: 'siding',
      value: mass,
      unit: 'kg',
      limit: null,
      message: listed ? 'sidingExtraParts' : 'sidingNotListed',
      params: { mass, parts: `${extra.length} part${extra.length === 1 ? '' : 's'}`, are: extra.length === 1 ? 'is' : 'are' },
      fix: listed ? 'None needed; check that the extra parts are the whole siding.' : 'List the siding\'s rails, screens and hand-holds under stock.extra_parts (name, species, length_mm, width_mm, thickness_mm, quantity) to have them cut and planned; their mass stays in box.siding_mass_kg.',
      source: 'mechanics note, section 9: every part the specification implies; the siding is one mass (box.siding_mass_kg)',
      working: listed ? extra.map((x) => `${x.name}: ${x.quantity} × ${x.length_mm} × ${x.width_mm} × ${x.thickness_mm} mm ${x.species}`).join('\n') : `box.siding_mass_kg = ${mass} kg; stock.extra_parts is empty`,
    })];
  },
};
