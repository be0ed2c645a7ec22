// The JSON grammar scan against the runtime's own parser (ECMA-262 JSON.parse,
// which follows RFC 8259): on every text both must agree whether it is JSON.
// Where it is not, the scan must name the place and the usual mistakes.
import { describe, expect, it } from 'vitest';
import { foundAt, jsonSyntaxError } from '../../src/core/input/json-syntax.ts';

const VALID = ['{}', '[]', '0', '-0.5e+3', '"a\\u00e9\\n"', 'true', 'null', ' { "a" : [1, 2, {"b": false}] } ', '[[[[]]]]', '{"": ""}', '"\\/"', '1E5'];
const INVALID = ['', '{', '}', '[1,]', '{"a":1,}', '{a:1}', "{'a':1}", '01', '1.', '.5', '+1', '-', '1e', 'tru', 'nulls', '[1 2]', '{"a" 1}', '"a', '"\\x"', '"a\tb"', 'NaN', '[Infinity]', '-Infinity', '{} {}', '// c\n{}', '{/* c */}', '# c\n{}', '[1]]', '{"a":}', '12abc'];

/** Every text reachable from a seed by dropping or doubling one character: mistakes of the common kind. */
function mutations(seed: string): string[] {
  const out: string[] = [];
  for (let i = 0; i < seed.length; i++) out.push(seed.slice(0, i) + seed.slice(i + 1), seed.slice(0, i) + seed[i] + seed.slice(i));
  return out;
}

const runtimeAccepts = (text: string): boolean => {
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
};

describe('the JSON grammar scan', () => {
  it('agrees with the runtime parser on chosen texts and on every one-character slip of a specification', () => {
    const seed = '{"spec_version": 1, "name": "a \\"b\\"", "crew": [{"role": "driver", "mass_kg": 80.5e0}], "ok": true, "none": null}';
    const texts = [...VALID, ...INVALID, seed, ...mutations(seed)];
    for (const t of texts) expect(jsonSyntaxError(t) === undefined, JSON.stringify(t)).toBe(runtimeAccepts(t));
  });

  it('points at a comment and names it', () => {
    const text = '{\n  "a": 1, // note\n  "b": 2\n}';
    const e = jsonSyntaxError(text)!;
    expect(e.kind).toBe('comment');
    expect(text.slice(e.offset, e.offset + 2)).toBe('//');
    expect(foundAt(text, e.offset)).toBe('"// note"');
  });

  it('names NaN and Infinity at their first letter', () => {
    for (const [text, word] of [['{"a": NaN}', 'NaN'], ['[1, -Infinity]', '-Infinity']]) {
      const e = jsonSyntaxError(text)!;
      expect(e.kind).toBe('notFinite');
      expect(text.slice(e.offset)).toMatch(new RegExp(`^${word}`));
    }
  });

  it('points at the closing bracket after a trailing comma and says so', () => {
    const text = '{"a": [1, 2,]}';
    const e = jsonSyntaxError(text)!;
    expect(e.offset).toBe(text.indexOf(']'));
    expect(e.expected).toContain('no trailing comma');
  });

  it('points at an unknown escape, and at the opening quote of a string that never ends', () => {
    expect(jsonSyntaxError('["ab\\qc"]')!.offset).toBe(4);
    expect(jsonSyntaxError('["abc')!.offset).toBe(1);
  });

  it('says where the text ends early', () => {
    const e = jsonSyntaxError('{"a": [1, 2')!;
    expect(e.offset).toBe(11);
    expect(foundAt('{"a": [1, 2', e.offset)).toBe('the end of the file');
  });

  it('scans a deep nesting without recursion', () => {
    expect(jsonSyntaxError('['.repeat(100_000) + ']'.repeat(100_000))).toBeUndefined();
  });
});
