import type { Pt } from './obstacles.ts';
import { drawingSheet, SHEET_WIDTH, svgDocument } from './drawing.ts';
import type { SvgSheet } from './svg-sheet.ts';

// The axes a specification's positions are measured on, drawn on a plain
// outline of a build in side view and in plan: x forward from the rear edge
// of the floor, y to the left of the centre line, z up from the ground, all in
// mm. With x to the right and z up, y points into the page: the side view is
// seen from the vehicle's right. Not to scale: the outline only shows where each axis starts and which
// way it points. The numbers below are the outline's own proportions, paper mm.

const SIDE = { top: 16, ground: 72 };
const PLAN = { top: 96, centre: 124 };
const HEIGHT = 164;
/** Rear edge of the floor on paper (x = 0 in both views). */
const X0 = 52;
const FLOOR_DEPTH = 30;
const WHEEL_R = 17;
const AXLE_X = 12;
const FLOOR_TOP = 30;
const TRACK = 40;
const YOKE: Pt = [160, SIDE.ground - 40];
const AXIS = 26;

export function coordinateDiagram(): string {
  const sheet = drawingSheet(HEIGHT);
  sheet.text(12, 8, 'Where positions are measured from: x, y and z in mm', 'start', 'title');
  sideView(sheet);
  planView(sheet);
  return svgDocument({
    height: HEIGHT,
    data: { diagram: 'coordinates' },
    style: ['.axis { stroke-width: 0.5; } .outline { stroke: #777; } .wheel-plan { stroke: #777; stroke-width: 1.4; } .origin { fill: #000; }'],
    parts: sheet.finish(),
  });
}

function axis(sheet: SvgSheet, name: string, from: Pt, to: Pt, words: string): void {
  sheet.line(from, to, 'axis', ` data-axis="${name}" marker-end="url(#load-arrow)"`);
  sheet.label({ text: words, at: to, cls: 'small', gap: 1.5 });
}

function sideView(sheet: SvgSheet): void {
  const g = SIDE.ground;
  sheet.text(12, SIDE.top, 'Side view, from the right', 'start');
  sheet.line([10, g], [SHEET_WIDTH - 10, g], 'ground');
  const hub: Pt = [X0 + AXLE_X, g - WHEEL_R];
  sheet.circle(hub, WHEEL_R, 'outline');
  sheet.circle(hub, 1.5, 'outline');
  // The floor and the siding above it.
  sheet.rect(X0, g - FLOOR_TOP, FLOOR_DEPTH, 2, 'outline');
  sheet.rect(X0, g - FLOOR_TOP - 12, FLOOR_DEPTH, 12, 'outline hidden');
  sheet.line([X0 + FLOOR_DEPTH / 2, g - FLOOR_TOP + 2], YOKE, 'outline');
  sheet.rect(YOKE[0] - 1.5, YOKE[1] - 1.5, 3, 3, 'outline');
  const o: Pt = [X0, g];
  sheet.circle(o, 0.9, 'origin');
  // x = 0 runs up the rear edge of the floor; z = 0 is the ground.
  sheet.line([X0, g - FLOOR_TOP - 16], [X0, g + 3], 'centre', ' data-line="x0"');
  axis(sheet, 'x', o, [X0 + AXIS + 8, g], 'x forward');
  axis(sheet, 'z', o, [X0, g - AXIS - 20], 'z up');
  sheet.label({ text: ['origin: on the ground, on the centre line,', 'under the rear edge of the floor;', 'y points into the page'], at: o, cls: 'small', prefer: ['sw', 's', 'w'] });
  sheet.label({ text: 'rear edge of the floor: x = 0', at: [X0, g - FLOOR_TOP - 12], cls: 'small', prefer: ['nw', 'w'] });
  sheet.label({ text: 'ground: z = 0', at: [130, g], cls: 'small', prefer: ['s', 'se'] });
  sheet.label({ text: 'to the yoke and the horses', at: YOKE, cls: 'small', prefer: ['n', 'nw'] });
}

function planView(sheet: SvgSheet): void {
  const c = PLAN.centre;
  sheet.text(12, PLAN.top, 'Plan, from above', 'start');
  sheet.rect(X0, c - TRACK / 2 + 6, FLOOR_DEPTH, TRACK - 12, 'outline');
  for (const side of [-1, 1]) sheet.line([X0 + AXLE_X - WHEEL_R, c + (side * TRACK) / 2], [X0 + AXLE_X + WHEEL_R, c + (side * TRACK) / 2], 'wheel-plan', '', 1.1);
  sheet.line([X0 + AXLE_X, c - TRACK / 2], [X0 + AXLE_X, c + TRACK / 2], 'outline');
  sheet.line([X0 + FLOOR_DEPTH, c], [YOKE[0], c], 'outline');
  sheet.line([YOKE[0], c - 12], [YOKE[0], c + 12], 'outline');
  // The centre line is y = 0; left is up on paper, as seen from above facing forward.
  sheet.line([X0 - 14, c], [X0 + FLOOR_DEPTH + 4, c], 'centre', ' data-line="y0"');
  const o: Pt = [X0, c];
  sheet.circle(o, 0.9, 'origin');
  axis(sheet, 'x', o, [X0 + AXIS + 8, c], 'x forward');
  axis(sheet, 'y', o, [X0, c - AXIS - 6], 'y to the left');
  sheet.label({ text: ['origin: on the centre line,', 'at the rear edge of the floor;', 'z points out of the page'], at: o, cls: 'small', prefer: ['sw', 'w', 's'] });
  sheet.label({ text: 'left wheel', at: [X0 + AXLE_X + WHEEL_R, c - TRACK / 2], cls: 'small', prefer: ['e', 'ne'] });
  sheet.label({ text: 'right wheel', at: [X0 + AXLE_X + WHEEL_R, c + TRACK / 2], cls: 'small', prefer: ['e', 'se'] });
  sheet.label({ text: 'centre line: y = 0', at: [X0 - 14, c], cls: 'small', prefer: ['w', 'nw'] });
}

/** Where the diagram is kept in the repository, for the README. */
export const COORDINATES_FILE = 'docs/coordinates.svg';

/** The file's text: the diagram and a closing newline. */
export function coordinatesSvgFile(): string {
  return `${coordinateDiagram()}\n`;
}
