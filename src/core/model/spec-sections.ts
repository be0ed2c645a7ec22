import type { CheckedSpecification } from '../spec/spec.types.ts';
import { rectangle, round, type Section } from './sections.ts';

// The floor frame bars and the axle as the specification gives them: a
// rectangular section (two sizes) or a round one (a diameter). The schema
// leaves both forms optional; the cross-field checks refuse a spec with both
// or neither, so a helper that finds neither is a fault in the program.

export interface Bar {
  round: boolean;
  /** Across, horizontal: the frame rail's width in plan, the axle's width front to back; a round bar's diameter. */
  width: number;
  /** Up and down: the frame rail's thickness, the axle's height; a round bar's diameter. */
  depth: number;
  /** One turn round the bar: 2 (width + depth), or π d. */
  perimeter: number;
  /** The section's area. */
  area: number;
  /** "80 × 45 mm" or "30 mm diameter", as a cut list or a working line names it. */
  size: string;
}

function bar(where: string, d: number | undefined, w: number | undefined, h: number | undefined): Bar {
  if (d !== undefined && w === undefined && h === undefined) return { round: true, width: d, depth: d, perimeter: Math.PI * d, area: (Math.PI * d * d) / 4, size: `${d} mm diameter` };
  if (d === undefined && w !== undefined && h !== undefined) return { round: false, width: w, depth: h, perimeter: 2 * (w + h), area: w * h, size: `${w} × ${h} mm` };
  throw new Error(`${where}: give a diameter or both rectangular sizes, not both forms; the specification checks should have refused it`);
}

/** The floor frame's bars. */
export function frameBar(spec: Pick<CheckedSpecification, 'box'>): Bar {
  const f = spec.box.floor.frame;
  return bar('box.floor.frame', f.diameter_mm, f.width_mm, f.thickness_mm);
}

/** The axle. */
export function axleBar(spec: Pick<CheckedSpecification, 'axle'>): Bar {
  const a = spec.axle;
  return bar('axle', a.diameter_mm, a.width_mm, a.height_mm);
}

/** The frame rail's section bent in the plane of the floor (the straps pull across it): the rail's thickness along the bending axis. */
export function frameSectionInPlan(spec: Pick<CheckedSpecification, 'box'>): Section {
  const b = frameBar(spec);
  return b.round ? round(b.width) : rectangle(b.depth, b.width);
}

/** The axle's section bent by the wheel loads, in the vertical plane: its width along the bending axis. */
export function axleSection(spec: Pick<CheckedSpecification, 'axle'>): Section {
  const b = axleBar(spec);
  return b.round ? round(b.width) : rectangle(b.width, b.depth);
}
