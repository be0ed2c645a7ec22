import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { runCheck } from '../../src/core/pipeline/run-check.ts';
import { RULES } from '../../src/core/rules/index.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { rulesData } from '../support/fixtures.ts';

// What every result must hold, on every specification the project ships: no
// pass above a utilisation of 1, no rule that could not run, every source a
// catalogue entry, every message rendered from its template, and no number
// that is not a number.
const SPECS = new URL('../../specs/', import.meta.url);
const files = readdirSync(SPECS).filter((f) => f.endsWith('.yaml'));

describe.each(files)('the result of %s', (file) => {
  const p = prepareSpec(parse(readFileSync(new URL(file, SPECS), 'utf8')), rulesData);
  if (!p.ok) throw new Error(`${file} does not validate`);
  const result = runCheck(p.spec, p.entries, rulesData);

  it('never passes a finding above a utilisation of 1, and no rule errs', () => {
    expect(result.findings.filter((f) => f.severity === 'pass' && (f.utilisation ?? 0) > 1)).toEqual([]);
    expect(result.findings.filter((f) => f.severity === 'error').map((f) => f.message)).toEqual([]);
    expect(result.findings.every((f) => f.utilisation === null || f.utilisation >= 0)).toBe(true);
  });

  it('cites only sources the catalogue holds, and each finding keeps its message key and params', () => {
    for (const f of result.findings) {
      for (const id of f.sources) expect(rulesData.sources, `${f.rule}: ${id}`).toHaveProperty([id]);
      const rule = RULES.find((r) => r.id === f.rule)!;
      expect(rule.messages[f.message_key]?.code, `${f.rule}.${f.message_key}`).toBe(f.code);
    }
  });

  it('holds no NaN or Infinity among the findings', () => {
    const text = JSON.stringify(result.findings, (_, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? `!${v}` : v));
    expect(text).not.toMatch(/"!(NaN|Infinity|-Infinity)"/);
  });
});

describe('rules', () => {
  it("cite their method in the catalogue", () => {
    for (const r of RULES) {
      expect(r.method.length, r.id).toBeGreaterThan(0);
      for (const id of r.method) expect(rulesData.sources, `${r.id}: ${id}`).toHaveProperty([id]);
    }
  });
});
