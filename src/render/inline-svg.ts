/**
 * The setting-out drawing comes from the core as SVG text and goes inline into
 * the HTML report. The report forbids scripts and outside resources, so a
 * drawing that holds anything active or external is not inlined; null says so.
 * A style sheet inside an inline SVG applies to the whole page, so its rules
 * are scoped to the drawing's own root: a class made from the drawing's text,
 * so one drawing's sheet reaches neither the page nor another drawing.
 */
const FORBIDDEN = [
  /<script/i,
  /<foreignObject/i,
  /<iframe|<object|<embed/i,
  /\son[a-z]+\s*=/i, // event handlers
  /javascript:/i,
  /\b(?:href|src)\s*=\s*["'](?!#)/i, // links other than to the drawing's own ids
  /url\(\s*["']?(?!#)/i,
  /<!DOCTYPE|<!ENTITY/i,
];

/** Stem of the class put on an inlined drawing's root; its style rules apply only below it. */
export const DRAWING_SCOPE = 'axletree-drawing';

/** The scope class of one drawing: the stem and a hash of its text (FNV-1a, 32 bits); the same drawing twice shares one, harmlessly. */
export function scopeClass(svg: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < svg.length; i++) h = Math.imul(h ^ svg.charCodeAt(i), 0x01000193) >>> 0;
  return `${DRAWING_SCOPE}-${h.toString(36)}`;
}

/** The SVG as it goes inline in the HTML report, or null where it cannot. */
export function inlineSvg(svg: string): string | null {
  const body = svgBody(svg);
  if (!/^<svg[\s>]/.test(body) || !body.endsWith('</svg>')) return null;
  if (FORBIDDEN.some((re) => re.test(body))) return null;
  return scopeStyles(body, scopeClass(body));
}

/** The SVG without an XML prolog, which is legal in a file but not inside HTML. */
function svgBody(svg: string): string {
  return svg.trim().replace(/^<\?xml[^>]*\?>\s*/, '');
}

/**
 * Every selector of every <style> block prefixed with the drawing's scope class,
 * which goes on the root <svg>. Only plain rule lists are rewritten; a sheet
 * with at-rules or comments is beyond this and the drawing is not inlined.
 */
export function scopeStyles(svg: string, scope: string): string | null {
  let ok = true;
  const scoped = svg.replace(/(<style[^>]*>)([\s\S]*?)(<\/style>)/g, (_m, open: string, sheet: string, close: string) => {
    const css = sheet.replace(/^\s*<!\[CDATA\[|\]\]>\s*$/g, '');
    if (/[@<]|\/\*/.test(css)) {
      ok = false;
      return '';
    }
    const rules = css.split('}').filter((r) => r.trim() !== '');
    const rewritten = rules.map((rule) => {
      const parts = rule.split('{');
      if (parts.length !== 2) ok = false;
      const each = parts[0].split(',').map((s) => `.${scope} ${s.trim()}`);
      return `${each.join(', ')} {${parts[1] ?? ''}}`;
    });
    return `${open}${rewritten.join(' ')}${close}`;
  });
  if (!ok) return null;
  const root = /^<svg\b[^>]*>/.exec(scoped)![0];
  const classed = /\sclass="/.test(root)
    ? root.replace(/\sclass="/, ` class="${scope} `)
    : root.replace(/^<svg\b/, `<svg class="${scope}"`);
  return classed + scoped.slice(root.length);
}
