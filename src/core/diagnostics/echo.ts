// How a message shows text it took from the input: escaped, so that a
// newline, a terminal control sequence or a direction override in a value
// cannot rewrite the message around it, and cut short, so that a megabyte
// value does not become a megabyte message.

/** Characters of an echoed value shown before it is cut. */
export const ECHO_MAX = 60;

// C0 and C1 controls, DEL, the line and paragraph separators, and the
// bidirectional embeddings, overrides and isolates.
const UNSAFE = /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;
const NAMED: Readonly<Record<string, string>> = { '\n': '\\n', '\r': '\\r', '\t': '\\t' };

/** The text with every control or direction character written as an escape (\n, \t, \u001b). */
export function escapeControls(text: string): string {
  return text.replace(UNSAFE, (c) => (Object.hasOwn(NAMED, c) ? NAMED[c] : `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`));
}

/**
 * Input text as a message shows it: escaped, and past `max` characters cut
 * with an ellipsis and the full length. A value in double quotes keeps its
 * closing quote when cut.
 */
export function echo(text: string, max = ECHO_MAX): string {
  const quoted = text.length >= 2 && text.startsWith('"') && text.endsWith('"');
  const inner = quoted ? text.slice(1, -1) : text;
  const escaped = escapeControls(inner);
  const chars = [...escaped];
  if (chars.length <= max) return quoted ? `"${escaped}"` : escaped;
  // Cut on a whole code point, never inside an escape just made.
  let kept = chars.slice(0, max).join('');
  const brokenEscape = /\\(u[0-9a-f]{0,3}|)$/.exec(kept);
  if (brokenEscape && isCutEscape(escaped, kept.length - brokenEscape[0].length)) kept = kept.slice(0, -brokenEscape[0].length);
  const cut = `${kept}… (${inner.length} characters)`;
  return quoted ? `"${kept}…" (${inner.length} characters)` : cut;
}

// True when an escape (\n, \uXXXX) starts at index `at` of the escaped text.
function isCutEscape(escaped: string, at: number): boolean {
  return /^\\(u[0-9a-f]{4}|[nrt])/.test(escaped.slice(at, at + 6));
}
