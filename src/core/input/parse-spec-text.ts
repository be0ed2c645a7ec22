import { LineCounter, parseDocument, isMap, isNode, isScalar, type Document } from 'yaml';
import { echo } from '../diagnostics/echo.ts';
import { issue, type InputIssue } from '../spec/input-issue.ts';
import type { KeyPath } from '../spec/input-issue.ts';
import { foundAt, jsonSyntaxError } from './json-syntax.ts';
import type { Located, ReadSpec } from './read-spec-result.ts';
import { entryLimitIssue } from './text-entries.ts';
import { aliasIssues } from './yaml-aliases.ts';

type LocatedIssue = InputIssue & { at?: Located };

/** The format of a specification by its file name's extension; undefined for one that is not a text spec. */
export function textFormatOf(name: string): 'YAML' | 'JSON' | undefined {
  const ext = /\.[^./\\]*$/.exec(name)?.[0].toLowerCase();
  return ext === '.yaml' || ext === '.yml' ? 'YAML' : ext === '.json' ? 'JSON' : undefined;
}

export function parseSpecText(input: string, format: string, path = 'input'): ReadSpec {
  // A byte-order mark some editors write first is no part of the content.
  const text = input.startsWith('\uFEFF') ? input.slice(1) : input;
  if (text.trim() === '') return { ok: false, issues: [issue([], 'fileEmpty', { path })] };
  const lines = lineTable(text);
  const at = (offset: number): Located => {
    const pos = lines.linePos(offset);
    return { line: pos.line, column: pos.col };
  };
  const tooMany = entryLimitIssue(text);
  if (tooMany) return { ok: false, issues: [{ ...tooMany.issue, at: at(tooMany.offset) }] };
  if (format === 'JSON') {
    // The YAML parser would accept comments and trailing commas; JSON must not.
    const strict = strictJson(text, at);
    if (strict) return { ok: false, issues: [strict] };
  }
  // JSON is read by the YAML parser too: one reader, positions for both.
  const doc = parseDocument(text, { uniqueKeys: true, prettyErrors: false });
  if (doc.errors.length) {
    return {
      ok: false,
      // The first few: a broken file can make an error of every line after the break.
      issues: doc.errors.slice(0, MAX_SYNTAX_ERRORS).map((e) => ({ ...issue([], 'syntax', { format, reason: `${e.message.split('\n')[0]}; found ${echo(foundAt(text, e.pos[0]))}` }), at: at(e.pos[0]) })),
    };
  }
  const aliases = aliasIssues(doc);
  if (aliases.length) return { ok: false, issues: aliases.map((a) => ({ ...a.issue, at: at(a.offset) })) };
  // The aliases are checked above (count, expansion, cycles); the parser's own count would refuse a legitimate file more eagerly.
  const raw: unknown = doc.toJS({ maxAliasCount: -1 });
  if (raw === null || raw === undefined) return { ok: false, issues: [issue([], 'fileEmpty', { path })] };
  return { ok: true, raw, locate: (p, key) => locate(doc, lines, p, key) };
}

const MAX_SYNTAX_ERRORS = 10;

/** Where each line starts, for line and column from an offset. */
function lineTable(text: string): LineCounter {
  const lines = new LineCounter();
  lines.addNewLine(0);
  for (let i = text.indexOf('\n'); i >= 0; i = text.indexOf('\n', i + 1)) lines.addNewLine(i + 1);
  return lines;
}

function strictJson(text: string, at: (offset: number) => Located): LocatedIssue | undefined {
  try {
    JSON.parse(text);
    return undefined;
  } catch {
    const e = jsonSyntaxError(text);
    // The runtime refused what the scan accepts (it never should): its own words, at the start.
    if (!e) return { ...issue([], 'syntax', { format: 'JSON', reason: 'the runtime JSON parser refused it' }), at: at(0) };
    const found = foundAt(text, e.offset);
    const i =
      e.kind === 'comment'
        ? issue([], 'jsonComment', { found })
        : e.kind === 'notFinite'
          ? issue([], 'jsonNotFinite', { found })
          : issue([], 'syntax', { format: 'JSON', reason: `expected ${e.expected}; found ${echo(found)}` });
    return { ...i, at: at(e.offset) };
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
