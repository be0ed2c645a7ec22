import type { CheckResult } from '../../core/result/check-result.ts';
import type { Drawing } from '../drawings/drawing.ts';
import { reportDrawings } from '../drawings/report-drawings.ts';

/** Each build's drawings with the scale each kind of drawing is shared at. */
export interface ComparedDrawings {
  /** By build, in order: that build's drawings. */
  builds: Drawing[][];
  /** By drawing id: the one scale (1:n) every build is drawn at. */
  scales: Record<string, number>;
}

/**
 * The drawings of every build, each kind at one scale: the one the largest
 * build needs, so the builds can be laid side by side and measured alike.
 */
export function comparedDrawings(results: readonly CheckResult[]): ComparedDrawings {
  const first = results.map((r) => reportDrawings(r.scene));
  const scales: Record<string, number> = {};
  for (const d of first.flat()) if (d.scale !== undefined) scales[d.id] = Math.max(scales[d.id] ?? 0, d.scale);
  return { builds: results.map((r) => reportDrawings(r.scene, scales)), scales };
}

/** The file a build's drawing is written to beside compare.md. */
export const comparedDrawingFile = (label: string, id: string): string => `drawing-${label}-${id}.svg`;
