import type { BuildScene } from '../../core/result/build-scene.ts';
import { esc, n3, type SvgSheet, type Pt } from './svg-sheet.ts';
import { formatNumber } from '../../core/format/number-format.ts';
import { FloorOutline } from '../../core/model/cable-net/outline.ts';
import { frameBar } from '../../core/model/spec-sections.ts';
import type { StrapTension } from '../../core/model/cable-net/floor-results.ts';
import type { Family } from '../../core/model/cable-net/net.ts';
import { textWidth } from './text-box.ts';
import { drawingSheet, FONTS, fitScale, SHEET_WIDTH, svgDocument, type Drawing } from './drawing.ts';

// The strap floor in plan under the crew standing, to scale, each strap at its
// true width and shaded by the largest tension along it. A two-way weave is
// drawn as two panels, one per family, so neither hides the other. Plan x runs
// forward from the rear rail (right on paper), y to the left (up on paper).

const MARGIN = { side: 12, top: 14, gap: 14 };
/** Light to dark: the shades of the tension bands, least first. */
const SHADES = ['#e3e9ef', '#bccbdb', '#8fa9c5', '#5f83ab', '#2f5b8a'];
const LEGEND = 31;

const newtons = (v: number) => formatNumber(v, 'N');

/** `coarsest`: as for the side elevation, a scale shared by builds compared side by side. */
export function floorTension(a: BuildScene, coarsest = 0): Drawing {
  const { spec } = a;
  const floor = spec.box.floor;
  const m = a.floor;
  const outline = new FloorOutline(floor.depth_mm, floor.width_mm, floor.frame.bend_radius_mm ?? 0, frameBar(spec).width);
  const families = (['front-to-back', 'side-to-side'] as const).filter((f) => m.straps.some((st) => st.family === f));
  const panels = Math.max(1, families.length);
  const s = Math.max(
    fitScale(floor.depth_mm * panels, SHEET_WIDTH - 2 * MARGIN.side - (panels - 1) * MARGIN.gap),
    fitScale(floor.width_mm, 150), // and no taller than most of a page
    coarsest,
  );
  const top = (m.straps.length ? Math.max(...m.straps.map((t) => t.maxTension_N)) : 0) || 1;
  const band = (t: number) => Math.min(SHADES.length - 1, Math.floor((t / top) * SHADES.length));
  const panelW = floor.depth_mm / s;
  const left = (SHEET_WIDTH - panels * panelW - (panels - 1) * MARGIN.gap) / 2;
  const oy = MARGIN.top + 6 + floor.width_mm / 2 / s;
  const yl = oy + floor.width_mm / 2 / s + 10;
  const height = yl + LEGEND - 10;
  const sheet = drawingSheet(height);
  sheet.text(MARGIN.side, 8, `Floor straps in plan, scale 1:${s} on A4, crew standing`, 'start', 'title');

  (families.length ? families : [null]).forEach((family, k) => {
    const ox = left + k * (panelW + MARGIN.gap);
    const P = (x: number, y: number): Pt => [ox + x / s, oy - y / s];
    if (family) for (const st of m.straps.filter((t) => t.family === family)) strap(sheet, P, st, spec.floor_straps.width_mm / s, SHADES[band(st.maxTension_N)]);
    sheet.raw(`<path class="frame-inner" d="${outlinePath(outline, P, s)}"/>`);
    for (const c of spec.crew) {
      const { length_mm: l, width_mm: w } = floor.foot_patch;
      const [x, y] = P(c.x_mm - l / 2, c.y_mm + w / 2);
      sheet.rect(x, y, l / s, w / s, 'foot');
    }
    const [lx] = P(floor.depth_mm / 2, 0);
    sheet.text(lx, oy + floor.width_mm / 2 / s + 5, family ? `${family} straps` : 'straps not solved', 'middle', 'small');
    sheet.text(P(floor.depth_mm, 0)[0] + 1.5, oy + 1, 'front', 'start', 'small');
  });

  // Legend: the bands' tension ranges, each key as wide as its figures need.
  sheet.text(MARGIN.side, yl + 2.5, 'Largest tension along the strap, N:', 'start', 'small');
  let x = MARGIN.side;
  SHADES.forEach((shade, i) => {
    const range = `${newtons((i * top) / SHADES.length)}–${newtons(((i + 1) * top) / SHADES.length)}`;
    sheet.rect(x, yl + 5, 6, 3, 'key', ` style="fill:${shade}"`);
    sheet.text(x + 7, yl + 7.5, range, 'start', 'small');
    x += 7 + textWidth(range, FONTS.small) + 4;
  });
  sheet.text(MARGIN.side, yl + 13, 'Dashed: the crew\'s foot patches. Straps at their true width and place.', 'start', 'small');

  const caption = m.straps.length
    ? `The strap floor at 1:${s} under the crew standing (no dynamic factor), each strap shaded by the largest tension along it; the most tensioned carries ${newtons(m.maxTension_N)} N (${m.maxTensionAt}).` +
      (m.converged ? '' : ' The solver did not converge: the shading is not a result.')
    : `The strap floor at 1:${s}: ${m.stopped ?? 'the net was not solved'}, so no tensions are shown.`;
  const svg = svgDocument({
    height,
    scale: s,
    origin: [left, oy],
    data: { depth: floor.depth_mm, width: floor.width_mm, 'max-tension': top, panels },
    style: ['.frame-inner { stroke-width: 0.5; } .strap { stroke: none; } .foot { stroke-dasharray: 1 0.6; stroke-width: 0.35; } .key { stroke-width: 0.18; }'],
    parts: sheet.finish(),
  });
  return { id: 'floor-straps', title: 'Floor straps by tension', caption, svg, scale: s };
}

function strap(sheet: SvgSheet, P: (x: number, y: number) => Pt, st: StrapTension, w: number, shade: string): void {
  const along = (f: Family, u: number): Pt => (f === 'front-to-back' ? P(u, st.cross) : P(st.cross, u));
  const [p, q] = [along(st.family, st.start), along(st.family, st.end)];
  const x = Math.min(p[0], q[0]) - (st.family === 'front-to-back' ? 0 : w / 2);
  const y = Math.min(p[1], q[1]) - (st.family === 'front-to-back' ? w / 2 : 0);
  const width = st.family === 'front-to-back' ? Math.abs(q[0] - p[0]) : w;
  const height = st.family === 'front-to-back' ? w : Math.abs(q[1] - p[1]);
  sheet.rect(x, y, width, height, 'strap', ` style="fill:${shade}" data-family="${esc(st.family)}" data-number="${st.number}" data-tension="${n3(st.maxTension_N)}"`);
}

/** The frame's inner edge: square at the rear, the front corners rounded where the front rail is bent. */
function outlinePath(o: FloorOutline, P: (x: number, y: number) => Pt, s: number): string {
  const r = o.cornerRadius;
  const h = o.width / 2;
  const pt = (x: number, y: number) => P(x, y).map(n3).join(' ');
  const rp = n3(r / s);
  // Both corners turn anticlockwise as seen: SVG sweep 0.
  return `M ${pt(0, -h)} L ${pt(o.depth - r, -h)} A ${rp} ${rp} 0 0 0 ${pt(o.depth, -h + r)} L ${pt(o.depth, h - r)} A ${rp} ${rp} 0 0 0 ${pt(o.depth - r, h)} L ${pt(0, h)} Z`;
}
