import type { CheckedSpecification } from '../spec/spec.types.ts';
import { frameBar } from './spec-sections.ts';

// The floor straps as cut: how many run each way, their clear span, and the
// length of each with one full turn round the frame rail at either end.
// Lengths in mm. The mass model and the leather list both use these.

export interface StrapRun {
  direction: 'front-to-back' | 'side-to-side';
  count: number;
  /** Clear span across the floor. */
  span: number;
  /** One turn round the rail section at each end: 2 (rail width + rail thickness), or π d round a round bar. */
  wrap: number;
  /** One strap: span + 2 wraps. */
  length: number;
}

export function strapRuns(spec: CheckedSpecification): StrapRun[] {
  const { depth_mm, width_mm } = spec.box.floor;
  const p = spec.floor_straps.pitch_mm;
  const wrap = frameBar(spec).perimeter;
  const run = (direction: StrapRun['direction'], count: number, span: number): StrapRun => ({ direction, count, span, wrap, length: span + 2 * wrap });
  const fb = run('front-to-back', Math.floor(width_mm / p), depth_mm);
  const ss = run('side-to-side', Math.floor(depth_mm / p), width_mm);
  const weave = spec.floor_straps.weave;
  return weave === 'two-way' ? [fb, ss] : weave === 'front-to-back' ? [fb] : [ss];
}
