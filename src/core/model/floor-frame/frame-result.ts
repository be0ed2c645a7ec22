import type { RailMoment } from './frame-model.ts';

// What the coupled floor model tells about its frame, for the frame-rail
// rule, the floor rules' working and the loads sheet.

export interface FrameStrutResult {
  part: 'pole' | 'axle';
  stiffness_N_per_mm: number;
  /** Force it carries between the rails, N (compression positive). */
  force_N: number;
  working: string[];
}

export interface FloorFrameResult {
  /** 'coupled': the anchors move with the rails; 'fixed': rigid anchors (for comparison). */
  anchors: 'coupled' | 'fixed';
  species: string;
  E_MPa: number;
  /** Second moment of area and area of a rail bent in plan, mm⁴ and mm². */
  I_mm4: number;
  A_mm2: number;
  /** Centre-line radius of the bent front corners, mm (0: square, rigid corners). */
  cornerRadius_mm: number;
  nodes: number;
  elements: number;
  /** Each rail's largest moment in plan under the straps' pulls in this case. */
  rails: RailMoment[];
  struts: FrameStrutResult[];
  unsupported: string[];
  /** Largest inward movement of a strap end, mm. */
  maxAnchorMove_mm: number;
  /** The same frame under the pretension alone (no crew), the net solved with it. */
  pretension: { rails: RailMoment[]; minPull_N: number; maxPull_N: number; maxAnchorMove_mm: number };
  sources: string[];
}
