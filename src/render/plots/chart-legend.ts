import { esc } from '../drawings/svg-sheet.ts';
import { textWidth } from '../drawings/text-box.ts';

// A chart's key: one entry per line or kind of mark, its symbol drawn as the
// chart draws it beside its label, laid out in as many columns as fit the
// width given (at most the number asked), down one column and then the next.

export interface LegendEntry {
  label: string;
  /** The symbol, drawn in a box SYMBOL wide whose middle row is y. */
  symbol(x: number, y: number): string;
}

export interface LegendLayout {
  width: number;
  height: number;
  /** The legend with its top left at (x, y). */
  draw(x: number, y: number): string;
}

export const LEGEND_FONT = 11;
const SYMBOL = 26;
const GAP = 6;
const COLUMN_GAP = 24;
const ROW = 17;

/** Text in the charts' one font; attributes, so no style sheet of a page it sits in can change it. */
export function chartText(x: number, y: number, text: string, size: number, anchor: 'start' | 'middle' | 'end' = 'start', extra = ''): string {
  return `<text x="${n2(x)}" y="${n2(y)}" font-size="${size}px" text-anchor="${anchor}" fill="#000000"${extra}>${esc(text)}</text>`;
}

/** Two decimals are a hundredth of a pixel: enough, and short. */
export const n2 = (v: number) => (Math.round(v * 100) / 100).toString();

export function legendLayout(entries: readonly LegendEntry[], maxWidth: number, maxColumns: number): LegendLayout {
  if (entries.length === 0) return { width: 0, height: 0, draw: () => '' };
  const entryWidth = Math.max(...entries.map((e) => SYMBOL + GAP + textWidth(e.label, { size: LEGEND_FONT })));
  let columns = Math.max(1, Math.min(maxColumns, entries.length));
  while (columns > 1 && columns * entryWidth + (columns - 1) * COLUMN_GAP > maxWidth) columns--;
  const rows = Math.ceil(entries.length / columns);
  return {
    width: columns * entryWidth + (columns - 1) * COLUMN_GAP,
    height: rows * ROW,
    draw: (x, y) => {
      const parts = entries.map((e, i) => {
        // Down the first column, then the next: the key reads in the order of its entries.
        const ex = x + Math.floor(i / rows) * (entryWidth + COLUMN_GAP);
        const mid = y + (i % rows) * ROW + ROW / 2;
        return `${e.symbol(ex, mid)}${chartText(ex + SYMBOL + GAP, mid + 4, e.label, LEGEND_FONT)}`;
      });
      return `<g class="legend">${parts.join('')}</g>`;
    },
  };
}

/** A stretch of line as the symbol of a line or a reference line. */
export function strokeSymbol(colour: string, dash: readonly number[]): LegendEntry['symbol'] {
  return (x, y) => `<line x1="${n2(x + 1)}" y1="${n2(y)}" x2="${n2(x + SYMBOL - 1)}" y2="${n2(y)}" stroke="${colour}" stroke-width="2"${dashAttr(dash)}/>`;
}

export const dashAttr = (dash: readonly number[]) => (dash.length ? ` stroke-dasharray="${dash.join(',')}"` : '');

/** The middle of a symbol's box, for marks drawn there. */
export const symbolCentre = (x: number) => x + SYMBOL / 2;
