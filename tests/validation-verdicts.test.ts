import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { rulesData } from './support/fixtures.ts';

// The validation suite's verdicts (design basis, section 10): each documented
// vehicle or situation of the trade gives the verdict its header expects.
//   # expect: pass              no rule fails (warnings and advice may stand)
//   # expect: fail <rule ids>   each rule named fails (others may fail too; the header says why)

const DIR = new URL('../specs/validation/', import.meta.url);
const files = readdirSync(DIR).filter((f) => f.endsWith('.yaml')).sort();

describe('validation verdicts', () => {
  for (const f of files) {
    const text = readFileSync(new URL(f, DIR), 'utf8');
    const expectLine = text.split('\n').find((l) => l.startsWith('# expect:'))!.slice('# expect:'.length).trim();
    it(`${f}: ${expectLine}`, () => {
      const p = prepareSpec(parse(text), rulesData);
      if (!p.ok) throw new Error(p.issues.map((i) => i.message).join('; '));
      const r = runCheck(p.spec, p.entries, rulesData);
      const failed = [...new Set(r.findings.filter((x) => x.severity === 'fail' || x.severity === 'error').map((x) => x.rule))].sort();
      if (expectLine === 'pass') {
        expect(failed).toEqual([]);
      } else {
        expect(r.verdict).toBe('fail');
        for (const id of expectLine.split(' ').slice(1)) expect(failed, id).toContain(id);
      }
      // The ride model ran: no verdict here rests on the data's bounds.
      expect(r.provisional).toEqual([]);
    });
  }
});
