import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { layout } from '../layout.ts';
import { axleBar } from '../spec-sections.ts';
import type { FloorNet } from './floor-net.ts';
import type { NodeWeight } from './foot-patch.ts';
import type { CableNet } from './net.ts';
import { pointWeights, weightedSum } from './point-sag.ts';

// What lies under the straps: the pole's run under the floor and the axle
// across it. The straps lie on the frame's top face, so a part whose top is
// `c` below the floor top is struck when the floor sags more than c over it.

export interface UnderFloorPart {
  part: 'pole' | 'axle';
  /** Floor top less the part's top face, mm. */
  clearance_mm: number;
  /** Its footprint under the floor, clipped to the clear span, mm. */
  x: [number, number];
  y: [number, number];
}

export interface PartClearance extends UnderFloorPart {
  /** Largest sag of the floor over the footprint, mm, and where. */
  sag_mm: number;
  at: { x: number; y: number };
}

export function underFloorParts(spec: CheckedSpecification): UnderFloorPart[] {
  const lay = layout(spec);
  const { depth_mm: depth, width_mm: width } = spec.box.floor;
  const { pole, axle } = spec;
  const out: UnderFloorPart[] = [];
  const poleX: [number, number] = [Math.max(0, pole.rear_x_mm), Math.min(depth, pole.root_x_mm)];
  if (poleX[1] > poleX[0]) out.push({ part: 'pole', clearance_mm: lay.floorTopZ - (lay.poleZ + pole.height_mm / 2), x: poleX, y: [-pole.width_mm / 2, pole.width_mm / 2] });
  const ax = axleBar(spec);
  const axleX: [number, number] = [Math.max(0, axle.x_mm - ax.width / 2), Math.min(depth, axle.x_mm + ax.width / 2)];
  if (axleX[1] > axleX[0]) out.push({ part: 'axle', clearance_mm: lay.floorTopZ - (lay.axleZ + ax.depth / 2), x: axleX, y: [-width / 2, width / 2] });
  return out;
}

/** Sample points over a footprint: its edges and every node line inside it (the sag is piecewise bilinear between them). */
function samples(floor: FloorNet, lo: number, hi: number, axis: 'x' | 'y'): number[] {
  const inside = floor.net.nodes.map((n) => n[axis]).filter((v) => v > lo && v < hi);
  return [...new Set([lo, (lo + hi) / 2, hi, ...inside])];
}

interface Sample {
  x: number;
  y: number;
  weights: NodeWeight[];
}

/** The sample points of each footprint with their nodal weights, per net: they read no sag, so every state of a net shares them. */
const sampleCache = new WeakMap<CableNet, Map<string, Sample[]>>();

function footprintSamples(floor: FloorNet, part: UnderFloorPart): Sample[] {
  let byFootprint = sampleCache.get(floor.net);
  if (!byFootprint) sampleCache.set(floor.net, (byFootprint = new Map<string, Sample[]>()));
  const key = `${part.x[0]},${part.x[1]},${part.y[0]},${part.y[1]}`;
  let list = byFootprint.get(key);
  if (!list) {
    list = [];
    for (const x of samples(floor, part.x[0], part.x[1], 'x')) for (const y of samples(floor, part.y[0], part.y[1], 'y')) list.push({ x, y, weights: pointWeights(floor.net, floor.outline, x, y) });
    byFootprint.set(key, list);
  }
  return list;
}

export function partClearances(spec: CheckedSpecification, floor: FloorNet, sag: ArrayLike<number>): PartClearance[] {
  return underFloorParts(spec).map((p) => {
    let best = { sag_mm: 0, at: { x: (p.x[0] + p.x[1]) / 2, y: (p.y[0] + p.y[1]) / 2 } };
    for (const { x, y, weights } of footprintSamples(floor, p)) {
      const s = weightedSum(weights, sag);
      if (s > best.sag_mm) best = { sag_mm: s, at: { x, y } };
    }
    return { ...p, ...best };
  });
}
