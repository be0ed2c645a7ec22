// The drawings of the build. report.md links each as an SVG file written
// beside it (drawing-<id>.svg, by src/node/write-outputs.ts); report.html
// holds the same SVG inline. The side elevation follows the cautions; the
// others have a section of their own.

import type { CheckResult } from '../core/result/check-result.ts';
import type { Drawing } from './drawings/drawing.ts';
import { reportDrawings } from './drawings/report-drawings.ts';

/** The drawing shown on the first page, straight after the cautions. */
export const FIRST_DRAWING = 'side-elevation';

// The report model and the files beside it show the same drawings: draw them once per result.
const drawn = new WeakMap<CheckResult, Drawing[]>();

/** The drawings of the build, made from the result's scene. */
export function drawingsOf(result: CheckResult): Drawing[] {
  let d = drawn.get(result);
  if (!d) drawn.set(result, (d = reportDrawings(result.scene)));
  return d;
}

export function drawingFile(id: string): string {
  return `drawing-${id}.svg`;
}

/** The drawing files report.md links, for writing beside it. */
export function drawingOutputs(result: CheckResult): [string, string][] {
  return drawingsOf(result).map((d) => [drawingFile(d.id), `${d.svg.trim()}\n`]);
}
