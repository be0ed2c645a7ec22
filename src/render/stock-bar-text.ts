import type { StockPlanGroup } from '../core/cutlist/cutting-result.ts';
import { formatNumber } from '../core/format/number-format.ts';
import { barScale, barSegments } from './stock-bar.ts';

/** Characters the longest stock of a group takes in a text bar. */
const TEXT_BAR_CHARS = 60;
const LETTERS = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';

/**
 * A group's patterns as text bars, one line per pattern: each part a run of its
 * letter after a "|", the offcut as dots; then a legend of the letters.
 */
export function textBars(group: StockPlanGroup, groupNumber: number): string {
  const patterns = group.plan.patterns;
  const labels = [...new Set(patterns.flatMap((p) => p.cuts.map((c) => c.label)))];
  const letter = (label: string) => LETTERS[labels.indexOf(label) % LETTERS.length];
  const scale = barScale(Math.max(1, ...patterns.map((p) => p.stock_length_mm)), TEXT_BAR_CHARS);
  const heads = patterns.map((p, k) => `${groupNumber}.${k + 1}  ${formatNumber(p.stock_length_mm, 'mm')} mm x ${formatNumber(p.count, 'count')}`);
  const width = Math.max(0, ...heads.map((h) => h.length));
  const lines = patterns.map((p, k) => {
    const bar = barSegments(p)
      .map((s) => {
        const n = Math.round(s.length_mm / scale);
        return s.label === null ? '.'.repeat(Math.max(1, n)) : `|${letter(s.label).repeat(Math.max(1, n - 1))}`;
      })
      .join('');
    return `${heads[k].padEnd(width)}  ${bar}|`;
  });
  const legend = labels.map((l) => `${letter(l)} = ${l}`).join('; ');
  return [...lines, '', `One character = ${formatNumber(scale, 'mm')} mm; dots are offcut. ${legend}`].join('\n');
}
