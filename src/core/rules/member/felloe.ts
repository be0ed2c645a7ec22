import { timberPart } from '../../model/timber/timber-part.ts';
import { angleFrom, scanWheelRing, type LoadPosition } from '../../model/wheel/wheel-ring-scan.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import type { ModelValues } from '../../pipeline/model-values.ts';
import { num, step } from '../../pipeline/step.ts';
import { placeOf, ringIntro, ringUnsettled, ringUnsettledReport } from '../wheel/ring-working.ts';
import { strengthCheck, stressReport, type CaseCheck } from './member-finding.ts';
import { NOT_CHECKED_MESSAGE, STRESS_MESSAGES } from './member-messages.ts';

// The ring scanned again with nodes at the ends of the length each joint
// weakens, kept per ring scan: a re-run that reuses the wheel's ring (a sweep
// point, a decisive-input trial, a workbench edit) reuses this one too.
const withEnds = new WeakMap<ModelValues['wheelRingScan'], Map<number, LoadPosition[][]>>();

function scanWithEnds(ring: ModelValues['wheelRingScan'], loads: readonly number[], half: number): LoadPosition[][] {
  let byHalf = withEnds.get(ring);
  if (!byHalf) withEnds.set(ring, (byHalf = new Map<number, LoadPosition[][]>()));
  let scans = byHalf.get(half);
  if (!scans) byHalf.set(half, (scans = scanWheelRing(ring.ws, loads, [-half, half], ring.scans)));
  return scans;
}

/**
 * Grain run-out of a felloe sawn from straight stock: a segment of 360°/pieces
 * has straight grain along its chord, so at its ends the grain crosses the rim
 * at half the segment angle. A steam-bent felloe's grain follows the rim.
 */
export function felloeRunoutDeg(pieces: number, bent: boolean): number {
  return bent ? 0 : 180 / pieces;
}

/** The largest extreme-fibre stress |M|/W + |N|/A over the positions' nodes that `where` admits. */
function worstSection(scan: readonly LoadPosition[], W: number, A: number, where: (p: LoadPosition, node: number) => boolean): { p: LoadPosition; node: number; sigma: number } {
  let best: { p: LoadPosition; node: number; sigma: number } | null = null;
  for (const p of scan) {
    for (let node = 0; node < p.result.nodes.length; node++) {
      if (!where(p, node)) continue;
      const sigma = Math.abs(p.result.moment[node]) / W + Math.abs(p.result.hoop[node]) / A;
      if (best === null || sigma > best.sigma) best = { p, node, sigma };
    }
  }
  if (best === null) throw new Error('no section of the felloe to check');
  return best;
}

