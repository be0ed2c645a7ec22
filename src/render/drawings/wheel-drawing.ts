import { spokeDetail } from './spoke-detail.ts';
import { ARROW_DEFS, dimAttrs, fontRules, n3, SvgSheet, type Fonts, type Pt } from './svg-sheet.ts';
import { arcSegments } from './obstacles.ts';
import { formatNumber } from '../../core/format/number-format.ts';
import type { WheelGeometry } from '../../core/cutlist/wheel-geometry.ts';

// The wheel in elevation, to a stated scale on an A4 sheet, with the
// setting-out dimensions, a detail of one spoke and the figures as a table.
// The sheet's user unit is one millimetre of paper (viewBox 0 0 210 297);
// the root's data-scale gives the elevation's scale 1:n (the spoke detail's
// group carries its own), so a length in the drawing times n is the length
// on the wheel.

const PAGE = { w: 210, h: 297 };
/** Common drawing scales, 1:n (ISO 5455 and its halves). */
const SCALES = [1, 2, 2.5, 5, 10, 20, 25, 50, 100];
/** Largest wheel diameter on paper, mm: leaves room for the dimensions, the table and the spoke detail. */
const MAX_DRAWN = 140;
const FONT = 3.5;
const LINE = 5.5;
const FONTS: Fonts = { label: { size: FONT }, title: { size: 5, bold: true }, subtitle: { size: FONT, bold: true }, small: { size: 2.8 }, table: { size: FONT } };

const mm = (v: number) => formatNumber(v, 'mm');
const deg = (v: number) => `${formatNumber(v)}°`;

export function drawingScale(diameter: number): number {
  return SCALES.find((s) => diameter / s <= MAX_DRAWN) ?? SCALES[SCALES.length - 1];
}

