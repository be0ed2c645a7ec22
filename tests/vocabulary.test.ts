import { existsSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { rulesData } from './support/fixtures.ts';

// The agreed vocabulary (../shared/design/spec-vocabulary.md) must be accepted unchanged.
const doc = new URL('../../shared/design/spec-vocabulary.md', import.meta.url);

describe.skipIf(!existsSync(doc))('the shared vocabulary example', () => {
  it('validates unchanged', () => {
    const text = readFileSync(doc, 'utf8');
    const block = /```yaml\n([\s\S]*?)```/.exec(text)?.[1];
    expect(block).toBeTruthy();
    const p = prepareSpec(parse(block!), rulesData);
    expect(p.ok ? [] : p.issues).toEqual([]);
  });
});
