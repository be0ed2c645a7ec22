import { textBox, type Anchor, type Box, type Font } from '../../src/render/drawings/text-box.ts';

// Every text element of an SVG drawing with the box it takes on paper,
// estimated from its attributes and the font its style sheet gives its class
// (src/render/drawings/text-box.ts). Only what our drawings write is read:
// one <style> of plain rules, <text> without transforms or child elements.

export interface PlacedText {
  text: string;
  box: Box;
}

const attr = (tag: string, name: string) => new RegExp(`\\s${name}="([^"]*)"`).exec(tag)?.[1];
const unescape = (s: string) => s.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#(\d+);/g, (_m, d: string) => String.fromCharCode(Number(d))).replace(/&amp;/g, '&');

/** Font by selector (`text` or `.class`) from the drawing's style sheet. */
function fonts(svg: string): Map<string, Partial<Font>> {
  const css = /<style>([\s\S]*?)<\/style>/.exec(svg)?.[1] ?? '';
  const out = new Map<string, Partial<Font>>();
  for (const [, sel, body] of css.matchAll(/([^{}]+)\{([^}]*)\}/g)) {
    const size = /font-size:\s*([\d.]+)px/.exec(body)?.[1];
    const weight = /font-weight:\s*(\w+)/.exec(body)?.[1];
    for (const s of sel.split(',').map((x) => x.trim())) {
      const f = { ...out.get(s) };
      if (size) f.size = Number(size);
      if (weight) f.bold = weight === 'bold';
      out.set(s, f);
    }
  }
  return out;
}

export function textBoxes(svg: string): PlacedText[] {
  const sheet = fonts(svg);
  const base = sheet.get('text') ?? {};
  return [...svg.matchAll(/<text\b([^>]*)>([^<]*)<\/text>/g)].map(([, tag, body]) => {
    if (attr(tag, 'transform')) throw new Error(`a transformed text is beyond this reader: ${body}`);
    const font = { ...base };
    for (const cls of (attr(tag, 'class') ?? '').split(/\s+/).filter(Boolean)) Object.assign(font, sheet.get(`.${cls}`));
    const size = attr(tag, 'font-size');
    if (size) font.size = Number(size);
    if (font.size === undefined) throw new Error(`no font size for ${body}`);
    const text = unescape(body);
    return { text, box: textBox(Number(attr(tag, 'x')), Number(attr(tag, 'y')), text, font as Font, (attr(tag, 'text-anchor') ?? 'start') as Anchor) };
  });
}

/** Each pair of texts whose boxes share area, as "a | b". */
export function overlappingTexts(texts: readonly PlacedText[]): string[] {
  const out: string[] = [];
  texts.forEach((a, i) =>
    texts.slice(i + 1).forEach((b) => {
      const w = Math.min(a.box.x + a.box.w, b.box.x + b.box.w) - Math.max(a.box.x, b.box.x);
      const h = Math.min(a.box.y + a.box.h, b.box.y + b.box.h) - Math.max(a.box.y, b.box.y);
      if (w > 0 && h > 0) out.push(`${a.text} | ${b.text}`);
    }),
  );
  return out;
}