export function wheelDrawing(g: WheelGeometry): string {
  const s = drawingScale(2 * g.tread);
  const Rd = g.tread / s;
  const cx = PAGE.w / 2;
  const cy = 36 + Rd;
  const c: Pt = [cx, cy];
  // A point at radius r (wheel mm) and angle a (degrees clockwise from the top).
  const at = (r: number, a: number): Pt => {
    const t = (a * Math.PI) / 180;
    return [cx + (r / s) * Math.sin(t), cy - (r / s) * Math.cos(t)];
  };
  const sheet = new SvgSheet(FONTS, { x: 1, y: 1, w: PAGE.w - 2, h: PAGE.h - 2 });
  // On paper, the angle clockwise from the top is the SVG angle less a right angle.
  const rad = (a: number) => (a * Math.PI) / 180 - Math.PI / 2;
  const arc = (r: number, a0: number, a1: number, cls: string, extra = '') => sheet.arc(at(r, a0), at(r, a1), r / s, a1 - a0 > 180, cls, extra, arcSegments(c, r / s, rad(a0), rad(a1)));

  sheet.text(cx, 14, 'Wheel setting-out, one of two alike', 'middle', 'title');
  sheet.text(cx, 20, `Scale 1:${s} on A4 · dimensions in mm · angles clockwise from spoke 1 (at the top)`);

  // Rim, nave and bore.
  sheet.circle(c, g.tread / s, 'tread');
  if (g.tyreThickness > 0) sheet.circle(c, g.felloeOuter / s, 'felloe-outer');
  sheet.circle(c, g.felloeInner / s, 'felloe-inner');
  sheet.circle(c, g.naveRadius / s, 'nave');
  sheet.circle(c, g.boreRadius / s, 'bore');

  // Spokes: outline at ± half the width, and the centre line the setting-out is measured on.
  const hw = g.spokeWidth / 2;
  g.mortisePositionsDeg.forEach((a, i) => {
    const t = (a * Math.PI) / 180;
    const off = (r: number, side: number): Pt => {
      const [x, y] = at(r, a);
      return [x + side * (hw / s) * Math.cos(t), y + side * (hw / s) * Math.sin(t)];
    };
    const rIn = Math.sqrt(Math.max(0, g.naveRadius ** 2 - hw * hw));
    const rOut = Math.sqrt(Math.max(0, g.felloeInner ** 2 - hw * hw));
    for (const side of [-1, 1]) sheet.line(off(rIn, side), off(rOut, side), 'spoke');
    sheet.line(at(g.naveRadius, a), at(g.felloeInner, a), 'spoke-centre', ` data-spoke="${i + 1}" data-angle="${n3(a)}"`);
    const [lx, ly] = at(g.naveRadius + 0.55 * (g.felloeInner - g.naveRadius), a);
    sheet.label({ text: `${i + 1}`, at: [lx, ly], cls: 'small', gap: hw / s + 0.8, first: { x: lx + 3 * Math.cos(t), y: ly + 3 * Math.sin(t) + 1, anchor: 'middle' } });
  });
  // Tenons of spoke 1, dashed inside the nave and the felloe.
  for (const side of [-1, 1]) {
    const x = cx + side * (hw / 2 / s);
    sheet.line([x, cy - (g.naveRadius - g.tenonNave) / s], [x, cy - g.naveRadius / s], 'tenon');
    sheet.line([x, cy - g.felloeInner / s], [x, cy - (g.felloeInner + g.tenonFelloe) / s], 'tenon');
  }

  // Felloe joints with their dowels.
  for (const a of g.jointPositionsDeg) {
    sheet.line(at(g.felloeInner, a), at(g.felloeOuter, a), 'felloe-joint', ` data-angle="${n3(a)}"`);
    sheet.circle(at(g.dowelRadius, a), 0.8, 'dowel');
  }

  // Diameter, below the wheel.
  const yd = cy + Rd + 10;
  for (const side of [-1, 1]) sheet.line([cx + side * Rd, cy], [cx + side * Rd, yd + 2], 'extension');
  sheet.line([cx - Rd, yd], [cx + Rd, yd], 'dim', dimAttrs('diameter', 2 * g.tread));
  sheet.text(cx, yd - 1.5, `Ø ${mm(2 * g.tread)}`);

  // Spoke 1: between shoulders on the left, overall with tenons on the right.
  const xl = cx - hw / s - 5;
  const xr = cx + hw / s + 5;
  const y = (r: number) => cy - r / s;
  for (const r of [g.naveRadius, g.felloeInner]) sheet.line([cx - hw / s, y(r)], [xl - 1.5, y(r)], 'extension');
  for (const r of [g.naveRadius - g.tenonNave, g.felloeInner + g.tenonFelloe]) sheet.line([cx + hw / s, y(r)], [xr + 1.5, y(r)], 'extension');
  sheet.line([xl, y(g.naveRadius)], [xl, y(g.felloeInner)], 'dim', dimAttrs('spoke-shoulders', g.shoulders));
  sheet.line([xr, y(g.naveRadius - g.tenonNave)], [xr, y(g.felloeInner + g.tenonFelloe)], 'dim', dimAttrs('spoke-overall', g.overall));
  const ym = y((g.naveRadius + g.felloeInner) / 2);
  sheet.label({ text: [mm(g.shoulders), 'shoulders'], at: [xl, ym], first: { x: xl - 1.5, y: ym - 2, anchor: 'end' }, prefer: ['w', 'nw', 'sw'] });
  sheet.label({ text: [mm(g.overall), 'overall'], at: [xr, ym], first: { x: xr + 1.5, y: ym - 2, anchor: 'start' }, prefer: ['e', 'ne', 'se'] });

  // Mortise spacing between spokes 2 and 3, clear of spoke 1's dimensions.
  const first = g.mortisePositionsDeg[1];
  const ra = g.naveRadius + 0.3 * (g.felloeInner - g.naveRadius);
  arc(ra, first, first + g.mortiseSpacingDeg, 'dim', dimAttrs('mortise-angle', g.mortiseSpacingDeg));
  const [mx, my] = at(ra + 5 * s, first + g.mortiseSpacingDeg / 2);
  sheet.label({ text: deg(g.mortiseSpacingDeg), at: at(ra, first + g.mortiseSpacingDeg / 2), first: { x: mx, y: my + FONT / 3, anchor: 'middle' } });

  // One felloe piece: its arc outside the rim, its chord across it.
  if (g.pieces >= 2) {
    const [a0, a1] = [g.jointPositionsDeg[0], g.jointPositionsDeg[1]];
    const rArc = g.tread + 5 * s;
    for (const a of [a0, a1]) sheet.line(at(g.tread, a), at(rArc + 2 * s, a), 'extension');
    arc(rArc, a0, a1, 'dim', dimAttrs('felloe-arc', g.arc));
    const [x, yy] = at(rArc + 5 * s, (a0 + a1) / 2);
    const side = x < cx - 1 ? 'end' : x > cx + 1 ? 'start' : 'middle';
    sheet.label({ text: `arc ${mm(g.arc)} (outer face)`, at: at(rArc, (a0 + a1) / 2), first: { x, y: yy + FONT / 3, anchor: side }, prefer: side === 'end' ? ['w', 'nw', 'sw'] : ['e', 'ne', 'se'] });
    const p = at(g.felloeOuter, a0);
    const q = at(g.felloeOuter, a1);
    sheet.line(p, q, 'chord', ` data-dim="felloe-chord" data-value="${n3(g.chord)}"`);
    // Along the chord towards its second end, clear of spoke 1's dimensions.
    const u = 0.65;
    const [x2, y2] = [p[0] + u * (q[0] - p[0]), p[1] + u * (q[1] - p[1])];
    sheet.label({ text: `chord ${mm(g.chord)}`, at: [x2, y2], first: { x: x2 + (x2 < cx ? -1.5 : 1.5), y: y2 + FONT / 3, anchor: x2 < cx ? 'end' : 'start' }, prefer: x2 < cx ? ['w', 'nw', 'sw'] : ['e', 'ne', 'se'] });
  }

  // Scale bar under the diameter.
  const bar = niceBar(2 * g.tread);
  const yb = yd + 8;
  const x0 = cx - bar / s / 2;
  sheet.rect(x0, yb, bar / s, 1.5, 'scale-bar', ` data-length="${bar}"`);
  sheet.text(x0, yb + 5.5, '0', 'middle', 'small');
  sheet.text(x0 + bar / s, yb + 5.5, `${bar} mm`, 'middle', 'small');

  // The figures as lines of a table, then the spoke detail.
  let yt = yb + 14;
  for (const r of tableLines(g)) {
    sheet.text(15, yt, r, 'start', 'table');
    yt += LINE;
  }
  spokeDetail(sheet, g, 20, yt + 2);

  const style = [
    'circle, line, path, rect { fill: none; stroke: #000; stroke-width: 0.35; }',
    '.tread { stroke-width: 0.6; } .bore { stroke-dasharray: 1.5 1; }',
    '.spoke-centre { stroke-width: 0.18; stroke-dasharray: 4 1 1 1; } .tenon, .tenon-outline { stroke-dasharray: 1 0.8; }',
    '.felloe-joint { stroke-width: 0.5; } .dowel { fill: #000; }',
    '.dim, .extension, .chord, .nave-face, .felloe-face { stroke-width: 0.18; } .chord { stroke-dasharray: 2 1; }',
    '.scale-bar { fill: #000; stroke: none; }',
    fontRules(FONTS),
    '.leader { stroke-width: 0.18; }',
    '#dim-arrow path { fill: #000; stroke: none; }',
  ].join(' ');
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${PAGE.w}mm" height="${PAGE.h}mm" viewBox="0 0 ${PAGE.w} ${PAGE.h}" data-scale="${s}" data-unit="mm" data-centre="${n3(cx)} ${n3(cy)}">`,
    `<style>${style}</style>`,
    ARROW_DEFS,
    ...sheet.finish(),
    '</svg>',
  ].join('\n');
}

