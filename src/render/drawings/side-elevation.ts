import type { BuildScene } from '../../core/result/build-scene.ts';
import { dimAttrs, n3, type SvgSheet, type Pt } from './svg-sheet.ts';
import { LINE_PAD, polylineSegments } from './obstacles.ts';
import { formatNumber } from '../../core/format/number-format.ts';
import { axleBar, frameBar } from '../../core/model/spec-sections.ts';
import { drawingSheet, fitScale, FONT, scaleBarLength, SHEET_WIDTH, svgDocument, type Drawing } from './drawing.ts';

// The build seen from its right side (x forward to the right, z up, so y, to
// the left, points into the page), to scale: ground, wheel, axle end-on,
// frame and siding, the pole along its centre line, the yoke end-on, the crew
// at their places and centre-of-mass heights, the rolling assembly's centre of
// mass, and the static case's axle and yoke loads as arrows. Vehicle x runs
// forward from the rear of the floor, z up from the ground.

const MARGIN = { left: 12, right: 12, top: 14 };
/** Paper below the ground: two rows of dimensions and the scale bar. */
const BELOW = 32;
/** Drawn length of a load arrow, paper mm. */
const ARROW = 13;

const mm = (v: number) => formatNumber(v, 'mm');
const newtons = (v: number) => formatNumber(v, 'N');

