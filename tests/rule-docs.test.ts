import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { RULES } from '../src/core/rules/index.ts';
import { deepMerge, findingsOf, readDemo } from './support/fixtures.ts';

// Each rule has a page in docs/rules/<id>.md and a test in tests/rules/<id>.test.ts;
// the pages' examples are run.
const docs = new URL('../docs/rules/', import.meta.url);
const tests = new URL('./rules/', import.meta.url);

interface Example {
  kind: 'pass-example' | 'fail-example' | 'note-example';
  base: string;
  patch: unknown;
}

function examples(page: string): Example[] {
  const out: Example[] = [];
  for (const m of page.matchAll(/```yaml (pass-example|fail-example|note-example) base=([\w-]+)\n([\s\S]*?)```/g)) {
    out.push({ kind: m[1] as Example['kind'], base: m[2], patch: parse(m[3]) });
  }
  return out;
}

describe('rule pages and tests', () => {
  it('every rule has a page and a test file of the same name', () => {
    for (const r of RULES) {
      expect(existsSync(new URL(`${r.id}.md`, docs)), `docs/rules/${r.id}.md`).toBe(true);
      expect(existsSync(new URL(`${r.id}.test.ts`, tests)), `tests/rules/${r.id}.test.ts`).toBe(true);
    }
  });

  it('every page and rule test names a rule that exists', () => {
    const ids = new Set(RULES.map((r) => r.id));
    for (const f of readdirSync(docs)) expect(ids.has(f.replace(/\.md$/, '')), `docs/rules/${f}`).toBe(true);
    for (const f of readdirSync(tests)) expect(ids.has(f.replace(/\.test\.ts$/, '')), `tests/rules/${f}`).toBe(true);
  });

  it('every limit a rule reads is named on its page', () => {
    for (const r of RULES) {
      const page = readFileSync(new URL(`${r.id}.md`, docs), 'utf8');
      for (const l of [...Object.keys(r.limits), ...r.params]) expect(page, `${r.id} page names ${l}`).toContain(`\`${l}\``);
    }
  });

  for (const rule of RULES) {
    const page = readFileSync(new URL(`${rule.id}.md`, docs), 'utf8');
    const found = examples(page);
    it(`${rule.id}: the page has the examples its kind needs`, () => {
      const kinds = found.map((e) => e.kind);
      if (rule.kind === 'check') expect(kinds).toEqual(expect.arrayContaining(['pass-example', 'fail-example']));
      else expect(kinds).toContain('note-example');
    });
    for (const ex of found) {
      it(`${rule.id}: the page's ${ex.kind} gives what it says`, async () => {
        const f = await findingsOf(rule.id, deepMerge(readDemo(ex.base), ex.patch));
        const worst = f.map((x) => x.severity);
        if (ex.kind === 'fail-example') expect(worst).toContain(rule.worst ?? 'fail');
        if (ex.kind === 'pass-example') expect(worst.every((s) => s === 'pass')).toBe(true);
        if (ex.kind === 'note-example') expect(worst.length > 0 && worst.every((s) => s === 'info')).toBe(true);
      });
    }
  }
});
