// A text input's bytes as UTF-8, the one encoding YAML files and JSON are
// written in here. A file saved as UTF-16 (some editors' "Unicode") or in a
// legacy code page would otherwise be read as replacement characters and
// refused with a parser error that says nothing of the real cause.
import { issue, type InputIssue } from '../spec/input-issue.ts';
import type { Located } from './read-spec-result.ts';

export type Decoded = { ok: true; text: string } | { ok: false; issue: InputIssue & { at?: Located } };

const UTF16_MARKS: readonly (readonly number[])[] = [
  [0xff, 0xfe],
  [0xfe, 0xff],
];

export function decodeUtf8(bytes: Uint8Array, path: string): Decoded {
  if (UTF16_MARKS.some((m) => bytes[0] === m[0] && bytes[1] === m[1])) {
    return { ok: false, issue: issue([], 'fileEncoding', { path, reason: 'it starts with a UTF-16 byte-order mark' }) };
  }
  try {
    return { ok: true, text: new TextDecoder('utf-8', { fatal: true }).decode(bytes) };
  } catch {
    // Decoded leniently, the first bytes that form no character show as U+FFFD.
    const lenient = new TextDecoder('utf-8').decode(bytes);
    const before = lenient.slice(0, Math.max(0, lenient.indexOf('\uFFFD'))).split('\n');
    const at = { line: before.length, column: before[before.length - 1].length + 1 };
    return { ok: false, issue: { ...issue([], 'fileEncoding', { path, reason: 'the bytes here form no UTF-8 character' }), at } };
  }
}
