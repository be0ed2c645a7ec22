import type { BuildScene } from '../../core/result/build-scene.ts';
import { dimAttrs, n3, type Pt } from './svg-sheet.ts';
import { arcSegments } from './obstacles.ts';
import { drawingSheet, fitScale, scaleBarLength, SHEET_WIDTH, svgDocument, type Drawing } from './drawing.ts';
import { formatNumber } from '../../core/format/number-format.ts';

// The planned turn in plan, to scale: the yoke's path, the axle centre's and
// both wheels' paths (radii from the turn model), the vehicle at one instant
// with its pole tangent to the axle's path, and the off-tracking (yoke path
// radius less axle path radius). The turn is drawn to the left; plan
// coordinates u (the vehicle's heading) and v (towards the turn centre), mm,
// with the turn centre at the origin.

const MARGIN = { side: 12, top: 14, bottom: 16 };
/** How far the paths run beyond the vehicle, each way, as a fraction of the axle-to-yoke reach. */
const RUN = 0.35;

const mm = (v: number) => formatNumber(v, 'mm');
const metres = (v_mm: number) => `${formatNumber(v_mm / 1000, 'm')} m`;

/** `coarsest`: as for the side elevation, a scale shared by builds compared side by side. */
export function planTurn(a: BuildScene, coarsest = 0): Drawing {
  const t = a.turn;
  const R = { yoke: t.yokeRadius * 1000, axle: t.axleRadius * 1000, inner: t.innerRadius * 1000, outer: t.outerRadius * 1000 };
  const L = t.reach * 1000;
  const track = t.track * 1000;
  const d = a.spec.wheels.diameter_mm;
  // The vehicle's points, the turn centre at (0, 0) and the axle on the v = -R.axle line.
  const axleV = -R.axle;
  const pts: Pt[] = [[0, axleV - track / 2], [0, axleV + track / 2], [L, axleV]];
  // Arc ends: the angle either side of the vehicle that covers the reach and a run beyond.
  const reachAngle = (r: number) => (r > 0 ? Math.min(Math.PI * 0.6, ((1 + RUN) * L) / r) : 0);
  const circles = t.steady
    ? ([['yoke', R.yoke], ['axle', R.axle], ['inner', R.inner], ['outer', R.outer]] as const).filter(([, r]) => r > 0)
    : ([['yoke', R.yoke]] as const);
  // Sample the arcs for the extent of the drawing.
  for (const [, r] of circles) {
    const phi = reachAngle(r);
    for (let k = -8; k <= 8; k++) pts.push(polar(r, (k / 8) * phi));
  }
  const uMin = Math.min(...pts.map((p) => p[0]));
  const uMax = Math.max(...pts.map((p) => p[0]));
  const vMin = Math.min(...pts.map((p) => p[1]));
  const vMax = Math.max(...pts.map((p) => p[1]));
  const s = Math.max(fitScale(Math.max(uMax - uMin, ((vMax - vMin) * SHEET_WIDTH) / 110), SHEET_WIDTH - 2 * MARGIN.side), coarsest);
  const ox = SHEET_WIDTH / 2 - (uMin + uMax) / 2 / s;
  const oy = MARGIN.top + 6 + vMax / s; // v up on paper: the turn centre lies above the sheet
  const P = (p: Pt): Pt => [ox + p[0] / s, oy - p[1] / s];
  const height = oy - vMin / s + MARGIN.bottom;
  const sheet = drawingSheet(height);
  sheet.text(MARGIN.side, 8, `Plan of the planned turn, scale 1:${s} on A4, turning left`, 'start', 'title');

  const labels: Record<string, string> = { yoke: 'yoke path', axle: 'axle path', inner: 'inner wheel', outer: 'outer wheel' };
  for (const [name, r] of circles) {
    const phi = reachAngle(r);
    const [p, q] = [P(polar(r, -phi)), P(polar(r, phi))];
    const rp = n3(r / s);
    // From the rear (negative angle) to the front: anticlockwise as seen, SVG sweep 0.
    // On paper the point at plan angle a lies at angle pi/2 - a about the turn centre.
    sheet.raw(`<path class="path-${name}" d="M ${n3(p[0])} ${n3(p[1])} A ${rp} ${rp} 0 0 0 ${n3(q[0])} ${n3(q[1])}" data-radius="${n3(r)}"/>`, ...arcSegments([ox, oy], r / s, Math.PI / 2 - phi, Math.PI / 2 + phi));
  }
  for (const [name, r] of circles) {
    const end = P(polar(r, -reachAngle(r)));
    // By preference above the inner two paths and below the outer two, so neighbours part.
    const above = name === 'inner' || name === 'axle';
    sheet.label({ text: `${labels[name]} ${metres(r)}`, at: end, cls: 'small', first: { x: end[0] + 1, y: end[1] + (above ? -1.5 : 3.5), anchor: 'start' }, prefer: above ? ['ne', 'n', 'e'] : ['se', 's', 'e'] });
  }

  // The vehicle: axle across, wheels along the heading, pole to the yoke.
  const wheelL = P([0, axleV - track / 2]);
  const wheelR = P([0, axleV + track / 2]);
  sheet.line(wheelL, wheelR, 'axle');
  for (const [side, v] of [['outer', axleV - track / 2], ['inner', axleV + track / 2]] as const) {
    sheet.line(P([-d / 2, v]), P([d / 2, v]), 'wheel-plan', ` data-side="${side}" data-v="${n3(v)}"`, 1);
  }
  sheet.line(P([0, axleV]), P([L, axleV]), 'pole', '', 0.8);
  sheet.circle(P([L, axleV]), 1, 'yoke-point');

  // Track across the wheels, on the rear side.
  const xd = P([-d / 2, 0])[0] - 6;
  sheet.line([xd, wheelL[1]], [xd, wheelR[1]], 'dim', dimAttrs('track', track));
  const mid: Pt = [xd, (wheelL[1] + wheelR[1]) / 2];
  sheet.label({ text: `track ${mm(track)}`, at: mid, cls: 'small', first: { x: xd - 1.5, y: mid[1] + 1, anchor: 'end' }, prefer: ['w', 'e', 'nw', 'sw'] });

  if (t.steady) {
    // Off-tracking at the yoke: from the axle's path out to the yoke's, along the radius through the yoke.
    const ang = Math.atan2(L, R.axle);
    const from = P(polar(R.axle, ang));
    const to = P(polar(R.yoke, ang));
    sheet.line(from, to, 'dim', dimAttrs('off-tracking', R.yoke - R.axle));
    sheet.label({ text: `off-tracking ${metres(R.yoke - R.axle)}`, at: to, cls: 'small', first: { x: to[0] + 2, y: to[1] + 5, anchor: 'end' }, prefer: ['sw', 's', 'se'] });
  } else {
    sheet.text(SHEET_WIDTH / 2, oy - (vMin + vMax) / 2 / s, 'no steady turn: the yoke circle is not wider than the pole reaches', 'middle');
  }

  const bar = scaleBarLength(uMax - uMin);
  sheet.rect(MARGIN.side, height - 10, bar / s, 1.2, 'scale-bar', ` data-length="${bar}"`);
  sheet.text(MARGIN.side + bar / s + 1.5, height - 8.8, `${bar} mm`, 'start', 'small');

  const caption = t.steady
    ? `The planned turn at 1:${s}: yoke path radius ${metres(R.yoke)}, axle path ${metres(R.axle)}, wheels ${metres(R.inner)} and ${metres(R.outer)}; ` +
      `the axle runs ${metres(R.yoke - R.axle)} inside the yoke (off-tracking). At ${formatNumber(a.spec.operation.speed_kmh)} km/h the lateral acceleration is ${formatNumber(t.lateralAccel)} m/s².`
    : `The planned turn at 1:${s}: a yoke path of ${metres(R.yoke)} is not wider than the pole reaches (${metres(L)}), so there is no steady turn to draw.`;
  const svg = svgDocument({
    height,
    scale: s,
    origin: [ox, oy],
    data: { track, 'wheel-diameter': d, 'yoke-radius': R.yoke, 'axle-radius': R.axle, 'off-tracking': R.yoke - R.axle },
    style: ['.path-yoke { stroke-width: 0.5; } .path-axle { stroke-dasharray: 4 1 1 1; } .path-inner, .path-outer { stroke: #666; }', '.wheel-plan { stroke-width: 1.2; } .pole { stroke-width: 0.8; } .yoke-point { fill: #000; }'],
    parts: sheet.finish(),
  });
  return { id: 'plan-turn', title: 'Plan of the planned turn', caption, svg, scale: s };
}

/** The point at radius r and angle a (radians, anticlockwise from straight below the turn centre). */
function polar(r: number, a: number): Pt {
  return [r * Math.sin(a), -r * Math.cos(a)];
}
