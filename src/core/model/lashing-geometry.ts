import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { Layout } from './layout.ts';
import { axleBar, frameBar } from './spec-sections.ts';

type Joint = CheckedSpecification['lashings'][number]['joint'];

/** Tail left at each end of a lashing for tucking, mm (common practice). */
export const LASHING_TAIL_MM = 150;

export interface JointPlace {
  x: number;
  y: number;
  z: number;
  /** Length of one wrap round the members it binds, mm. */
  wrapPerimeter: number;
  /** Whether the joint's weight rests on the horses (yoke) or the wheels. */
  group: 'rolling' | 'yoke';
}

const rect = (a: number, b: number) => 2 * (a + b);

// One wrap of a crossed lashing goes round both members: approximated by the
// perimeter of their stacked sections (a round bar by its enclosing square,
// which errs long).
export function jointPlace(joint: Joint, spec: CheckedSpecification, lay: Layout): JointPlace {
  const { pole, axle, yoke, box } = spec;
  const frame = frameBar(spec);
  const ax = axleBar(spec);
  switch (joint) {
    case 'pole-to-axle':
      return { x: axle.x_mm, y: 0, z: lay.axleZ + ax.depth / 2, wrapPerimeter: rect(pole.height_mm + ax.depth, Math.max(pole.width_mm, ax.width)), group: 'rolling' };
    case 'pole-to-yoke':
      return { x: pole.yoke_x_mm, y: 0, z: pole.yoke_height_mm, wrapPerimeter: rect(pole.height_mm + yoke.height_mm, Math.max(pole.width_mm, yoke.width_mm)), group: 'yoke' };
    case 'pole-to-floor':
      return { x: pole.rear_x_mm, y: 0, z: lay.poleZ, wrapPerimeter: rect(pole.height_mm + frame.depth, Math.max(pole.width_mm, frame.width)), group: 'rolling' };
    case 'axle-to-floor':
      return { x: axle.x_mm, y: 0, z: lay.frameZ, wrapPerimeter: rect(ax.depth + frame.depth, Math.max(ax.width, frame.width)), group: 'rolling' };
    case 'frame-corners':
    case 'siding-to-frame':
      return { x: box.floor.depth_mm / 2, y: 0, z: lay.frameZ, wrapPerimeter: rect(frame.depth, frame.width) * 2, group: 'rolling' };
  }
}

export function lashingLength(wraps: number, wrapPerimeter: number): number {
  return wraps * wrapPerimeter + 2 * LASHING_TAIL_MM;
}
