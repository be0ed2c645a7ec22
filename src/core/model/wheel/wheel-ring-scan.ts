import { angleApart, nodeAt, sameAngle, wrapAngle } from './ring-mesh.ts';
import { HeldRingCache, solveWheelRing, type WheelRingResult } from './wheel-ring.ts';
import type { WheelRingSpec } from './wheel-ring-spec.ts';
import { keptByRing, ringMemo } from './kept-by-ring.ts';

// The wheel rolls, so every point of the rim comes to the ground: the ring is
// solved with the contact midway between two spokes, under a spoke, and at
// eight steps across one spoke span centred on each felloe joint (the moment
// at a section of a continuous beam is largest with the load on or near it).
// Angles in the wheel's own frame (spoke 0 at 0).
//
// With spokes that can only push and no pre-compression, the ring's answer is
// proportional to the ground load (which spokes go slack does not depend on
// its size), so it is solved once for a unit load and scaled; with a tyre's
// pre-compression each load is solved on its own (on the same mesh, tyre state
// and factors, kept per position).

export interface LoadPosition {
  /** The contact's angle in the wheel's frame, rad. */
  at: number;
  /** In words, for the working. */
  label: string;
  result: WheelRingResult;
}

/** Steps across one span, either side of a joint. */
const STEPS = 4;

function positions(ws: WheelRingSpec): { at: number; label: string }[] {
  const n = ws.ring.spokes;
  const span = (2 * Math.PI) / n;
  const out = [
    { at: Math.PI / n, label: 'contact midway between two spokes' },
    { at: 0, label: 'contact under a spoke' },
  ];
  ws.joints.representatives.forEach((j, i) => {
    for (let k = -STEPS; k <= STEPS; k++) out.push({ at: wrapAngle(j + (k * span) / (2 * STEPS)), label: k === 0 ? `contact at joint ${i + 1}` : `contact ${k > 0 ? '+' : '−'}${Math.abs(k)}/${2 * STEPS} span from joint ${i + 1}` });
  });
  return out.filter((p, i) => out.findIndex((q) => sameAngle(q.at, p.at)) === i);
}

function scaled(r: WheelRingResult, f: number): WheelRingResult {
  return {
    ...r,
    load: { ...r.load, P: r.load.P * f },
    moment: r.moment.map((m) => m * f),
    hoop: r.hoop.map((v) => v * f),
    shear: r.shear.map((v) => v * f),
    spokes: r.spokes.map((s) => ({ ...s, force: s.force * f })),
    peak: { ...r.peak, moment: r.peak.moment * f, hoop: r.peak.hoop * f },
    tokenForce: r.tokenForce * f,
    contactDeflection: r.contactDeflection * f,
  };
}

function solveAt(ws: WheelRingSpec, P: number, at: number, around: readonly number[], kept?: HeldRingCache, near?: WheelRingResult): WheelRingResult {
  const joints = ws.joints.angles.map((j) => wrapAngle(j - at));
  return solveWheelRing(
    ws.ring,
    {
      P,
      spokeOffset: wrapAngle(-at),
      hinges: ws.hinged ? joints : [],
      nodesAt: [...joints, ...joints.flatMap((j) => around.map((d) => wrapAngle(j + d)))],
    },
    kept,
    near,
  );
}

/**
 * Each position solved in turn, the slack-spoke search of each started from
 * bearing spokes that likely settle: those of the same position in `guide`
 * (the same wheel and load scanned with fewer nodes) where given; else, where
 * `fromBefore`, those of the position before, if it is one step of the scan
 * away (a jump to another part of the rim would guess worse than every spoke
 * bearing). A tyre's pre-compression keeps most spokes bearing, so its scan
 * starts with every spoke bearing (`fromBefore` false): a neighbour's guess
 * saves nothing there.
 */
function inTurn(ws: WheelRingSpec, where: readonly { at: number; label: string }[], guide: readonly LoadPosition[] | undefined, fromBefore: boolean, solve: (at: number, i: number, near?: WheelRingResult) => WheelRingResult): LoadPosition[] {
  const step = (2 * Math.PI) / ws.ring.spokes / (2 * STEPS);
  const out: LoadPosition[] = [];
  where.forEach((p, i) => {
    const before = fromBefore && i > 0 && angleApart(p.at, where[i - 1].at) <= 1.001 * step ? out[i - 1].result : undefined;
    out.push({ ...p, result: solve(p.at, i, guide?.[i]?.result ?? before) });
  });
  return out;
}

/**
 * What the last few wheels' scans kept, by the values they read (kept-by-ring.ts,
 * with the extra nodes): without pre-compression the unit-load scan itself
 * (kept results are never changed: each load scales a copy); with it, each
 * position's ring and factors (about a megabyte a wheel, so fewer are kept),
 * on which each load is solved afresh.
 */
const unitScans = ringMemo<LoadPosition[]>(16);
const heldScans = ringMemo<HeldRingCache[]>(4);

/**
 * The ring at every contact position, for each ground load in `loads` (N).
 * `around`: angles either side of each joint (rad, signed) that must be nodes,
 * e.g. the ends of the length over which a joint weakens the felloe; `guide`:
 * the same wheel's scan for the same loads without them, whose bearing spokes
 * start each position's search (the answer is the same without it).
 */
export function scanWheelRing(ws: WheelRingSpec, loads: readonly number[], around: readonly number[] = [], guide?: readonly LoadPosition[][]): LoadPosition[][] {
  const where = positions(ws);
  if (ws.ring.precompression === 0) {
    const unit = keptByRing(unitScans, ws, around, () => inTurn(ws, where, guide?.[0], true, (at, _, near) => solveAt(ws, 1, at, around, undefined, near)));
    return loads.map((P) => unit.map((p) => ({ ...p, result: scaled(p.result, P) })));
  }
  // Each position's mesh, tyre state, ring and factors are kept for the loads after the first.
  const held = keptByRing(heldScans, ws, around, () => where.map(() => new HeldRingCache()));
  return loads.map((P, k) => inTurn(ws, where, guide?.[k], false, (at, i, near) => solveAt(ws, P, at, around, held[i], near)));
}

/** The node of a result at an angle of the wheel's frame. */
export function nodeAtWheelAngle(p: LoadPosition, angle: number): number {
  return nodeAt(p.result.nodes, wrapAngle(angle - p.at));
}

/** Distance along the rim between a node of a result and an angle of the wheel's frame, rad (0 to π). */
export function angleFrom(p: LoadPosition, node: number, angle: number): number {
  return angleApart(p.result.nodes[node] + p.at, angle);
}
