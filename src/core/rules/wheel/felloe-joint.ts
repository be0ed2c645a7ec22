import { timberPart } from '../../model/timber/timber-part.ts';
import { nodeAtWheelAngle, type LoadPosition } from '../../model/wheel/wheel-ring-scan.ts';
import { timberStrength } from '../../model/timber/design-strength.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { strengthCheck, stressReport, type CaseCheck, type Working } from '../member/member-finding.ts';
import { NOT_CHECKED_MESSAGE, STRESS_MESSAGES } from '../member/member-messages.ts';
import { placeOf, ringIntro, ringUnsettled, ringUnsettledReport } from './ring-working.ts';

/** The rim's forces at a joint: the largest moment, shear and hoop force in size over the contact positions, each with where it arose. */
interface JointForces {
  M: { value: number; p: LoadPosition; node: number };
  V: { value: number; p: LoadPosition; node: number };
  N: { value: number; p: LoadPosition; node: number };
}

function jointForces(scan: readonly LoadPosition[], joint: number): JointForces {
  let out: JointForces | null = null;
  for (const p of scan) {
    const node = nodeAtWheelAngle(p, joint);
    const r = p.result;
    const here = { M: { value: Math.abs(r.moment[node]), p, node }, V: { value: r.shear[node], p, node }, N: { value: Math.abs(r.hoop[node]), p, node } };
    out = out === null ? here : { M: here.M.value > out.M.value ? here.M : out.M, V: here.V.value > out.V.value ? here.V : out.V, N: here.N.value > out.N.value ? here.N : out.N };
  }
  if (out === null) throw new Error('no contact position to read the joint from');
  return out;
}

/** A round tenon of diameter d in a socket of length l, bearing linearly along it: the peak pressure from the shear V and the moment M at the mouth. */
export function tenonBearing(V: number, M: number, d: number, l: number): number {
  // Linear bearing along the tenon (a rigid tongue in its socket): resultant V at mid-length, moment about mid-length M + V·l/2.
  return (V / l + (6 * (M + (V * l) / 2)) / l ** 2) / d;
}