/** `coarsest` draws at that scale (1:n) where the build alone would fit a larger one: builds compared side by side share one scale. */
export function sideElevation(a: BuildScene, coarsest = 0): Drawing {
  const { spec } = a;
  const lay = a.layout;
  const r = lay.wheelRadius;
  const frame = frameBar(spec);
  const axle = axleBar(spec);
  const depth = spec.box.floor.depth_mm;
  const xMin = Math.min(spec.axle.x_mm - r, -frame.width, spec.pole.rear_x_mm);
  const xMax = spec.pole.yoke_x_mm + spec.yoke.width_mm / 2;
  const crewTop = Math.max(0, ...spec.crew.map((c) => lay.floorTopZ + c.cg_height_mm));
  const zMax = Math.max(2 * r, spec.pole.yoke_height_mm + spec.yoke.height_mm / 2, lay.floorTopZ + spec.box.siding_height_mm, crewTop);
  const s = Math.max(fitScale(xMax - xMin, SHEET_WIDTH - MARGIN.left - MARGIN.right), coarsest);
  const ox = MARGIN.left - xMin / s;
  const oy = MARGIN.top + 8 + zMax / s; // the ground line; 8 mm for the labels above the tallest part
  const P = (x: number, z: number): Pt => [ox + x / s, oy - z / s];
  const height = oy + BELOW;
  const sheet = drawingSheet(height);

  sheet.text(MARGIN.left, 8, `Side elevation, scale 1:${s} on A4, dimensions in mm`, 'start', 'title');
  sheet.line([MARGIN.left / 2, oy], [SHEET_WIDTH - MARGIN.right / 2, oy], 'ground');
  // Below the ground is for the dimensions: labels of the build stay above it.
  sheet.avoid({ kind: 'box', box: { x: 0, y: oy, w: SHEET_WIDTH, h: BELOW } });

  // Wheel, nave and axle (end-on).
  const hub = P(spec.axle.x_mm, lay.axleZ);
  sheet.raw(`<circle class="wheel" cx="${n3(hub[0])}" cy="${n3(hub[1])}" r="${n3(r / s)}" data-diameter="${n3(2 * r)}"/>`, { kind: 'ring', c: hub, r: r / s, pad: LINE_PAD });
  sheet.circle(hub, lay.felloeInner / s, 'felloe');
  sheet.circle(hub, spec.wheels.nave.diameter_mm / 2 / s, 'nave');
  if (axle.round) sheet.circle(hub, axle.width / 2 / s, 'axle');
  else sheet.rect(hub[0] - axle.width / 2 / s, hub[1] - axle.depth / 2 / s, axle.width / s, axle.depth / s, 'axle');

  // Frame rails in section at the rear and front, the floor between them, the siding above.
  const [fx0, fz0] = P(-frame.width, lay.floorTopZ);
  sheet.rect(fx0, fz0, (depth + 2 * frame.width) / s, frame.depth / s, 'frame');
  sheet.rect(ox, oy - (lay.floorTopZ + spec.box.siding_height_mm) / s, depth / s, spec.box.siding_height_mm / s, 'hidden');

  drawPole(a, sheet, P, s);

  // Yoke end-on at the yoke point.
  const yk = P(spec.pole.yoke_x_mm, spec.pole.yoke_height_mm);
  sheet.rect(yk[0] - spec.yoke.width_mm / 2 / s, yk[1] - spec.yoke.height_mm / 2 / s, spec.yoke.width_mm / s, spec.yoke.height_mm / s, 'yoke');
  sheet.label({ text: 'yoke', at: [yk[0], yk[1] - spec.yoke.height_mm / 2 / s], first: { x: yk[0], y: yk[1] - spec.yoke.height_mm / 2 / s - 2, anchor: 'end' }, prefer: ['nw', 'n', 'ne'] });

  // Crew: a post from the floor to each person's centre of mass, each named beside it.
  for (const c of spec.crew) {
    const foot = P(c.x_mm, lay.floorTopZ);
    const cg = P(c.x_mm, lay.floorTopZ + c.cg_height_mm);
    sheet.line(foot, cg, 'crew');
    sheet.raw(`<circle class="crew-cg" cx="${n3(cg[0])}" cy="${n3(cg[1])}" r="1.2" data-role="${c.role.replace(/[^\w -]/g, '')}"/>`, { kind: 'disc', c: cg, r: 1.2 + LINE_PAD });
  }
  for (const c of spec.crew) sheet.label({ text: `crew: ${c.role}`, at: P(c.x_mm, lay.floorTopZ + c.cg_height_mm), cls: 'small', prefer: ['ne', 'nw', 'e', 'w'] });

  // Centre of mass of the rolling assembly: a circle with two filled quarters.
  const cm = a.rolling;
  const [cx, cy] = P(cm.x_mm, cm.z_mm);
  const q = 2;
  sheet.raw(
    `<g class="centre-of-mass" data-x="${n3(cm.x_mm)}" data-z="${n3(cm.z_mm)}"><circle cx="${n3(cx)}" cy="${n3(cy)}" r="${q}"/><path class="cm-fill" d="M ${n3(cx)} ${n3(cy)} h ${q} a ${q} ${q} 0 0 0 ${-q} ${-q} z M ${n3(cx)} ${n3(cy)} h ${-q} a ${q} ${q} 0 0 0 ${q} ${q} z"/></g>`,
    { kind: 'disc', c: [cx, cy], r: q + LINE_PAD },
  );
  sheet.label({ text: 'centre of mass', at: [cx, cy], cls: 'small', gap: q + 1, prefer: ['w', 'nw', 'sw', 'e'] });

  // Static loads as the reactions on the vehicle: up where positive, down where negative.
  const stat = a.static_case;
  loadArrow(sheet, [hub[0], hub[1]], stat.axle_load_N, `axle load ${newtons(stat.axle_load_N)} N`, 'start');
  loadArrow(sheet, [yk[0], yk[1] + (Math.sign(stat.yoke_load_N || 1) * spec.yoke.height_mm) / 2 / s], stat.yoke_load_N, `yoke load ${newtons(stat.yoke_load_N)} N`, 'end');

  // Dimensions below the ground: axle from the rear of the floor and the reach to the yoke; then the wheel.
  const row1 = oy + 7;
  const row2 = oy + 16;
  for (const x of [0, spec.axle.x_mm, spec.pole.yoke_x_mm]) sheet.line(P(x, 0), [ox + x / s, row1 + 1.5], 'extension');
  sheet.line([ox, row1], [hub[0], row1], 'dim', dimAttrs('axle-x', spec.axle.x_mm));
  sheet.text((ox + hub[0]) / 2, row1 - 1.2, mm(spec.axle.x_mm), 'middle', 'small');
  sheet.line([hub[0], row1], [yk[0], row1], 'dim', dimAttrs('reach', spec.pole.yoke_x_mm - spec.axle.x_mm));
  sheet.text((hub[0] + yk[0]) / 2, row1 - 1.2, `axle to yoke ${mm(spec.pole.yoke_x_mm - spec.axle.x_mm)}`, 'middle', 'small');
  for (const side of [-1, 1]) sheet.line([hub[0] + (side * r) / s, oy - r / s], [hub[0] + (side * r) / s, row2 + 1.5], 'extension');
  sheet.line([hub[0] - r / s, row2], [hub[0] + r / s, row2], 'dim', dimAttrs('wheel-diameter', 2 * r));
  sheet.text(hub[0] + r / s + 1.5, row2 + FONT / 3, `wheel Ø ${mm(2 * r)}`, 'start', 'small');

  const bar = scaleBarLength(xMax - xMin);
  const yb = oy + 23;
  sheet.rect(MARGIN.left, yb, bar / s, 1.2, 'scale-bar', ` data-length="${bar}"`);
  sheet.text(MARGIN.left + bar / s + 1.5, yb + 1.2, `${bar} mm`, 'start', 'small');

  const caption =
    `Side elevation at 1:${s}, drawn from the specification: the static case with the crew as placed. ` +
    `The rolling assembly's centre of mass is ${mm(cm.x_mm)} mm ahead of the rear of the floor and ${mm(cm.z_mm)} mm above the ground; ` +
    `the wheels carry ${newtons(stat.axle_load_N)} N and the yoke ${newtons(stat.yoke_load_N)} N (${newtons(stat.per_horse_N)} N a horse).`;
  const svg = svgDocument({
    height,
    scale: s,
    origin: [ox, oy],
    data: { 'wheel-diameter': 2 * r, 'axle-x': spec.axle.x_mm, 'axle-z': lay.axleZ, 'yoke-x': spec.pole.yoke_x_mm, 'yoke-z': spec.pole.yoke_height_mm },
    style: [
      `.pole { stroke: #999; stroke-width: ${n3(spec.pole.height_mm / s)}; } .frame, .axle, .yoke { fill: #ccc; }`,
      '.crew { stroke-width: 0.6; } .crew-cg { fill: #fff; } .cm-fill { fill: #000; stroke: none; } .wheel { stroke-width: 0.5; }',
    ],
    parts: sheet.finish(),
  });
  return { id: 'side-elevation', title: 'Side elevation', caption, svg, scale: s };
}

