import { dimAttrs, type SvgSheet } from './svg-sheet.ts';
import type { WheelGeometry } from '../../core/cutlist/wheel-geometry.ts';
import { formatNumber } from '../../core/format/number-format.ts';

// Spoke 1 laid flat at a larger scale: the tenon into the nave, the length
// between shoulders and the tongue through the felloe, chain-dimensioned,
// with the overall length below. The tenons are drawn at half the spoke's
// width for the picture only; their section is the wheelwright's choice.

const SCALES = [1, 2, 2.5, 5, 10];
const MAX_LENGTH = 170;
const MAX_DEPTH = 16;

export function spokeDetailScale(g: WheelGeometry): number {
  return SCALES.find((s) => g.overall / s <= MAX_LENGTH && g.spokeWidth / s <= MAX_DEPTH) ?? SCALES[SCALES.length - 1];
}

/** Draws the detail with its top at y; returns the y below it. */
export function spokeDetail(sheet: SvgSheet, g: WheelGeometry, left: number, top: number): number {
  const s = spokeDetailScale(g);
  const x0 = left;
  const xn = x0 + g.tenonNave / s; // nave surface: the first shoulder
  const xf = xn + g.shoulders / s; // felloe's inner face: the second shoulder
  const xe = xf + g.tenonFelloe / s;
  const h = g.spokeWidth / s;
  const yc = top + 12 + h / 2;
  sheet.raw(`<g class="spoke-detail" data-scale="${s}">`);
  sheet.text(x0, top + 3, `Spoke 1, scale 1:${s}`, 'start', 'subtitle');
  sheet.rect(xn, yc - h / 2, xf - xn, h, 'spoke-body');
  sheet.rect(x0, yc - h / 4, xn - x0, h / 2, 'tenon-outline');
  sheet.rect(xf, yc - h / 4, xe - xf, h / 2, 'tenon-outline');
  // Nave surface and the felloe's two faces, as thin lines across the spoke.
  sheet.label({ text: 'nave', at: [xn, yc - h / 2 - 3], cls: 'small', first: { x: xn - 1, y: yc - h / 2 - 4, anchor: 'end' }, prefer: ['nw', 'ne'] });
  sheet.label({ text: 'felloe', at: [(xf + xe) / 2, yc - h / 2 - 3], cls: 'small', first: { x: (xf + xe) / 2, y: yc - h / 2 - 4, anchor: 'middle' }, prefer: ['n', 'nw', 'ne'] });
  const yChain = yc + h / 2 + 6;
  const yAll = yChain + 7;
  for (const [x, cls] of [[xn, 'nave-face'], [xf, 'felloe-face'], [xe, 'felloe-face']] as const) sheet.line([x, yc - h / 2 - 3], [x, yChain + 2], cls);
  for (const x of [x0, xe]) sheet.line([x, yc], [x, yAll + 2], 'extension');
  sheet.line([x0, yChain], [xn, yChain], 'dim', dimAttrs('detail-tenon-nave', g.tenonNave));
  sheet.line([xn, yChain], [xf, yChain], 'dim', dimAttrs('detail-shoulders', g.shoulders));
  sheet.line([xf, yChain], [xe, yChain], 'dim', dimAttrs('detail-tenon-felloe', g.tenonFelloe));
  sheet.text((x0 + xn) / 2, yChain - 1.2, formatNumber(g.tenonNave, 'mm'), 'middle', 'small');
  sheet.text((xn + xf) / 2, yChain - 1.2, `${formatNumber(g.shoulders, 'mm')} between shoulders`);
  sheet.text((xf + xe) / 2, yChain - 1.2, formatNumber(g.tenonFelloe, 'mm'), 'middle', 'small');
  sheet.line([x0, yAll], [xe, yAll], 'dim', dimAttrs('detail-overall', g.overall));
  sheet.text((x0 + xe) / 2, yAll - 1.2, `${formatNumber(g.overall, 'mm')} overall`);
  sheet.raw('</g>');
  return yAll + 4;
}
