// How messages show input text: escaped and cut. The escapes are those of a
// JSON string (RFC 8259, section 7), so a reader can paste them back.
import { describe, expect, it } from 'vitest';
import { echo, ECHO_MAX, escapeControls } from '../../src/core/diagnostics/echo.ts';
import { say } from '../../src/core/diagnostics/messages.ts';

describe('echoed input text', () => {
  it('escapes line breaks, tabs, terminal escapes and direction overrides', () => {
    expect(escapeControls('a\nb\tc\rd')).toBe('a\\nb\\tc\\rd');
    expect(escapeControls('\u001b[31mred')).toBe('\\u001b[31mred');
    // A right-to-left override (U+202E) would make the rest of the line read backwards.
    expect(escapeControls('abc\u202Edef')).toBe('abc\\u202edef');
    expect(escapeControls('plain text, ünïcode, 中文')).toBe('plain text, ünïcode, 中文');
  });

  it('keeps text up to the limit whole and cuts one character past it', () => {
    const atLimit = 'x'.repeat(ECHO_MAX);
    expect(echo(atLimit)).toBe(atLimit);
    expect(echo(`${atLimit}y`)).toBe(`${atLimit}… (${ECHO_MAX + 1} characters)`);
  });

  it('keeps the closing quote of a quoted value it cuts', () => {
    expect(echo(`"${'x'.repeat(100)}"`)).toBe(`"${'x'.repeat(ECHO_MAX)}…" (100 characters)`);
  });

  it('never cuts inside an escape or a character outside the basic plane', () => {
    // 59 letters then a newline: the escape would straddle the cut, so it goes whole.
    expect(echo(`${'x'.repeat(ECHO_MAX - 1)}\nmore`)).toBe(`${'x'.repeat(ECHO_MAX - 1)}… (${ECHO_MAX + 4} characters)`);
    const emoji = '🐴'.repeat(ECHO_MAX + 1);
    expect(echo(emoji).startsWith('🐴'.repeat(ECHO_MAX) + '…')).toBe(true);
  });

  it('is used by every message for the params that carry input text, and only escapes the rest', () => {
    const long = 'k'.repeat(500);
    const m = say('unknownKey', { key: long, allowed: 'a, b' });
    expect(m.text).toContain(`${'k'.repeat(ECHO_MAX)}… (500 characters)`);
    const listed = Array.from({ length: 30 }, (_, i) => `key_${i}`).join(', ');
    expect(say('unknownKey', { key: 'x', allowed: listed }).text).toContain(listed);
    expect(say('fileUnreadable', { path: 'a\nb', reason: 'r' }).text).toBe('Cannot read a\\nb: r.');
  });
});
