import { fontRules, n3, SvgSheet, type Fonts } from './svg-sheet.ts';

// The report's drawings of the build. Each is SVG text on a sheet whose user
// unit is one millimetre of paper (width and height are given in mm, so it
// prints to size on A4); data-scale gives the drawing's scale 1:n and
// data-origin the paper point of the drawing's own origin, so a length on
// paper times n is the length on the vehicle.

export interface Drawing {
  /** Short name, also the file name stem (drawing-<id>.svg). */
  id: string;
  title: string;
  caption: string;
  svg: string;
  /** The scale 1:n it is drawn at; absent for a diagram not to scale. */
  scale?: number;
}

/** Width of the sheet, paper mm: the text width of A4 with 15 mm margins. */
export const SHEET_WIDTH = 180;
/** Text sizes, paper mm (3 mm is about 8.5 pt). */
export const FONT = 3;
export const SMALL = 2.6;
export const TITLE = 4;
/** The fonts of the drawings of the build, by text class. */
export const FONTS: Fonts = { label: { size: FONT }, title: { size: TITLE, bold: true }, small: { size: SMALL } };
/** Labels keep this far inside the sheet's edge, paper mm. */
const EDGE = 1;

/** A sheet of the given height for a drawing of the build, labels kept on it. */
export function drawingSheet(height: number): SvgSheet {
  return new SvgSheet(FONTS, { x: EDGE, y: EDGE, w: SHEET_WIDTH - 2 * EDGE, h: height - 2 * EDGE });
}

/** Common drawing scales, 1:n (ISO 5455 and its halves). */
const SCALES = [1, 2, 2.5, 5, 10, 20, 25, 50, 100, 200, 250, 500, 1000];

/** The largest common scale at which `extent_mm` on the vehicle fits `room_mm` of paper. */
export function fitScale(extent_mm: number, room_mm: number): number {
  return SCALES.find((s) => extent_mm / s <= room_mm) ?? SCALES[SCALES.length - 1];
}

/** A round length for a scale bar, about a quarter of the drawn extent. */
export function scaleBarLength(extent_mm: number): number {
  const steps = [100, 200, 250, 500, 1000, 2000, 2500, 5000, 10000];
  return steps.filter((v) => v <= extent_mm / 4).pop() ?? steps[0];
}

const BASE_STYLE = [
  'circle, line, path, rect, polyline { fill: none; stroke: #000; stroke-width: 0.3; }',
  '.ground { stroke-width: 0.5; } .hidden { stroke-dasharray: 1.2 0.8; } .centre { stroke-width: 0.18; stroke-dasharray: 4 1 1 1; }',
  '.dim, .extension { stroke-width: 0.18; } .scale-bar { fill: #000; stroke: none; }',
  '.load { stroke-width: 0.5; } #load-arrow path, #dim-arrow path { fill: #000; stroke: none; }',
  fontRules(FONTS),
  '.leader { stroke-width: 0.18; }',
];

const LOAD_ARROW =
  '<marker id="load-arrow" viewBox="0 0 6 6" refX="6" refY="3" markerWidth="3" markerHeight="3" markerUnits="userSpaceOnUse" orient="auto"><path d="M0,0 L6,3 L0,6 z"/></marker>';
const DIM_ARROW =
  '<marker id="dim-arrow" viewBox="0 0 6 6" refX="6" refY="3" markerWidth="2.4" markerHeight="2.4" markerUnits="userSpaceOnUse" orient="auto-start-reverse"><path d="M0,0 L6,3 L0,6 z"/></marker>';

/** The root element around a drawing's parts; `data` adds data-* attributes (key dimensions, in vehicle mm). A diagram not to scale has no scale and origin. */
export function svgDocument(o: { height: number; scale?: number; origin?: [number, number]; data: Record<string, number | string>; style?: string[]; parts: string[] }): string {
  const extra = Object.entries(o.data)
    .map(([k, v]) => ` data-${k}="${typeof v === 'number' ? n3(v) : v}"`)
    .join('');
  const scaled = o.scale !== undefined && o.origin ? ` data-scale="${o.scale}" data-unit="mm" data-origin="${n3(o.origin[0])} ${n3(o.origin[1])}"` : '';
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${SHEET_WIDTH}mm" height="${n3(o.height)}mm" viewBox="0 0 ${SHEET_WIDTH} ${n3(o.height)}"${scaled}${extra}>`,
    `<style>${[...BASE_STYLE, ...(o.style ?? [])].join(' ')}</style>`,
    `<defs>${LOAD_ARROW}${DIM_ARROW}</defs>`,
    ...o.parts,
    '</svg>',
  ].join('\n');
}
