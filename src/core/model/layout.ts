import type { CheckedSpecification } from '../spec/spec.types.ts';
import { polePath, type PolePathResult } from './pole-path.ts';
import { axleBar, frameBar } from './spec-sections.ts';
import { tyreThickness } from './tyre.ts';

// Heights and lengths of the assembly in the side elevation, in mm, derived
// once from the specification. The floor's inner span runs x = 0..depth; the
// frame rails sit just outside it.

export interface Layout {
  wheelRadius: number;
  /** Axle centre height: the wheel radius (rigid wheel on level ground). */
  axleZ: number;
  /** The pole sits on the axle and the frame on the pole. */
  poleZ: number;
  floorTopZ: number;
  frameZ: number;
  /** Floor height from the stack alone, used as the default. */
  stackHeight: number;
  /** Felloe inner and outer radius. */
  felloeInner: number;
  felloeOuter: number;
  /** Spoke length between the nave and the felloe. */
  spokeLength: number;
  pole: PolePathResult;
}

export function stackHeight(spec: Pick<CheckedSpecification, 'wheels' | 'axle' | 'pole' | 'box'>): number {
  return spec.wheels.diameter_mm / 2 + axleBar(spec).depth / 2 + spec.pole.height_mm + frameBar(spec).depth;
}

export function layout(spec: CheckedSpecification): Layout {
  const r = spec.wheels.diameter_mm / 2;
  const floorTopZ = spec.box.floor.height_mm;
  const frameDepth = frameBar(spec).depth;
  const frameZ = floorTopZ - frameDepth / 2;
  const poleZ = floorTopZ - frameDepth - spec.pole.height_mm / 2;
  const felloeOuter = r - tyreThickness(spec);
  const felloeInner = felloeOuter - spec.wheels.felloe.depth_mm;
  return {
    wheelRadius: r,
    axleZ: r,
    poleZ,
    floorTopZ,
    frameZ,
    stackHeight: stackHeight(spec),
    felloeOuter,
    felloeInner,
    spokeLength: felloeInner - spec.wheels.nave.diameter_mm / 2,
    pole: polePath(spec.pole.rear_x_mm, spec.pole.root_x_mm, poleZ, { x: spec.pole.yoke_x_mm, z: spec.pole.yoke_height_mm }, spec.pole.bend_radius_mm),
  };
}
