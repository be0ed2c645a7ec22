import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { RULES } from '../../src/core/rules/index.ts';
import { rulesData } from '../support/fixtures.ts';

// The method the rules cite lives in the project: every design-basis id of the
// source catalogue names a section that docs/design-basis.md has, under the
// number and title the catalogue gives, and every rule's method is catalogued.

const doc = readFileSync(new URL('../../docs/design-basis.md', import.meta.url), 'utf8');
const headings = new Map([...doc.matchAll(/^## (\d+)\. (.+)$/gm)].map((m) => [m[1], m[2]]));
const table = new Map([...doc.matchAll(/^\| `(design-basis-[a-z]+)` \| (\d+)\. /gm)].map((m) => [m[1], m[2]]));

describe('the design basis', () => {
  const ids = Object.keys(rulesData.sources).filter((id) => id.startsWith('design-basis-'));

  it('has a section for every design-basis id of the catalogue, at the number the catalogue gives', () => {
    expect(ids.length).toBeGreaterThanOrEqual(10);
    for (const id of ids) {
      const n = /section (\d+)/.exec(rulesData.sources[id].where ?? '')?.[1];
      expect(n, `${id}: the catalogue names no section`).toBeDefined();
      expect(headings.has(n!), `${id}: no "## ${n}." heading`).toBe(true);
      expect(table.get(id), `${id}: not in the table of ids`).toBe(n);
    }
  });

  it('every method a rule cites is in the catalogue, and every rule cites the design basis', () => {
    for (const rule of RULES) {
      for (const m of rule.method) expect(rulesData.sources[m], `${rule.id}: ${m}`).toBeDefined();
      expect(rule.method.some((m) => m.startsWith('design-basis-')), rule.id).toBe(true);
    }
  });

  it('carries the cautions', () => {
    expect(doc).toMatch(/not a certification/);
    expect(doc).toMatch(/competent person/);
    expect(doc).toMatch(/equine-welfare/);
  });
});
