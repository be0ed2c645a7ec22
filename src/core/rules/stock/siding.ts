import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';

export const sidingParts = defineRule({
  id: 'stock.siding',
  title: 'Siding in the cut list',
  checks: 'Whether the siding, given in the specification only as a mass, has its parts listed for the cut list and the stock plan.',
  kind: 'note',
  method: ['design-basis-cutting'],
  needs: [],
  limits: {},
  params: [],
  messages: {
    notListed: { code: 2731, text: 'The siding is given only as a mass ({mass:kg}), so its parts are not in the cut list or the stock plan.' },
    listed: { code: 2732, text: 'The siding is given as a mass ({mass:kg}); the entries under stock.extra_parts ({count:1}) are in the cut list and the stock plan.' },
  },
  run(ctx) {
    const mass = ctx.spec.box.siding_mass_kg;
    if (mass <= 0) return;
    const extra = ctx.spec.stock.extra_parts;
    const listed = extra.length > 0;
    ctx.report({
      subject: 'box.siding',
      label: 'siding',
      message: listed ? 'listed' : 'notListed',
      params: { mass, count: extra.length },
      value: mass,
      unit: 'kg',
      severity: 'info',
      fix: listed
        ? 'None needed; check that the extra parts are the whole siding.'
        : "List the siding's rails, screens and hand-holds under stock.extra_parts (name, species, length_mm, width_mm, thickness_mm, quantity) to have them cut and planned; their mass stays in box.siding_mass_kg.",
      working: [
        step('box.siding_mass_kg', '', mass, 'kg'),
        'every part the specification implies is in the cut list; the siding is one mass',
        ...(listed
          ? extra.map((x) => `${x.name}: ${num(x.quantity)} × ${num(x.length_mm, 'mm')} × ${num(x.width_mm, 'mm')} × ${num(x.thickness_mm, 'mm')} mm ${x.species}`)
          : ['stock.extra_parts is empty']),
      ],
    });
  },
});
