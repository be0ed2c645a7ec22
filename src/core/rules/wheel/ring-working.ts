import type { Layout } from '../../model/layout.ts';
import type { LoadPosition } from '../../model/wheel/wheel-ring-scan.ts';
import type { WheelRingSpec } from '../../model/wheel/wheel-ring-spec.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { num, step } from '../../pipeline/step.ts';
import type { Working } from '../member/member-finding.ts';

// The working that sets out the wheel's ring frame, shared by the rules that
// read it (member.felloe, wheel.felloe-joint, wheel.spoke-tenon).

const deg = (rad: number) => (rad * 180) / Math.PI;

export function ringIntro(spec: CheckedSpecification, lay: Layout, ws: WheelRingSpec): Working[] {
  const w = spec.wheels;
  const S = ws.felloe;
  const span = (2 * Math.PI * ws.ring.radius) / w.spokes;
  const joint = w.felloe.joint;
  return [
    'ring frame of the wheel: the felloe a closed ring of straight beams on its mid-depth radius, the spokes axial struts from a fixed nave, the ground load at the contact; solved by the direct stiffness method',
    step("R_m (the felloe's mid-depth radius) = (R_inner + R_outer)/2", `(${num(lay.felloeInner)} + ${num(lay.felloeOuter)})/2`, ws.ring.radius, 'mm'),
    step('span = 2π·R_m/n', `2π × ${num(ws.ring.radius)} / ${num(w.spokes)}`, span, 'mm'),
    `felloe ${S.label} (width × depth)`,
    step('E·I of the felloe = E_mean·b·h³/12', `${num(ws.felloeE)} × ${num(w.felloe.width_mm)} × ${num(w.felloe.depth_mm)}³/12`, ws.ring.EI, 'N·mm²'),
    step('k_spoke = E_mean·A_spoke/L_spoke', `${num(ws.spokeE)} × ${num(ws.spokeArea)} / ${num(ws.spokeLength)}`, ws.ring.spokeStiffness, 'N/mm'),
    'mean moduli at the moisture content: the share each part takes follows its mean stiffness',
    ws.tyre.text,
    `felloe joints: ${w.felloe.pieces}, the first midway between two spokes, then every ${num(360 / w.felloe.pieces)}°; ${
      ws.hinged
        ? `${joint.count} dowel(s) in butted ends and no tyre pre-compression to tie them: each joint is a hinge of the ring (it passes shear and hoop force, no moment)`
        : joint.kind === 'tenon'
          ? `${joint.count} tenon(s) across each joint: the ring is continuous through the joints`
          : 'the tyre ties the joints: the ring is continuous through them'
    }`,
    `mesh: ${ws.ring.elementsPerSpan} elements per span; the contact put midway between spokes, under a spoke and at eighths of a span either side of each joint`,
  ];
}

/** Where on the rim a node of a position's result lies, in words. */
export function placeOf(p: LoadPosition, node: number): string {
  const a = deg(p.result.nodes[node]);
  const off = a > 180 ? a - 360 : a;
  return `${p.label}, ${Math.abs(off) < 1e-6 ? 'at the contact' : `${num(Math.abs(off))}° round the rim from the contact`}`;
}

/** The first ring solution whose slack-spoke search did not settle, as a reason, or null. */
export function ringUnsettled(scans: readonly (readonly LoadPosition[])[]): string | null {
  for (const row of scans) for (const p of row) if (p.result.unsettled) return `the wheel's ring model, ${p.label}: ${p.result.unsettled}`;
  return null;
}

/** A ring rule's finding where the ring model did not settle: the part is not shown safe. */
export function ringUnsettledReport(subject: string, label: string, part: string, reason: string, intro: Working[]) {
  return {
    subject,
    label,
    message: 'notChecked' as const,
    params: { part, reason },
    severity: 'fail' as const,
    fix: 'Check the wheel by hand or change its build (spokes, felloe section, tyre); the ring model could not find which spokes bear.',
    working: [...intro, reason],
  };
}

