// The drawings of the build in the report. report.md links each as an SVG
// file written beside it (drawing-<id>.svg, by io/write-outputs.ts) with its
// caption under it; report.html puts the result's SVG inline in the link's
// place. The side elevation follows the cautions; the others have a section.

import type { CheckResult } from '../core/result/check-result.ts';
import type { Drawing } from './drawings/drawing.ts';
import { reportDrawings } from './drawings/report-drawings.ts';
import { escapeBlock, escapeInline } from './markdown-escape.ts';
import { inlineSvg } from './inline-svg.ts';

const FIRST = 'side-elevation';

// Markdown, HTML and the files beside them all show the same drawings: draw them once per result.
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

/** The drawing a linked file name stands for, if it is one of the result's. */
export function drawingOfFile(result: CheckResult, file: string): Drawing | undefined {
  return drawingsOf(result).find((d) => drawingFile(d.id) === file);
}

function drawingBlocks(d: Drawing): string[] {
  return [`![${escapeInline(d.title)}](${drawingFile(d.id)})`, `*${escapeBlock(d.caption)}*`];
}

/** The side elevation, placed straight after the cautions. */
export function firstDrawingBlocks(result: CheckResult): string[] {
  const d = drawingsOf(result).find((x) => x.id === FIRST);
  return d ? drawingBlocks(d) : [];
}

/** The other drawings under their own heading. */
export function drawingSections(result: CheckResult): string[] {
  const rest = drawingsOf(result).filter((d) => d.id !== FIRST);
  return rest.length ? ['## Drawings of the build', ...rest.flatMap(drawingBlocks)] : [];
}

/** The drawing files report.md links, for writing beside it. */
export function drawingOutputs(result: CheckResult): [string, string][] {
  return drawingsOf(result).map((d) => [drawingFile(d.id), `${d.svg.trim()}\n`]);
}

/** The drawing inline for report.html, or a pointer to its file where it cannot be inlined. */
export function drawingHtml(d: Drawing): string {
  const svg = inlineSvg(d.svg);
  return svg === null ? `<em>The drawing could not be placed inline; see ${drawingFile(d.id)} beside report.md.</em>` : `<span class="drawing">${svg}</span>`;
}
