import { nodeAt, sameAngle, wrapAngle } from './ring-mesh.ts';
import { HeldRingCache, solveWheelRing, type WheelRingResult } from './wheel-ring.ts';
import type { WheelRingSpec } from './wheel-ring-spec.ts';

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

function solveAt(ws: WheelRingSpec, P: number, at: number, around: readonly number[], kept?: HeldRingCache): WheelRingResult {
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
  );
}

/**
 * What the last few wheels' scans kept, by the values they read (the ring,
 * its joints, whether they are hinged, the extra nodes): a check re-run with
 * a changed load, crew or frame (a decisive-input trial, a sweep point, a
 * workbench edit) leaves the wheel alone and takes what was computed for it.
 * Without pre-compression that is the unit-load scan itself (kept results
 * are never changed: each load scales a copy); with it, each position's ring
 * and factors (about a megabyte a wheel, so fewer are kept), on which each
 * load is solved afresh. The most recently used are kept.
 */
const unitScans = new Map<string, LoadPosition[]>();
const heldScans = new Map<string, HeldRingCache[]>();
const UNIT_SCANS_KEPT = 16;
const HELD_SCANS_KEPT = 4;

/** Lets every kept scan go (pipeline/kept-values.ts). */
export function forgetKeptScans(): void {
  unitScans.clear();
  heldScans.clear();
}

function kept<T>(memo: Map<string, T>, most: number, ws: WheelRingSpec, around: readonly number[], make: () => T): T {
  // Numbers as their own text, so NaN and Infinity keep keys of their own.
  const key = JSON.stringify([ws.ring, ws.joints.angles, ws.joints.representatives, ws.hinged, around], (_, v: unknown) => (typeof v === 'number' ? String(v) : v));
  let got = memo.get(key);
  if (got === undefined) got = make();
  // Last used last: the first is the one to let go.
  memo.delete(key);
  memo.set(key, got);
  if (memo.size > most) memo.delete(memo.keys().next().value!);
  return got;
}

/**
 * The ring at every contact position, for each ground load in `loads` (N).
 * `around`: angles either side of each joint (rad, signed) that must be nodes,
 * e.g. the ends of the length over which a joint weakens the felloe.
 */
export function scanWheelRing(ws: WheelRingSpec, loads: readonly number[], around: readonly number[] = []): LoadPosition[][] {
  const where = positions(ws);
  if (ws.ring.precompression === 0) {
    const unit = kept(unitScans, UNIT_SCANS_KEPT, ws, around, () => where.map((p) => ({ ...p, result: solveAt(ws, 1, p.at, around) })));
    return loads.map((P) => unit.map((p) => ({ ...p, result: scaled(p.result, P) })));
  }
  // Each position's mesh, tyre state, ring and factors are kept for the loads after the first.
  const held = kept(heldScans, HELD_SCANS_KEPT, ws, around, () => where.map(() => new HeldRingCache()));
  return loads.map((P) => where.map((p, i) => ({ ...p, result: solveAt(ws, P, p.at, around, held[i]) })));
}

/** The node of a result at an angle of the wheel's frame. */
export function nodeAtWheelAngle(p: LoadPosition, angle: number): number {
  return nodeAt(p.result.nodes, wrapAngle(angle - p.at));
}

/** Distance along the rim between a node of a result and an angle of the wheel's frame, rad (0 to π). */
export function angleFrom(p: LoadPosition, node: number, angle: number): number {
  return Math.abs(wrapAngle(p.result.nodes[node] + p.at - angle + Math.PI) - Math.PI);
}
