// The floor in plan with the crew on it: each person a handle that can be
// dragged with the pointer or moved with the arrow keys (10 mm a press, 50
// with Shift), so a position can be tried without typing it. Front is up.
import type { KeyPath } from '../core/spec/input-issue.ts';

const NS = 'http://www.w3.org/2000/svg';
const PAD = 40;

interface Person {
  role?: string;
  x_mm?: number;
  y_mm?: number;
}

const svgEl = (tag: string, attrs: Record<string, string | number>) => {
  const e = document.createElementNS(NS, tag);
  for (const [k, v] of Object.entries(attrs)) e.setAttribute(k, String(v));
  return e;
};

export function crewPlan(spec: Record<string, unknown>, onMove: (path: KeyPath, value: number) => void): HTMLElement | null {
  const floor = (spec.box as { floor?: { depth_mm?: unknown; width_mm?: unknown } } | undefined)?.floor;
  const depth = Number(floor?.depth_mm);
  const width = Number(floor?.width_mm);
  const crew = Array.isArray(spec.crew) ? (spec.crew as Person[]) : [];
  if (!(depth > 0 && width > 0)) return null;
  const fig = document.createElement('figure');
  fig.className = 'crew-plan';
  const svg = svgEl('svg', { viewBox: `${-width / 2 - PAD} ${-depth - PAD} ${width + 2 * PAD} ${depth + 2 * PAD}`, role: 'group', 'aria-label': 'The floor in plan, front up, with the crew: drag a person, or focus one and use the arrow keys' }) as SVGSVGElement;
  svg.append(svgEl('rect', { x: -width / 2, y: -depth, width, height: depth, class: 'floor-outline' }));
  const front = svgEl('text', { x: 0, y: -depth - 12, 'text-anchor': 'middle', class: 'plan-label' });
  front.textContent = 'front';
  svg.append(front);
  // Plan coordinates: x forward from the rear edge is up (−y on screen), y to the left is left (−x on screen).
  const toScreen = (p: Person) => ({ cx: -(p.y_mm ?? 0), cy: -(p.x_mm ?? 0) });
  crew.forEach((p, i) => {
    if (typeof p.x_mm !== 'number' || typeof p.y_mm !== 'number') return;
    const g = svgEl('g', { class: 'person', tabindex: 0, role: 'slider', 'aria-label': `${p.role ?? `crew ${i + 1}`}: ${p.x_mm} mm forward of the rear edge, ${p.y_mm} mm left of the centre line`, 'aria-valuenow': p.x_mm, 'data-index': i });
    const { cx, cy } = toScreen(p);
    const dot = svgEl('circle', { cx, cy, r: 45 });
    const label = svgEl('text', { x: cx, y: cy + 8, 'text-anchor': 'middle' });
    label.textContent = String(i + 1);
    g.append(dot, label);
    const place = (x: number, y: number) => {
      const xr = Math.round(Math.min(depth, Math.max(0, x)));
      const yr = Math.round(Math.min(width / 2, Math.max(-width / 2, y)));
      dot.setAttribute('cx', String(-yr));
      dot.setAttribute('cy', String(-xr));
      label.setAttribute('x', String(-yr));
      label.setAttribute('y', String(-xr + 8));
      return { xr, yr };
    };
    const commit = (x: number, y: number) => {
      const { xr, yr } = place(x, y);
      onMove(['crew', i, 'x_mm'], xr);
      onMove(['crew', i, 'y_mm'], yr);
    };
    g.addEventListener('pointerdown', (e) => {
      g.setPointerCapture(e.pointerId);
      const toPlan = (ev: PointerEvent) => {
        const pt = new DOMPoint(ev.clientX, ev.clientY).matrixTransform(svg.getScreenCTM()!.inverse());
        return { x: -pt.y, y: -pt.x };
      };
      const move = (ev: PointerEvent) => {
        const q = toPlan(ev);
        place(q.x, q.y);
      };
      const up = (ev: PointerEvent) => {
        g.removeEventListener('pointermove', move);
        g.removeEventListener('pointerup', up);
        const q = toPlan(ev);
        commit(q.x, q.y);
      };
      g.addEventListener('pointermove', move);
      g.addEventListener('pointerup', up);
    });
    g.addEventListener('keydown', (e) => {
      const step = e.shiftKey ? 50 : 10;
      const d = { ArrowUp: [step, 0], ArrowDown: [-step, 0], ArrowLeft: [0, step], ArrowRight: [0, -step] }[e.key];
      if (!d) return;
      e.preventDefault();
      commit((p.x_mm ?? 0) + d[0], (p.y_mm ?? 0) + d[1]);
    });
    svg.append(g);
  });
  const cap = document.createElement('figcaption');
  cap.textContent = 'The crew on the floor (plan, front up): drag a person, or focus one and use the arrow keys; the check follows.';
  fig.append(svg, cap);
  return fig;
}