export const felloeJoint = defineRule({
  id: 'wheel.felloe-joint',
  title: 'Felloe joints',
  checks: "The dowels or tenons across each felloe joint carry the rim's shear and moment there, from the ring frame of the wheel with the contact anywhere near the joint, in every load case: dowels in shear against the timber's shear strength; a tenon in bearing across the grain of its socket and in bending at its mouth.",
  kind: 'check',
  method: ['design-basis-members', 'design-basis-materials', 'richardson-1891-rims'],
  needs: ['mass', 'memberCases', 'wheelRingScan'],
  limits: { utilisation: { direction: 'max', unit: 'of the design strength' } },
  params: ['end_friction'],
  messages: { ...STRESS_MESSAGES, ...NOT_CHECKED_MESSAGE },
  run(ctx) {
    const { spec, data } = ctx;
    const lay = ctx.models.mass.layout;
    const joint = spec.wheels.felloe.joint;
    const part = timberPart(spec, 'felloe');
    const M = spec.moisture_content_pct;
    const cases = ctx.models.memberCases;
    const { ws, scans } = ctx.models.wheelRingScan;
    const unsettled = ringUnsettled(scans);
    if (unsettled) return ctx.report(ringUnsettledReport('wheel.felloe.joint', 'felloe joint', 'felloe joint', unsettled, ringIntro(spec, lay, ws)));
    const d = joint.diameter_mm;
    const n = joint.count;
    const shear = timberStrength(data, part, 'shear', M);
    const across = timberStrength(data, part, 'compression', M, 90);
    const bending = timberStrength(data, part, 'bending', M);
    const where = (f: { p: LoadPosition; node: number }) => `(${placeOf(f.p, f.node)})`;
    const mu = ctx.param('end_friction');
    const checks: CaseCheck[] = cases.flatMap((c, i) =>
      ws.joints.representatives.flatMap((j, k): CaseCheck[] => {
        const f = jointForces(scans[i], j);
        const at = ws.joints.representatives.length > 1 ? ` at joint ${k + 1}` : '';
        if (joint.kind === 'dowel') {
          const A = (n * Math.PI * d * d) / 4;
          // A joint the tyre keeps closed passes shear by friction across its pressed ends first (Coulomb).
          const pressed = ws.hinged ? 0 : Math.max(0, -f.V.p.result.hoop[f.V.node]);
          const carried = Math.max(0, f.V.value - mu.value * pressed);
          const tau = carried / A;
          return [
            strengthCheck(c, `dowels in shear${at}`, tau, shear, shear.design(c.duration, c.gammaM), [
              `rim shear at the joint ${num(f.V.value)} N ${where(f.V)}`,
              ...(ws.hinged
                ? []
                : [
                    step('ends pressed together by the hoop force there', '', pressed, 'N'),
                    step('shear left to the dowels = V − μ·N_c', `max(0, ${num(f.V.value)} − ${num(mu.value)} × ${num(pressed)})`, carried, 'N'),
                  ]),
              step('τ = V_dowels/(count·π·d²/4)', `${num(carried)} / (${num(n)} × π × ${num(d)}²/4)`, tau, 'MPa'),
            ]),
          ];
        }
        const p = tenonBearing(f.V.value / n, f.M.value / n, d, joint.length_mm);
        const sigma = f.M.value / n / ((Math.PI * d ** 3) / 32);
        const forces: Working[] = [`rim moment at the joint ${num(f.M.value)} N·mm ${where(f.M)}; shear ${num(f.V.value)} N ${where(f.V)}`];
        return [
          strengthCheck(c, `tenon bearing across the grain${at}`, p, across, across.design(c.duration, c.gammaM), [
            ...forces,
            step('p = (V/l + 6·(M + V·l/2)/l²)/d, per tenon', `(${num(f.V.value / n)}/${num(joint.length_mm)} + 6 × (${num(f.M.value / n)} + ${num(f.V.value / n)} × ${num(joint.length_mm)}/2)/${num(joint.length_mm)}²)/${num(d)}`, p, 'MPa'),
          ]),
          strengthCheck(c, `tenon bending at its mouth${at}`, sigma, bending, bending.design(c.duration, c.gammaM), [...forces, step('σ = (M/count)/(π·d³/32)', `${num(f.M.value / n)} / (π × ${num(d)}³/32)`, sigma, 'MPa')]),
        ];
      }),
    );
    const used = joint.kind === 'dowel' ? [shear] : [across, bending];
    ctx.report(
      stressReport({
        subject: 'wheel.felloe.joint',
        label: 'felloe joint',
        part: 'felloe joint',
        checks,
        limit: ctx.limit('utilisation'),
        intro: [
          ...ringIntro(spec, lay, ws),
          joint.kind === 'dowel'
            ? `${n} dowel(s) of ${num(d)} mm bored straight into the butted ends; taken of the felloe's timber (a dowel sheared across its grain is stronger than the shear along the grain used here)`
            : `${n} round tenon(s) of ${num(d)} mm, ${num(joint.length_mm)} mm long into the next felloe, of the felloe's timber; the tenon presses across the grain of its socket`,
          ...(ws.hinged ? ['the butted joint opens under a moment (no tyre pre-compression to close it): the dowels carry the shear alone'] : []),
          ...(joint.kind === 'dowel' && !ws.hinged ? ["the tyre's pre-compression closes the joint: the moment passes by end-grain contact, tied by the tyre (not checked here), and the shear first by friction across the pressed ends"] : []),
          'the joint as given in wheels.felloe.joint; any size not given there is the default, an assumption',
          ...used.flatMap((s) => s.working),
        ],
        sources: [...new Set([...used.flatMap((s) => s.sourceIds), ...ws.sourceIds, 'wheelwright-felloe-shop', ...(ws.hinged ? [] : mu.sources)])],
        fix:
          joint.kind === 'dowel'
            ? 'Use more or thicker dowels across each joint, or shrink a tyre on to tie the joints.'
            : 'Use a longer or thicker tenon, or more of them, or shrink a tyre on to tie the joints.',
      }),
    );
  },
});
