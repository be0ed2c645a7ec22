// Text that comes from the user or the core is placed into Markdown literally:
// it must not open links, images, raw HTML, emphasis or table cells, so that
// rendering it (here or in any other viewer) shows exactly the text given.

/** Characters that can start inline syntax anywhere in a line. */
const INLINE_SPECIAL = /[\\`*_[\]<>|!~&#]/g;

/** Markers that start a block (heading, list, quote) at the start of a line. */
const BLOCK_START = /^([+=-]|\d+[.)])/;

/** One line of inline text, safe in a heading after its marks or in a table cell. */
export function escapeInline(text: string): string {
  // Line breaks would end the cell or start a new block.
  return text.replace(/\s*[\r\n]+\s*/g, ' ').trim().replace(INLINE_SPECIAL, (c) => `\\${c}`);
}

/**
 * Inline text that begins a block (a paragraph or a list item's text), where
 * a leading "-", "+", "=" or "12." would start a list or an underline.
 */
export function escapeBlock(text: string): string {
  // Escape the marker's last character: "-" becomes "\-", "12." becomes "12\.".
  return escapeInline(text).replace(BLOCK_START, (marker) => `${marker.slice(0, -1)}\\${marker.slice(-1)}`);
}

/** One table row from cells already escaped or built by us. */
export function tableRow(cells: readonly string[]): string {
  return `| ${cells.map((c) => (c === '' ? ' ' : c)).join(' | ')} |`;
}

/** A table: header, alignment row and body; align 'r' right-aligns a column. */
export function table(header: readonly string[], rows: readonly string[][], align: readonly ('l' | 'r')[] = []): string {
  const rule = header.map((_h, i) => (align[i] === 'r' ? '---:' : '---'));
  return [tableRow(header), tableRow(rule), ...rows.map(tableRow)].join('\n');
}

/** A fenced block that holds the text verbatim, whatever backticks it contains. */
export function fencedBlock(text: string, info = 'text'): string {
  const longestRun = Math.max(0, ...(text.match(/`+/g) ?? []).map((run) => run.length));
  const fence = '`'.repeat(Math.max(3, longestRun + 1));
  return `${fence}${info}\n${text.replace(/\s+$/, '')}\n${fence}`;
}

/** Inline code that holds the text verbatim, whatever backticks it contains. */
export function inlineCode(text: string): string {
  const flat = text.replace(/\s*[\r\n]+\s*/g, ' ');
  const longestRun = Math.max(0, ...(flat.match(/`+/g) ?? []).map((run) => run.length));
  const fence = '`'.repeat(longestRun + 1);
  // A space inside the fence keeps a leading or trailing backtick apart from it.
  const pad = /^`|`$/.test(flat) ? ' ' : '';
  return `${fence}${pad}${flat}${pad}${fence}`;
}
