import { JOINTS } from '../../model/lashing-demand.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num } from '../../pipeline/step.ts';
import { jointNeed } from './joint-needs.ts';
import { factorLines, caseName, demandSourceIds, designValue, forceWorking, governingDesign, jointSubject, lashingText, loadCaseOf } from './lashed-joint.ts';

export const lashingMissing = defineRule({
  id: 'lashing.missing',
  title: 'Joints left unlashed',
  checks: 'Every joint this construction needs held is lashed: the pole to the axle and to the yoke and the box to the axle must be; the pole to the floor, the frame corners and the siding are advised, since joinery may hold them instead.',
  kind: 'check',
  method: ['design-basis-lashings'],
  needs: ['lashingDemands', 'bumpFactors', 'stoneFactors'],
  limits: {},
  params: [],
  messages: {
    present: { code: 2531, text: 'The {joint} joint is lashed: {wraps:wraps} of {material}, {width:1} × {thickness:mm}.' },
    missing: { code: 2532, text: 'The {joint} joint is not lashed, but {why}; it must pass {force:N} ({case}).' },
    advised: { code: 2533, text: 'No lashing is given for the {joint} joint; {why}. Whatever holds it, lashing or joinery, must pass {force:N} ({case}); this check cannot see joinery.' },
    missingUnknown: { code: 2534, text: 'The {joint} joint is not lashed, but {why}; the force it must pass was not found here (the working says why).' },
    advisedUnknown: { code: 2535, text: 'No lashing is given for the {joint} joint; {why}. Whatever holds it, lashing or joinery, must pass a force not found here (the working says why); this check cannot see joinery.' },
  },
  run(ctx) {
    const { spec } = ctx;
    const bump = ctx.models.bumpFactors.crew;
    const stone = ctx.models.stoneFactors.crew;
    for (const joint of JOINTS) {
      const need = jointNeed(joint, spec);
      const lashing = spec.lashings.find((l) => l.joint === joint);
      if (need.level === 'none' && !lashing) continue;
      const d = ctx.models.lashingDemands[joint];
      const gov = d.unknown === null ? governingDesign(d.cases, 'held_N') : undefined;
      const common = {
        subject: jointSubject(joint),
        label: `${joint} joint`,
        value: gov ? designValue(gov, 'held_N') : null,
        unit: 'N',
        sources: demandSourceIds(ctx.data, bump, stone),
        load_case: loadCaseOf(d, gov),
        combination: gov?.combination ?? null,
      };
      const working = [
        `${joint}: ${d.where}`,
        `needed: ${need.level} (${need.why})`,
        ...(joint === 'pole-to-floor' ? [`the pole's rear end at x = ${num(spec.pole.rear_x_mm, 'mm')} mm`] : []),
        ...(joint === 'siding-to-frame' ? [`the siding: ${num(spec.box.siding_mass_kg, 'kg')} kg`] : []),
        lashing ? `lashed: ${lashingText(lashing)}` : 'not lashed',
        ...factorLines(bump, stone),
        ...(d.unknown === null ? forceWorking(d, gov, 'held_N') : [`not found: ${d.unknown}`]),
      ];
      if (lashing) {
        ctx.report({
          ...common,
          message: 'present',
          params: { joint, wraps: lashing.wraps, material: lashing.material, width: lashing.width_mm, thickness: lashing.thickness_mm },
          severity: 'pass',
          fix: 'None needed; lashing.tension and lashing.slip check it.',
          working,
        });
        continue;
      }
      const required = need.level === 'required';
      const known = gov !== undefined;
      ctx.report({
        ...common,
        message: required ? (known ? 'missing' : 'missingUnknown') : known ? 'advised' : 'advisedUnknown',
        params: { joint, why: need.why, ...(gov ? { force: designValue(gov, 'held_N'), case: caseName(d, gov) } : {}) },
        severity: required ? 'fail' : 'advice',
        fix: required
          ? `Lash the ${joint} joint and list it under lashings, so that its strength is checked.`
          : `Lash the ${joint} joint and list it under lashings, or make sure its joinery holds the force shown.`,
        working,
      });
    }
  },
});
