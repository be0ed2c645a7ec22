import type { RulesData } from '../../data/rules-data.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { buildNet, type CableNet, type StrapLine } from './net.ts';
import { FloorOutline } from './outline.ts';
import { frameBar } from '../spec-sections.ts';

// The strap floor of a specification as a cable net. Straps lie at the pitch,
// centred in the frame, as many as fit (the same count the mass model uses).
// A two-way weave has a node at every crossing; a one-way weave has nodes
// along each strap where the crossing straps would be (the virtual
// cross-spacing), so both weaves share one layout.

export interface FloorNet {
  net: CableNet;
  outline: FloorOutline;
  /** Axial stiffness of one strap, N. */
  EA: number;
  pretension: number;
  pitch: number;
  /** Positions of the front-to-back straps (y) and side-to-side straps (x), real or virtual, mm. */
  fbY: number[];
  ssX: number[];
}

/** Positions of `floor(span / pitch)` lines at the pitch, centred on the span. */
export function strapPositions(span: number, pitch: number, from = 0): number[] {
  const n = Math.floor(span / pitch);
  return Array.from({ length: n }, (_, i) => from + span / 2 + (i - (n - 1) / 2) * pitch);
}

/** The strap lines of a specification's floor, before the net is built from them. */
export interface FloorLines extends Omit<FloorNet, 'net'> {
  lines: StrapLine[];
}

export function floorLines(spec: CheckedSpecification, data: RulesData, refine = 1): FloorLines {
  const { floor } = spec.box;
  const s = spec.floor_straps;
  const outline = new FloorOutline(floor.depth_mm, floor.width_mm, floor.frame.bend_radius_mm ?? 0, frameBar(spec).width);
  const EA = data.leathers[s.material].modulus_MPa.value * s.width_mm * s.thickness_mm;
  const fbY = strapPositions(floor.width_mm, s.pitch_mm, -floor.width_mm / 2);
  const ssX = strapPositions(floor.depth_mm, s.pitch_mm);
  const woven = s.weave === 'two-way';
  const key = (i: number, j: number) => (woven ? `${i},${j}` : undefined);
  // Written out in each line rather than spread in: a spread followed by more properties is slow to build in V8.
  const pretension = s.pretension_N;
  const lines: StrapLine[] = [];
  if (s.weave !== 'side-to-side') {
    fbY.forEach((y, j) => {
      const end = outline.frontAt(y);
      const stations = ssX.flatMap((x, i) => (outline.inside(x, y) ? [{ s: x, key: key(i, j) }] : []));
      lines.push({ family: 'front-to-back', number: j + 1, of: fbY.length, cross: y, start: 0, end, rails: ['rear', 'front'], stations, EA, pretension, refine });
    });
  }
  if (s.weave !== 'front-to-back') {
    ssX.forEach((x, i) => {
      const h = outline.halfWidthAt(x);
      const stations = fbY.flatMap((y, j) => (outline.inside(x, y) ? [{ s: y, key: key(i, j) }] : []));
      // An end on a rounded front corner still pulls sideways: it counts with the side rail it pulls towards.
      lines.push({ family: 'side-to-side', number: i + 1, of: ssX.length, cross: x, start: -h, end: h, rails: ['right', 'left'], stations, EA, pretension, refine });
    });
  }
  return { lines, outline, EA, pretension: s.pretension_N, pitch: s.pitch_mm, fbY, ssX };
}

/** The nodes a net built from these lines has: its crossings once, its other stations, and the nodes refinement adds. */
export function floorNodeCount(lines: readonly StrapLine[]): number {
  const keys = new Set<string>();
  let count = 0;
  for (const l of lines) {
    for (const st of l.stations) {
      if (st.key === undefined) count++;
      else keys.add(st.key);
    }
    count += (l.stations.length + 1) * (l.refine - 1);
  }
  return count + keys.size;
}

export function floorNet(spec: CheckedSpecification, data: RulesData, refine = 1, laid: FloorLines = floorLines(spec, data, refine)): FloorNet {
  const { lines, ...rest } = laid;
  return { net: buildNet(lines), ...rest };
}
