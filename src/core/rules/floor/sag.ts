import type { PartClearance } from '../../model/cable-net/clearance.ts';
import { defineRule, type LimitSpec } from '../../pipeline/define-rule.ts';
import { grade } from '../../pipeline/grade.ts';
import { num, step } from '../../pipeline/step.ts';
import { serviceCases, floorWorking, netSources, notSolvedMessage, notSolvedReport, type FloorCase } from './floor-working.ts';

const left = (p: PartClearance) => p.clearance_mm - p.sag_mm;

/** The case that leaves the least clearance over a part (the first of equals). */
function leastClearance<T extends { c: FloorCase; p: PartClearance }>(over: readonly T[]): T {
  return over.reduce((w, o) => (left(o.p) < left(w.p) ? o : w));
}

// A floor that comes down onto the pole or the axle is held up by it (the
// pole of documented chariots runs under the floor, and the floor bears on
// it): the rule advises, standing or in a dynamic case, since the floor is
// stiffer there than the net model takes it and the straps chafe on the part. Each part's
// finding gives the least clearance left in any case, from the floor solved
// with its frame (the straps slacken as the rails bow, so it sags deeper
// than on rigid anchors).
const SAG: LimitSpec = { direction: 'max', unit: 'mm' };
const CLEARANCE: LimitSpec = { direction: 'min', unit: 'mm', levels: { hard: 'advice' } };
const BUMP_CLEARANCE: LimitSpec = { direction: 'min', unit: 'mm', levels: { hard: 'advice' } };

export const floorSag = defineRule({
  id: 'floor.sag',
  title: 'Floor sag under the crew and over the parts beneath',
  checks: 'How far the woven floor sags under each crew member standing, and whether it sags onto the pole or the axle beneath it, standing, over rough ground or on the stone (the floor solved with its frame).',
  kind: 'check',
  worst: 'warning',
  method: ['design-basis-floor'],
  needs: ['floorStatic', 'floorBump', 'floorStone', 'bumpFactors', 'stoneFactors'],
  limits: {
    sag_mm: SAG,
    clearance_mm: CLEARANCE,
    bump_clearance_mm: BUMP_CLEARANCE,
  },
  params: [],
  messages: {
    over: { code: 2211, text: '{role} sags the floor {value:mm} standing, more than the advisory {advisory:mm}.' },
    within: { code: 2212, text: '{role} sags the floor {value:mm} standing, within the advisory {advisory:mm}.' },
    strikes: { code: 2213, text: "The floor sags {sag:mm} over the {part} in the {case} case and comes to bear on it (its top is {clearance:mm} below the floor top): the {part} holds the floor up there, so the floor is stiffer than the net model takes it and the straps chafe over the {part}." },
    clears: { code: 2214, text: 'The floor sags at most {sag:mm} over the {part} in the {case} case, clear of its top {clearance:mm} below the floor top by {value:mm}.' },
    notSolved: notSolvedMessage(2215),
  },
  run(ctx) {
    const { spec, data } = ctx;
    const cases = serviceCases(ctx.models);
    const net = netSources(spec, data);
    const unsolved = cases.filter((c) => !c.model.converged);
    if (unsolved.length) {
      for (const c of unsolved) ctx.report(notSolvedReport(c, { subject: 'floor.net', severity: 'warning', unit: 'mm', what: 'sag', sources: net, working: floorWorking(spec, data, c.model) }));
      return;
    }
    const stat = cases[0];
    const base = floorWorking(spec, data, stat.model);
    stat.model.crew.forEach((c, i) =>
      ctx.report({
        subject: `crew.${i}`,
        label: `${c.role}, standing`,
        message: { pass: 'within', warning: 'over', fail: 'over' },
        params: { role: c.role },
        value: c.sag_mm,
        unit: 'mm',
        against: { limit: 'sag_mm' },
        load_case: stat.load_case,
        combination: stat.combination,
        fix:
          grade(c.sag_mm, ctx.limit('sag_mm'), SAG).severity !== 'pass'
            ? 'Raise the pretension, use thicker or wider straps, a closer pitch or a two-way weave; stand on a sample panel to judge the footing.'
            : 'None needed.',
        sources: net,
        working: [...base, step(c.sagRead === 'patch' ? `mean sag under ${c.role}'s foot patch, its centre being over the frame` : `sag at the centre of ${c.role}'s foot patch (interpolated between nodes)`, '', c.sag_mm, 'mm')],
      }),
    );
    const beyond = (v: number, limit: 'clearance_mm' | 'bump_clearance_mm', spec: LimitSpec) => grade(v, ctx.limit(limit), spec).severity !== 'pass';
    const dynamic = cases.slice(1);
    stat.model.clearances.forEach((sp, i) => {
      // Every case over this part: the standing one where it is beyond its limit, else the least clearance left in any case.
      const over = cases.map((c) => ({ c, p: c.model.clearances[i] }));
      const standingHits = beyond(left(sp), 'clearance_mm', CLEARANCE);
      const least = leastClearance(over);
      const { c, p } = standingHits ? over[0] : least;
      const limit = c === stat ? 'clearance_mm' : 'bump_clearance_mm';
      ctx.report({
        subject: `part.${sp.part}`,
        label: `floor over the ${sp.part}`,
        message: { pass: 'clears', advice: 'strikes' },
        params: { part: sp.part, sag: p.sag_mm, clearance: p.clearance_mm, case: c.name },
        value: left(p),
        unit: 'mm',
        against: { limit },
        load_case: c.load_case,
        combination: c.combination,
        fix:
          standingHits || dynamic.some((d) => beyond(left(d.model.clearances[i]), 'bump_clearance_mm', BUMP_CLEARANCE))
            ? `Pad the ${sp.part}'s top (a leather or felt strip) so the straps do not chafe on it; for a floor with more give, stiffen the net (more pretension, thicker or wider straps, a closer pitch, a two-way weave), stiffen the frame rails in plan, or deepen the rails so the ${sp.part} sits lower.`
            : 'None needed.',
        sources: [...net, ...c.sources],
        working: [
          ...floorWorking(spec, data, c.model),
          step(`clearance = floor top − ${sp.part} top (layout: the straps lie on the frame's top face)`, '', sp.clearance_mm, 'mm'),
          `over x ${num(sp.x[0], 'mm')} to ${num(sp.x[1], 'mm')} mm, y ${num(sp.y[0], 'mm')} to ${num(sp.y[1], 'mm')} mm`,
          ...over.flatMap(({ c: k, p: q }) => [
            step(`sag over the ${q.part}, ${k.label} (at x ${num(q.at.x, 'mm')}, y ${num(q.at.y, 'mm')} mm)`, '', q.sag_mm, 'mm'),
            step(`clearance left, ${k.label}`, `${num(q.clearance_mm)} − ${num(q.sag_mm)}`, left(q), 'mm'),
          ]),
          `${standingHits ? 'the crew standing brings the floor down onto it' : `least clearance left in any case: ${least.c.label}`}; where the floor comes to bear on the part, the part holds it up: the strap tensions are taken from the net alone, which is the safe side`,
        ],
      });
    });
  },
});