/** A round length for the scale bar, at most half the wheel's diameter. */
function niceBar(diameter: number): number {
  const steps = [50, 100, 200, 250, 500, 1000, 2000];
  return steps.filter((v) => v <= diameter / 2).pop() ?? steps[0];
}

function tableLines(g: WheelGeometry): string[] {
  const list = (v: number[]) => v.map(deg).join(', ');
  const rows = [
    `Diameter ${mm(2 * g.tread)}; felloe radius ${mm(g.felloeOuter)} outer, ${mm(g.felloeInner)} inner; nave Ø ${mm(2 * g.naveRadius)}, bore Ø ${mm(2 * g.boreRadius)}`,
    `Spokes: ${g.spokes}; mortises every ${deg(g.mortiseSpacingDeg)}, at ${list(g.mortisePositionsDeg)}`,
    `Spoke: ${mm(g.shoulders)} between shoulders, ${mm(g.overall)} overall; tenon ${mm(g.tenonNave)} into the nave, ${mm(g.tenonFelloe)} into the felloe`,
    `Felloe: ${g.pieces} piece${g.pieces > 1 ? 's' : ''}; arc ${mm(g.arc)}, chord ${mm(g.chord)} on the outer face; end faces radial, ${deg(g.endAngleDeg)} to the chord`,
    `Joints and dowels at ${list(g.jointPositionsDeg)}; dowels at radius ${mm(g.dowelRadius)} (mid-depth)`,
    g.tyreLength === null ? 'Tyre: none' : `Tyre: ${mm(g.tyreLength)} long, cut to the mid-thickness circumference`,
  ];
  return rows.flatMap((r) => wrap(r, 95));
}

function wrap(s: string, width: number): string[] {
  const out: string[] = [];
  let line = '';
  for (const word of s.split(' ')) {
    if (line && line.length + 1 + word.length > width) {
      out.push(line);
      line = `    ${word}`;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) out.push(line);
  return out;
}
