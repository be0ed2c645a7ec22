import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { RULES } from '../src/core/rules/index.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { rulesData } from './support/fixtures.ts';

// The validation suite (specs/validation): documented vehicles and situations
// of the trade, each with the verdict its record implies (asserted in
// validation-verdicts.test.ts). Here: every spec is a valid specification and
// says, in machine-readable header lines, what it expects and where it comes
// from:
//   # expect: pass            or   # expect: fail <rule id> [<rule id> ...]
//   # record: record-<name>   or   # source: situation of the trade

const DIR = new URL('../specs/validation/', import.meta.url);
const files = readdirSync(DIR).filter((f) => f.endsWith('.yaml')).sort();
const text = (f: string) => readFileSync(new URL(f, DIR), 'utf8');
const headerLine = (t: string, key: string) => t.split('\n').find((l) => l.startsWith(`# ${key}:`))?.slice(key.length + 3).trim();

describe('validation suite', () => {
  it('holds at least six specifications, at least three of them documented vehicles', () => {
    expect(files.length).toBeGreaterThanOrEqual(6);
    expect(files.filter((f) => headerLine(text(f), 'record') !== undefined).length).toBeGreaterThanOrEqual(3);
  });

  for (const f of files) {
    describe(f, () => {
      const t = text(f);

      it('is a valid specification: the schema and the cross-field checks pass it', () => {
        const p = prepareSpec(parse(t), rulesData);
        expect(p.ok ? [] : p.issues.map((i) => `${i.path.join('.')}: ${i.message}`)).toEqual([]);
      });

      it('says what verdict its record implies, naming known rules where it expects a failure', () => {
        const expectLine = headerLine(t, 'expect');
        expect(expectLine, 'a "# expect:" line').toMatch(/^(pass|fail( [a-z]+\.[a-z-]+)+)$/);
        const ids = new Set(RULES.map((r) => r.id));
        for (const id of expectLine!.split(' ').slice(1)) expect(ids.has(id), id).toBe(true);
      });

      it('names its source: a record of the catalogue, or a situation of the trade', () => {
        const record = headerLine(t, 'record');
        const source = headerLine(t, 'source');
        expect(record !== undefined || source === 'situation of the trade', 'a "# record:" or "# source: situation of the trade" line').toBe(true);
        if (record !== undefined) {
          expect(record).toMatch(/^record-[a-z0-9-]+$/);
          expect(rulesData.sources[record]?.kind, record).toBe('record');
        }
      });

      it('gives in its header what was measured, estimated and assumed, and marks assumed values', () => {
        for (const heading of ['Measured', 'Estimated', 'Assumed', 'Verdict']) expect(t, heading).toMatch(new RegExp(`^# ${heading}`, 'm'));
        expect(t).toMatch(/# assumed/);
      });
    });
  }
});
