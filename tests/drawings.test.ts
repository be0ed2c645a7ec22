import { buildScene } from '../src/core/result/scene-of.ts';
import { drawingsOf } from '../src/render/report-drawings.ts';
import { beforeAll, describe, expect, it } from 'vitest';
import { Analysis } from './support/analysis.ts';
import { reportDrawings } from '../src/render/drawings/report-drawings.ts';
import { inlineSvg } from '../src/render/inline-svg.ts';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { htmlOf, markdownOf } from './support/report-outputs.ts';
import { drawReportPlots } from '../src/render/report-plots.ts';
import { drawingOutputs } from '../src/render/report-drawings.ts';
import { deepMerge, prepared, readDemo, rulesData } from './support/fixtures.ts';

// The drawings' key dimensions measured back from the SVG text: the user unit
// is a millimetre of paper, data-scale gives 1:n and data-origin the paper
// point of the drawing's origin.

const num = (tag: string, name: string) => Number(new RegExp(`\\s${name}="([^"]+)"`).exec(tag)![1]);
const tags = (svg: string, cls: string) => [...svg.matchAll(new RegExp(`<[a-z]+ class="${cls}"[^>]*>`, 'g'))].map((m) => m[0]);
const length = (tag: string) => Math.hypot(num(tag, 'x2') - num(tag, 'x1'), num(tag, 'y2') - num(tag, 'y1'));
const dim = (svg: string, name: string) => tags(svg, 'dim').find((t) => t.includes(`data-dim="${name}"`))!;
const arcRadius = (tag: string) => Number(/ A ([\d.]+) /.exec(tag)![1]);

function sheet(svg: string) {
  const scale = num(svg, 'data-scale');
  const [ox, oy] = /data-origin="([\d.-]+) ([\d.-]+)"/.exec(svg)!.slice(1).map(Number);
  return { scale, ox, oy };
}

function drawn(raw: unknown) {
  const a = new Analysis(prepared(raw), rulesData);
  const byId = Object.fromEntries(reportDrawings(buildScene(a)).map((d) => [d.id, d]));
  return { a, spec: a.spec, byId };
}

const DEMOS = ['demo-two-crew', 'demo-rear-axle', 'teaching-flawed'];
// A build of our own with the wheel, track and axle moved, so the drawings must follow the specification.
const VARIANT = deepMerge(readDemo('demo-two-crew'), { wheels: { diameter_mm: 1010, track_mm: 1500 }, axle: { x_mm: 180 } });
const cases: [string, unknown][] = [...DEMOS.map((d) => [d, readDemo(d)] as [string, unknown]), ['variant of demo-two-crew', VARIANT]];

