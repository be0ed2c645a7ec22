import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { specTypesSource } from '../scripts/spec-types-source.ts';

describe('generated specification types', () => {
  it('src/core/spec/spec.types.ts is what `npm run gen` makes from the schema', async () => {
    const committed = readFileSync(new URL('../src/core/spec/spec.types.ts', import.meta.url), 'utf8');
    expect(committed, 'the types are stale: run `npm run gen`').toBe(await specTypesSource());
  });
});
