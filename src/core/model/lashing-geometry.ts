import type { CheckedSpecification } from '../spec/spec.types.ts';
import type { Layout } from './layout.ts';

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
// perimeter of their stacked sections.
export function jointPlace(joint: Joint, spec: CheckedSpecification, lay: Layout): JointPlace {
  const { pole, axle, yoke, box } = spec;
  const frame = box.floor.frame;
  switch (joint) {
    case 'pole-to-axle':
      return { x: axle.x_mm, y: 0, z: lay.axleZ + axle.height_mm / 2, wrapPerimeter: rect(pole.height_mm + axle.height_mm, Math.max(pole.width_mm, axle.width_mm)), group: 'rolling' };
    case 'pole-to-yoke':
      return { x: pole.yoke_x_mm, y: 0, z: pole.yoke_height_mm, wrapPerimeter: rect(pole.height_mm + yoke.height_mm, Math.max(pole.width_mm, yoke.width_mm)), group: 'yoke' };
    case 'pole-to-floor':
      return { x: pole.rear_x_mm, y: 0, z: lay.poleZ, wrapPerimeter: rect(pole.height_mm + frame.thickness_mm, Math.max(pole.width_mm, frame.width_mm)), group: 'rolling' };
    case 'axle-to-floor':
      return { x: axle.x_mm, y: 0, z: lay.frameZ, wrapPerimeter: rect(axle.height_mm + frame.thickness_mm, Math.max(axle.width_mm, frame.width_mm)), group: 'rolling' };
    case 'frame-corners':
    case 'siding-to-frame':
      return { x: box.floor.depth_mm / 2, y: 0, z: lay.frameZ, wrapPerimeter: rect(frame.thickness_mm, frame.width_mm) * 2, group: 'rolling' };
  }
}

export function lashingLength(wraps: number, wrapPerimeter: number): number {
  return wraps * wrapPerimeter + 2 * LASHING_TAIL_MM;
}
