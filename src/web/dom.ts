// A small element builder: the page is made of plain DOM, no framework.
type Attrs = Record<string, string | number | boolean | undefined>;

export function el<K extends keyof HTMLElementTagNameMap>(tag: K, attrs: Attrs = {}, ...children: (Node | string | null | undefined | false)[]): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) {
    if (v === undefined || v === false) continue;
    if (k === 'text') e.textContent = String(v);
    else e.setAttribute(k, v === true ? '' : String(v));
  }
  for (const c of children) if (c !== null && c !== undefined && c !== false) e.append(c);
  return e;
}

/** SVG text the renderers made (our own, never user markup) as a node. */
export function svgNode(svg: string): Element {
  const doc = new DOMParser().parseFromString(svg, 'image/svg+xml');
  return document.importNode(doc.documentElement, true);
}