function drawPole(a: BuildScene, sheet: SvgSheet, P: (x: number, z: number) => Pt, s: number): void {
  const { pole } = a.spec;
  const lay = a.layout;
  const rear = P(pole.rear_x_mm, lay.poleZ);
  const root = P(pole.root_x_mm, lay.poleZ);
  const yoke = P(pole.yoke_x_mm, pole.yoke_height_mm);
  const pt = (p: Pt) => `${n3(p[0])} ${n3(p[1])}`;
  let d: string;
  if (lay.pole.ok && pole.bend_radius_mm !== undefined) {
    const t = lay.pole.path.tangentPoint;
    // Upward on paper is anticlockwise, SVG sweep 0; a downward bend sweeps 1.
    const sweep = pole.yoke_height_mm >= lay.poleZ ? 0 : 1;
    d = `M ${pt(rear)} L ${pt(root)} A ${n3(pole.bend_radius_mm / s)} ${n3(pole.bend_radius_mm / s)} 0 0 ${sweep} ${pt(P(t.x, t.z))} L ${pt(yoke)}`;
  } else {
    // No bend given, or one that cannot reach the yoke (the bend rule says so): drawn straight from the root.
    d = `M ${pt(rear)} L ${pt(root)} L ${pt(yoke)}`;
  }
  // Labels keep off the pole's drawn width; the bend is taken as its chord, a sagitta off at most.
  const bendEnd = lay.pole.ok && pole.bend_radius_mm !== undefined ? [P(lay.pole.path.tangentPoint.x, lay.pole.path.tangentPoint.z)] : [];
  sheet.raw(`<path class="pole" d="${d}"/>`, ...polylineSegments([rear, root, ...bendEnd, yoke], pole.height_mm / s / 2 + LINE_PAD));
  sheet.raw(`<path class="centre" d="${d}"/>`);
  const mid: Pt = [(root[0] + yoke[0]) / 2, (root[1] + yoke[1]) / 2];
  sheet.label({ text: 'pole', at: mid, gap: pole.height_mm / s / 2 + 1.5, first: { x: mid[0] + 2, y: mid[1] + 4, anchor: 'start' }, prefer: ['s', 'se', 'n'] });
}

/** An arrow ending at `at`, from below for a positive (upward) force, from above for a negative one. */
function loadArrow(sheet: SvgSheet, at: Pt, force_N: number, label: string, anchor: 'start' | 'end'): void {
  const dir = force_N >= 0 ? 1 : -1;
  const from: Pt = [at[0], at[1] + dir * ARROW];
  sheet.line(from, at, 'load', ` marker-end="url(#load-arrow)" data-force="${n3(force_N)}"`);
  sheet.label({ text: label, at: from, cls: 'small', first: { x: at[0] + (anchor === 'start' ? 1.5 : -1.5), y: from[1] - dir * 2, anchor }, prefer: anchor === 'start' ? ['e', 'ne', 'se'] : ['w', 'nw', 'sw'] });
}
