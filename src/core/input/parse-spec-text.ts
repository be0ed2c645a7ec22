import { LineCounter, parseDocument, isMap, isNode, isScalar, type Document } from 'yaml';
import { issue, type InputIssue } from '../spec/input-issue.ts';
import type { KeyPath } from '../spec/input-issue.ts';
import type { Located, ReadSpec } from './read-spec-result.ts';

/** The format of a specification by its file name's extension; undefined for one that is not a text spec. */
export function textFormatOf(name: string): 'YAML' | 'JSON' | undefined {
  const ext = /\.[^./\\]*$/.exec(name)?.[0].toLowerCase();
  return ext === '.yaml' || ext === '.yml' ? 'YAML' : ext === '.json' ? 'JSON' : undefined;
}

export function parseSpecText(text: string, format: string, path = 'input'): ReadSpec {
  if (text.trim() === '') return { ok: false, issues: [issue([], 'fileEmpty', { path })] };
  const lines = new LineCounter();
  if (format === 'JSON') {
    // The YAML parser would accept comments and trailing commas; JSON must not.
    const strict = strictJson(text, lines);
    if (strict) return { ok: false, issues: [strict] };
  }
  // JSON is read by the YAML parser too: one reader, positions for both.
  const doc = parseDocument(text, { lineCounter: lines, uniqueKeys: true, prettyErrors: false });
  if (doc.errors.length) {
    return {
      ok: false,
      issues: doc.errors.map((e) => {
        // linePos is only filled when prettyErrors is on; the offset always is.
        const pos = e.linePos?.[0] ?? lines.linePos(e.pos[0]);
        return { ...issue([], 'syntax', { format, reason: e.message.split('\n')[0] }), at: pos ? { line: pos.line, column: pos.col } : undefined };
      }),
    };
  }
  const raw: unknown = doc.toJS({ maxAliasCount: 100 });
  if (raw === null || raw === undefined) return { ok: false, issues: [issue([], 'fileEmpty', { path })] };
  return { ok: true, raw, locate: (p, key) => locate(doc, lines, p, key) };
}

function strictJson(text: string, lines: LineCounter): (InputIssue & { at?: Located }) | undefined {
  try {
    JSON.parse(text);
    return undefined;
  } catch (e) {
    const message = (e as Error).message;
    const offset = /position (\d+)/.exec(message)?.[1];
    parseDocument(text, { lineCounter: lines }); // fills the line table
    const pos = offset !== undefined ? lines.linePos(Number(offset)) : undefined;
    return { ...issue([], 'syntax', { format: 'JSON', reason: message.replace(/ in JSON at position \d+.*$/, '') }), at: pos ? { line: pos.line, column: pos.col } : undefined };
  }
}

// The node at the path, or the nearest enclosing one that exists. With
// `key`, the key of the last step (an unknown key), or for a key that is not
// there, the key of the mapping that lacks it.
function locate(doc: Document, lines: LineCounter, path: KeyPath, key = false): Located | undefined {
  if (key) {
    for (let n = path.length; n > 0; n--) {
      const parent = n === 1 ? doc.contents : doc.getIn(path.slice(0, n - 1), true);
      if (!isMap(parent)) continue;
      const pair = parent.items.find((it) => isScalar(it.key) && it.key.value === path[n - 1]);
      if (pair && isNode(pair.key) && pair.key.range) {
        const pos = lines.linePos(pair.key.range[0]);
        return { line: pos.line, column: pos.col };
      }
    }
  }
  for (let n = path.length; n >= 0; n--) {
    const node = doc.getIn(path.slice(0, n), true);
    if (isNode(node) && node.range) {
      const pos = lines.linePos(node.range[0]);
      return { line: pos.line, column: pos.col };
    }
  }
  return undefined;
}