describe.each(cases)('drawings of %s', (_name, raw) => {
  const { a, spec, byId } = drawn(raw);

  it('are three, each with a title, a caption and SVG the report can inline', () => {
    expect(Object.keys(byId)).toEqual(['side-elevation', 'plan-turn', 'floor-straps']);
    for (const d of Object.values(byId)) {
      expect(d.title.length).toBeGreaterThan(0);
      expect(d.caption).toContain(`1:${num(d.svg, 'data-scale')}`);
      expect(inlineSvg(d.svg)).not.toBeNull();
      // Sized in paper millimetres, no wider than the A4 text width.
      expect(d.svg).toMatch(/^<svg [^>]*width="180mm" height="[\d.]+mm"/);
    }
  });

  it('side elevation: the wheel, the axle position and the dimensions measure what the specification says', () => {
    const svg = byId['side-elevation'].svg;
    const { scale, ox, oy } = sheet(svg);
    const wheel = tags(svg, 'wheel')[0];
    expect(2 * num(wheel, 'r') * scale).toBeCloseTo(spec.wheels.diameter_mm, 1);
    expect((num(wheel, 'cx') - ox) * scale).toBeCloseTo(spec.axle.x_mm, 1);
    // The axle centre stands a wheel radius above the ground line.
    expect((oy - num(wheel, 'cy')) * scale).toBeCloseTo(spec.wheels.diameter_mm / 2, 1);
    expect(length(dim(svg, 'wheel-diameter')) * scale).toBeCloseTo(spec.wheels.diameter_mm, 1);
    expect(length(dim(svg, 'axle-x')) * scale).toBeCloseTo(spec.axle.x_mm, 1);
    expect(length(dim(svg, 'reach')) * scale).toBeCloseTo(spec.pole.yoke_x_mm - spec.axle.x_mm, 1);
    expect(num(svg, 'data-wheel-diameter')).toBe(spec.wheels.diameter_mm);
  });

  it('side elevation: the centre of mass, the crew and the static loads are where the analysis puts them', () => {
    const svg = byId['side-elevation'].svg;
    const { scale, ox, oy } = sheet(svg);
    const cm = /<g class="centre-of-mass"[^>]*><circle cx="([\d.]+)" cy="([\d.]+)"/.exec(svg)!;
    expect((Number(cm[1]) - ox) * scale).toBeCloseTo(a.mass.rolling.x_mm, 0);
    expect((oy - Number(cm[2])) * scale).toBeCloseTo(a.mass.rolling.z_mm, 0);
    const crew = tags(svg, 'crew-cg');
    expect(crew).toHaveLength(spec.crew.length);
    crew.forEach((c, i) => {
      expect((num(c, 'cx') - ox) * scale).toBeCloseTo(spec.crew[i].x_mm, 0);
      expect((oy - num(c, 'cy')) * scale).toBeCloseTo(spec.box.floor.height_mm + spec.crew[i].cg_height_mm, 0);
    });
    const forces = tags(svg, 'load').map((t) => num(t, 'data-force'));
    expect(forces).toEqual([a.staticCase.axle_load_N, a.staticCase.yoke_load_N].map((v) => Number(v.toFixed(3))));
    expect(svg).toContain(`>axle load ${Math.round(a.staticCase.axle_load_N)} N<`);
    expect(svg).toContain(`>yoke load ${Math.round(a.staticCase.yoke_load_N)} N<`);
  });

  it('plan of the turn: the track, the wheels and the path radii come back from the geometry', () => {
    const svg = byId['plan-turn'].svg;
    const { scale } = sheet(svg);
    const [outer, inner] = tags(svg, 'wheel-plan');
    expect(Math.abs(num(outer, 'y1') - num(inner, 'y1')) * scale).toBeCloseTo(spec.wheels.track_mm, 1);
    expect(length(outer) * scale).toBeCloseTo(spec.wheels.diameter_mm, 1);
    expect(length(dim(svg, 'track')) * scale).toBeCloseTo(spec.wheels.track_mm, 1);
    const radius = (name: string) => arcRadius(tags(svg, `path-${name}`)[0]) * scale;
    expect(radius('yoke')).toBeCloseTo(spec.operation.turn_radius_m * 1000, 0);
    expect(radius('axle')).toBeCloseTo(a.turn.axleRadius * 1000, 0);
    expect(radius('outer') - radius('inner')).toBeCloseTo(spec.wheels.track_mm, 0);
    // The axle's path radius from the geometry alone: the yoke's circle less the pole's reach.
    const reach = spec.pole.yoke_x_mm - spec.axle.x_mm;
    expect(radius('axle')).toBeCloseTo(Math.sqrt(radius('yoke') ** 2 - reach ** 2), 0);
    expect(length(dim(svg, 'off-tracking')) * scale).toBeCloseTo(radius('yoke') - radius('axle'), 1);
  });

  it('floor: every strap at its true width, shaded darker the more it carries, with a legend', () => {
    const svg = byId['floor-straps'].svg;
    const { scale } = sheet(svg);
    const straps = tags(svg, 'strap');
    expect(straps).toHaveLength(a.floorStatic.straps.length);
    for (const st of straps) {
      const across = st.includes('front-to-back') ? num(st, 'height') : num(st, 'width');
      expect(across * scale).toBeCloseTo(spec.floor_straps.width_mm, 1);
    }
    const tensions = straps.map((t) => num(t, 'data-tension'));
    expect(Math.max(...tensions)).toBeCloseTo(a.floorStatic.maxTension_N, 2);
    // Shades run light to dark: sort by tension and the shade's lightness never rises.
    const light = (t: string) => parseInt(/fill:#([0-9a-f]{6})/.exec(t)![1].slice(0, 2), 16);
    const sorted = straps.map((t, i) => ({ t: tensions[i], l: light(t) })).sort((p, q) => p.t - q.t);
    sorted.slice(1).forEach((x, i) => expect(x.l).toBeLessThanOrEqual(sorted[i].l));
    expect(tags(svg, 'key')).toHaveLength(5);
    expect(svg).toContain('Largest tension along the strap, N:');
  });
});

describe('drawings in the report', () => {
  const p = prepareSpec(readDemo('demo-two-crew'), rulesData);
  if (!p.ok) throw new Error('demo does not prepare');
  const result = runCheck(p.spec, p.entries, rulesData);
  const md = markdownOf(result);
  let html = '';
  beforeAll(() => {
    html = htmlOf(result, drawReportPlots(result));
  });

  it('report.md links each drawing file written beside it, the side elevation right after the cautions', () => {
    const files = drawingOutputs(result).map(([name]) => name);
    expect(files).toEqual(['drawing-side-elevation.svg', 'drawing-plan-turn.svg', 'drawing-floor-straps.svg']);
    for (const f of files) expect(md).toContain(`](${f})`);
    const at = (s: string) => md.indexOf(s);
    expect(at('## Cautions')).toBeLessThan(at('](drawing-side-elevation.svg)'));
    expect(at('](drawing-side-elevation.svg)')).toBeLessThan(at('## Findings'));
    for (const [, svg] of drawingOutputs(result)) expect(svg.startsWith('<svg ')).toBe(true);
  });

  it('report.html holds them inline, scoped, with their captions', () => {
    expect(html).not.toMatch(/<img[^>]+drawing-/);
    expect(html.match(/<figure class="drawing"><svg class="axletree-drawing-[0-9a-z]+"/g)).toHaveLength(3);
    for (const d of drawingsOf(result)) expect(html).toContain(d.caption.slice(0, 40));
  });
});
