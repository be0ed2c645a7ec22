// A YAML or JSON text's entries counted from its tokens before the parser
// builds a document: the parser spends about a kilobyte and a few
// microseconds per node, so a megabyte of `{},` would cost half a gigabyte
// and seconds before any limit on a list could speak. Flow nesting is
// bounded as well: the parser recurses into every `[` and `{`.
import { CST, Lexer } from 'yaml';
import { issue, type InputIssue } from '../spec/input-issue.ts';
import { INPUT_LIMITS } from './input-limits.ts';

// Tokens that start a node or an item: a scalar (plain, quoted or block), an alias, a flow collection, a list item, an explicit key, a comma between flow items.
const ENTRY = new Set(['scalar', 'single-quoted-scalar', 'double-quoted-scalar', 'alias', 'flow-map-start', 'flow-seq-start', 'seq-item-ind', 'explicit-key-ind', 'comma']);
// Markers the lexer adds that take no room in the text.
const MARKERS = new Set([CST.DOCUMENT, CST.FLOW_END, CST.SCALAR]);

interface EntryLimits {
  textEntries: number;
  textDepth: number;
}

/** The first limit the text passes (entries or nesting), with the offset where it does; undefined within both. */
export function entryLimitIssue(text: string, limits: EntryLimits = INPUT_LIMITS): { issue: InputIssue; offset: number } | undefined {
  let entries = 0;
  let depth = 0;
  let offset = 0;
  for (const token of new Lexer().lex(text)) {
    const type = CST.tokenType(token);
    if (type && ENTRY.has(type) && ++entries > limits.textEntries) {
      return { issue: issue([], 'tooManyEntries', { max: limits.textEntries }), offset: Math.min(offset, text.length) };
    }
    if (type === 'flow-map-start' || type === 'flow-seq-start') {
      if (++depth > limits.textDepth) return { issue: issue([], 'tooDeep', { max: limits.textDepth }), offset };
    } else if (type === 'flow-map-end' || type === 'flow-seq-end') depth = Math.max(0, depth - 1);
    if (!MARKERS.has(token)) offset += token.length;
  }
  return undefined;
}
