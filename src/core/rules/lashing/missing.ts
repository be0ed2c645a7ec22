import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import type { Finding } from '../../findings/finding.ts';
import { governing } from '../../model/joint-force.ts';
import { demandSources, JOINTS } from '../../model/lashing-demand.ts';
import { jointNeed } from './joint-needs.ts';
import { caseList, lashingSize } from './lashed-joint.ts';

export const lashingMissing: Rule = {
  id: 'lashing.missing',
  title: 'Joints left unlashed',
  checks: 'Every joint this construction needs held is lashed: the pole to the axle and to the yoke and the box to the axle must be; the pole to the floor, the frame corners and the siding are advised, since joinery may hold them instead.',
  kind: 'check',
  limits: [],
  run(ctx) {
    const out: Finding[] = [];
    for (const joint of JOINTS) {
      const need = jointNeed(joint, ctx.spec);
      const lashing = ctx.spec.lashings.find((l) => l.joint === joint);
      if (need.level === 'none' && !lashing) continue;
      const d = ctx.analysis.lashingDemands[joint];
      const gov = d.unknown === null ? governing(d.cases, 'held_N') : undefined;
      const force = gov ? `${gov.held_N.toFixed(0)} N` : `a force not found here (${d.unknown ?? 'no load reaches it'})`;
      const severity = lashing ? 'pass' : need.level === 'required' ? 'fail' : 'advice';
      out.push(makeFinding(this.id, {
        severity,
        subject: `joint, ${joint}`,
        value: gov?.held_N ?? null,
        unit: 'N',
        limit: null,
        message: lashing ? 'lashingPresent' : severity === 'fail' ? 'lashingMissing' : 'lashingAdvised',
        params: lashing
          ? { joint, wraps: lashing.wraps, material: lashing.material, size: lashingSize(lashing) }
          : { joint, why: need.why, value: force, case: gov?.title ?? 'unknown case' },
        fix: lashing
          ? 'None needed; lashing.tension and lashing.slip check it.'
          : severity === 'fail'
            ? `Lash the ${joint} joint and list it under lashings, so that its strength is checked.`
            : `Lash the ${joint} joint and list it under lashings, or make sure its joinery holds the force shown.`,
        source: `mechanics note, section 7; ${demandSources(ctx.data, ctx.analysis.bumpFactors.crew)}`,
        working: [
          `${joint}: ${d.where}`,
          `needed: ${need.level} (${need.why})`,
          lashing ? `lashed: ${lashing.wraps} wraps of ${lashing.material} ${lashingSize(lashing)} mm` : 'not lashed',
          ...(gov ? [gov.working, caseList(d, 'held_N')] : [d.unknown ?? 'no load reaches this joint']),
        ].join('\n'),
      }));
    }
    return out;
  },
};
