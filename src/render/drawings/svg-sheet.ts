// A small writer for dimensioned drawings on a sheet whose user unit is one
// millimetre of paper: lines, circles, arcs, text and dimension lines, as
// SVG text (no DOM). Dimension lines carry data-dim and data-value (the
// figure on the part, not on paper) so a drawing can be read back.

export type Pt = [number, number];

export const n3 = (v: number) => Number(v.toFixed(3)).toString();

export function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

export const ARROW_DEFS =
  '<defs><marker id="dim-arrow" viewBox="0 0 6 6" refX="6" refY="3" markerWidth="2.4" markerHeight="2.4" markerUnits="userSpaceOnUse" orient="auto-start-reverse"><path d="M0,0 L6,3 L0,6 z"/></marker></defs>';

export class SvgSheet {
  readonly parts: string[] = [];
  line(p: Pt, q: Pt, cls: string, extra = ''): void {
    this.parts.push(`<line class="${cls}" x1="${n3(p[0])}" y1="${n3(p[1])}" x2="${n3(q[0])}" y2="${n3(q[1])}"${extra}/>`);
  }
  circle(c: Pt, r: number, cls: string): void {
    this.parts.push(`<circle class="${cls}" cx="${n3(c[0])}" cy="${n3(c[1])}" r="${n3(r)}"/>`);
  }
  rect(x: number, y: number, w: number, h: number, cls: string, extra = ''): void {
    this.parts.push(`<rect class="${cls}" x="${n3(x)}" y="${n3(y)}" width="${n3(w)}" height="${n3(h)}"${extra}/>`);
  }
  /** A clockwise arc of radius r (paper mm) from p to q. */
  arc(p: Pt, q: Pt, r: number, large: boolean, cls: string, extra = ''): void {
    this.parts.push(`<path class="${cls}" d="M ${n3(p[0])} ${n3(p[1])} A ${n3(r)} ${n3(r)} 0 ${large ? 1 : 0} 1 ${n3(q[0])} ${n3(q[1])}"${extra}/>`);
  }
  text(x: number, y: number, t: string, anchor: 'start' | 'middle' | 'end' = 'middle', cls = 'label'): void {
    this.parts.push(`<text class="${cls}" x="${n3(x)}" y="${n3(y)}" text-anchor="${anchor}">${esc(t)}</text>`);
  }
  raw(s: string): void {
    this.parts.push(s);
  }
}

/** Attributes of a dimension line: its name, the figure it stands for, arrows at both ends. */
export function dimAttrs(name: string, value: number): string {
  return ` data-dim="${name}" data-value="${n3(value)}" marker-start="url(#dim-arrow)" marker-end="url(#dim-arrow)"`;
}