export const felloeMember = defineRule({
  id: 'member.felloe',
  title: 'Felloe strength in the ring',
  checks: 'Bending of the felloe as a ring continuous over the spokes (a ring frame of the whole wheel, spokes that only push unless a tyre keeps them loaded), with the contact anywhere on the rim, in every load case: in the span at the full design strength, and beside each joint, where the grain of sawn segments runs out, at the strength across that grain.',
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials', 'roark-thin-ring'],
  needs: ['mass', 'memberCases', 'wheelRingScan'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength' } },
  params: ['joint_grain_length_mm'],
  messages: { ...STRESS_MESSAGES, ...NOT_CHECKED_MESSAGE },
  run(ctx) {
    const { spec, data } = ctx;
    const w = spec.wheels;
    const lay = ctx.models.mass.layout;
    const bent = w.felloe.bend_radius_mm !== undefined;
    const runout = felloeRunoutDeg(w.felloe.pieces, bent);
    const part = timberPart(spec, 'felloe');
    const M = spec.moisture_content_pct;
    const full = timberStrength(data, part, 'bending', M);
    const atJoint = timberStrength(data, part, 'bending', M, runout);
    const ring = ctx.models.wheelRingScan;
    const { ws } = ring;
    const S = ws.felloe;
    const grainLength = ctx.param('joint_grain_length_mm');
    const half = grainLength.value / 2 / ws.ring.radius;
    const cases = ctx.models.memberCases;
    const scans = scanWithEnds(ring, cases.map((c) => c.wheel_N), half);
    const unsettled = ringUnsettled(scans);
    if (unsettled) return ctx.report(ringUnsettledReport('wheel.felloe', 'felloe in the ring of the wheel', 'felloe', unsettled, ringIntro(spec, lay, ws)));
    const span = (2 * Math.PI * ws.ring.radius) / w.spokes;
    const sectionSteps = (c: { wheel_N: number }, p: LoadPosition, node: number, sigma: number) => {
      const m = p.result.moment[node];
      const n = p.result.hoop[node];
      const sideways = p.result.tokenForce > 1e-3 * c.wheel_N ? [`the rim's hinged lengths lean sideways on the spokes' tenons, up to ${num(p.result.tokenForce)} N (not checked here)`] : [];
      return [
        `ring model, ${placeOf(p, node)}: M = ${num(m)} N·mm (${m >= 0 ? 'inner' : 'outer'} face in tension), hoop force ${num(n)} N (${n >= 0 ? 'tension' : 'compression'})`,
        ...sideways,
        step('c = |M|/(N_w·span)', `${num(Math.abs(m))} / (${num(c.wheel_N)} × ${num(span)})`, Math.abs(m) / (c.wheel_N * span), '1'),
        step('σ = |M|/W + |N|/A', `${num(Math.abs(m))} / ${num(S.W)} + ${num(Math.abs(n))} / ${num(S.area)}`, sigma, 'MPa'),
      ];
    };
    const checks: CaseCheck[] = cases.flatMap((c, i) => {
      const inSpan = worstSection(scans[i], S.W, S.area, () => true);
      const nearJoint = worstSection(scans[i], S.W, S.area, (p, node) => ws.joints.representatives.some((j) => angleFrom(p, node, j) <= half + 1e-9));
      return [
        strengthCheck(c, 'bending in the span', inSpan.sigma, full, full.design(c.duration, c.gammaM), sectionSteps(c, inSpan.p, inSpan.node, inSpan.sigma)),
        strengthCheck(c, 'bending beside a joint', nearJoint.sigma, atJoint, atJoint.design(c.duration, c.gammaM), sectionSteps(c, nearJoint.p, nearJoint.node, nearJoint.sigma)),
      ];
    });
    ctx.report(
      stressReport({
        subject: 'wheel.felloe',
        label: 'felloe in the ring of the wheel',
        part: 'felloe',
        checks,
        limit: ctx.limit('utilisation'),
        intro: [
          ...ringIntro(spec, lay, ws),
          step('W = b·h²/6', `${num(w.felloe.width_mm)} × ${num(w.felloe.depth_mm)}²/6`, S.W, 'mm³'),
          step('A = b·h', `${num(w.felloe.width_mm)} × ${num(w.felloe.depth_mm)}`, S.area, 'mm²'),
          bent ? 'steam-bent felloe: the grain follows the rim, and the stock is selected' : `sawn segments, ${w.felloe.pieces} to the rim`,
          ...(bent ? [] : [step('grain run-out at the segment ends = 180°/pieces', `180°/${num(w.felloe.pieces)}`, runout, '°')]),
          step('the run-out weakens the felloe over joint_grain_length_mm, centred on each joint', '', grainLength.value, 'mm'),
          ...(part.grainSlopeDeg > 0 ? [step('the stated slope of grain, everywhere', '', part.grainSlopeDeg, '°')] : []),
          'in the span:',
          ...full.working,
          'beside a joint:',
          ...atJoint.working,
        ],
        sources: [...new Set([...full.sourceIds, ...atJoint.sourceIds, ...ws.sourceIds, ...grainLength.sources])],
        fix: bent
          ? 'Deepen the felloe, add spokes to shorten the span, tie the joints (tenons, or a tyre shrunk on), or use a stronger species.'
          : 'Cut the rim in more, shorter segments (less grain run-out), steam-bend it instead, deepen it, add spokes to shorten the span, or tie the joints.',
      }),
    );
  },
});
