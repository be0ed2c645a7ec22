import type { CutAllowance, CutListItem } from '../../core/cutlist/cutting-result.ts';
import { formatPercent, formatQuantity } from '../../core/format/number-format.ts';
import type { CheckResult } from '../../core/result/check-result.ts';
import type { TableBlock } from './document.ts';
import { left, row, runsCell, sourcesCell, textCell } from './cells.ts';
import { plain } from './runs.ts';

// The allowances of the cut list, each written once under a letter that the
// dense cut list's rows name: most parts share the same few, so a row says
// "a, b" and the key says what each is and what its value rests on.

const sameAllowance = (x: CutAllowance, y: CutAllowance) => x.what === y.what && x.from === y.from && x.value === y.value;

/** The distinct allowances, in the order the cut list first takes them. */
export function distinctAllowances(items: readonly CutListItem[]): CutAllowance[] {
  const all = items.flatMap((c) => c.allowances);
  return all.filter((a, i) => all.findIndex((b) => sameAllowance(a, b)) === i);
}

/** "a" to "z", then "aa", "ab", ...: the key of the allowance at this index. */
export function allowanceKey(i: number): string {
  const letter = (k: number) => String.fromCharCode(97 + k);
  return i < 26 ? letter(i) : `${letter(Math.floor(i / 26) - 1)}${letter(i % 26)}`;
}

/** The keys of an item's allowances, in the key table's order. */
export function itemKeys(item: CutListItem, distinct: readonly CutAllowance[]): string {
  return distinct.flatMap((d, i) => (item.allowances.some((a) => sameAllowance(a, d)) ? [allowanceKey(i)] : [])).join(', ');
}

function amountText(a: CutAllowance): string {
  if (a.what === 'spares') return `bends that succeed: ${formatPercent(a.value)}`;
  return a.unit === 'mm' ? `${formatQuantity(a.value, a.unit)} each` : formatQuantity(a.value, a.unit);
}

/** Where the specification gave a value, or took it by default. */
function specOrigin(result: CheckResult, path: string): string {
  const entry = result.spec_as_checked.find((e) => e.path === path);
  return entry?.defaulted ? 'specification, by default' : 'specification';
}

/** The key: each allowance with its letter, what it is, its value, where it is read, and its sources by number. */
export function allowancesTable(result: CheckResult, distinct: readonly CutAllowance[], numbers: ReadonlyMap<string, number>): TableBlock {
  const rows = distinct.map((a, i) =>
    row([
      textCell(allowanceKey(i)), textCell(a.what), textCell(amountText(a)), textCell(a.from),
      a.sources.length ? sourcesCell(a.sources, numbers) : runsCell([plain(specOrigin(result, a.from))]),
    ]),
  );
  const columns = [left('Key'), left('Allowance'), left('Amount'), left('Read from'), left('Sources')];
  return { kind: 'table', id: 'cut-allowances', columns, rows, empty: 'No allowances.' };
}
