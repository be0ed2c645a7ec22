import type { CuttingPattern } from '../core/stock/cutting-types.ts';
import { formatNumber } from '../core/format/number-format.ts';
import { barSegments } from './stock-bar.ts';
import { OFFCUT_FILL, partFill } from './stock-palette.ts';
import { textWidth } from './drawings/text-box.ts';

// One stock piece as a small SVG bar for the HTML report. Every text placed in
// the SVG is escaped; part labels come from the specification. Paint goes in
// style attributes, which outweigh any style sheet elsewhere in the page.

/** Width in px of the group's longest stock; shorter stock draws shorter. */
const FULL_WIDTH = 640;
const HEIGHT = 22;
const FONT_PX = 11;
const TEXT_STYLE = `font-family:sans-serif;font-size:${FONT_PX}px;font-weight:normal;fill:#000;stroke:none`;

export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/**
 * The first of the texts that fits the width, else the first cut short with an
 * ellipsis, or '' where not even two letters fit; the full text is in the title.
 */
export function fitText(texts: readonly string[], width_px: number): string {
  // Widths estimated as the drawings' labels are (text-box.ts), erring wide, so a label never runs into the next part.
  const fits = (t: string) => textWidth(t, { size: FONT_PX }) <= width_px - 6;
  const whole = texts.find(fits);
  if (whole !== undefined) return whole;
  for (let n = texts[0].length - 1; n >= 2; n--) {
    const cut = `${texts[0].slice(0, n).trimEnd()}…`;
    if (fits(cut)) return cut;
  }
  return '';
}

export function stockBarSvg(p: CuttingPattern, longest_mm: number, labels: readonly string[], caption: string): string {
  const k = FULL_WIDTH / longest_mm;
  const width = Math.max(1, p.stock_length_mm * k);
  const parts = barSegments(p).map((s) => {
    const x = s.from_mm * k;
    const w = s.length_mm * k;
    // An offcut too short for its words still shows its length.
    const texts = s.label === null ? [`offcut ${formatNumber(s.length_mm, 'mm')} mm`, `${formatNumber(s.length_mm, 'mm')} mm`, formatNumber(s.length_mm, 'mm')] : [s.label];
    const fill = s.label === null ? OFFCUT_FILL : partFill(labels, s.label);
    const shown = fitText(texts, w);
    return [
      `<rect x="${x.toFixed(2)}" y="0.5" width="${w.toFixed(2)}" height="${HEIGHT - 1}" style="fill:${fill};stroke:#333;stroke-width:0.5">`,
      `<title>${escapeXml(`${s.label ?? 'offcut'}: ${formatNumber(s.length_mm, 'mm')} mm`)}</title></rect>`,
      shown ? `<text x="${(x + 3).toFixed(2)}" y="${HEIGHT / 2 + FONT_PX / 2 - 1}" style="${TEXT_STYLE}">${escapeXml(shown)}</text>` : '',
    ].join('');
  });
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" class="stock-bar" width="${width.toFixed(0)}" height="${HEIGHT}" viewBox="0 0 ${width.toFixed(2)} ${HEIGHT}" role="img" aria-label="${escapeXml(caption)}">`,
    ...parts,
    '</svg>',
  ].join('');
}
