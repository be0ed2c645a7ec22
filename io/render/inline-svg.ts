/**
 * The setting-out drawing comes from the core as SVG text and goes inline into
 * the HTML report. The report forbids scripts and outside resources, so a
 * drawing that holds anything active or external is not inlined; null says so.
 * A style sheet inside an inline SVG applies to the whole page, so its rules
 * are scoped to the drawing's own root.
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

/** Class put on the inlined drawing's root; its style rules apply only below it. */
export const DRAWING_SCOPE = 'axletree-drawing';

export function inlineSvg(svg: string): string | null {
  // An XML prolog is legal in a file but not inside HTML.
  const body = svg.trim().replace(/^<\?xml[^>]*\?>\s*/, '');
  if (!/^<svg[\s>]/.test(body) || !body.endsWith('</svg>')) return null;
  if (FORBIDDEN.some((re) => re.test(body))) return null;
  return scopeStyles(body);
}

/**
 * Every selector of every <style> block prefixed with the drawing's scope class,
 * which goes on the root <svg>. Only plain rule lists are rewritten; a sheet
 * with at-rules or comments is beyond this and the drawing is not inlined.
 */
export function scopeStyles(svg: string): string | null {
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
      const each = parts[0].split(',').map((s) => `.${DRAWING_SCOPE} ${s.trim()}`);
      return `${each.join(', ')} {${parts[1] ?? ''}}`;
    });
    return `${open}${rewritten.join(' ')}${close}`;
  });
  if (!ok) return null;
  const root = /^<svg\b[^>]*>/.exec(scoped)![0];
  const classed = /\sclass="/.test(root)
    ? root.replace(/\sclass="/, ` class="${DRAWING_SCOPE} `)
    : root.replace(/^<svg\b/, `<svg class="${DRAWING_SCOPE}"`);
  return classed + scoped.slice(root.length);
}
