import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { typesPath, VALIDATORS, validatorSource, validatorTypes } from '../scripts/validator-source.ts';

const read = (path: string) => readFileSync(new URL(`../${path}`, import.meta.url), 'utf8');

describe('generated schema validators', () => {
  it.each(VALIDATORS.map((v) => [v.out, v] as const))('%s is what `npm run gen` makes from its schema', (_out, v) => {
    expect(read(v.out), 'the validator is stale: run `npm run gen`').toBe(validatorSource(v));
    expect(read(typesPath(v)), 'the declarations are stale: run `npm run gen`').toBe(validatorTypes(v));
  });

  it('no schema is compiled at run time and no code is made from strings', () => {
    for (const v of VALIDATORS) expect(read(v.out)).not.toMatch(/\bnew Function\b|\beval\(|\brequire\(|^import /m);
    // The modules that validate import ajv for its types only.
    for (const file of ['src/core/spec/validate-schema.ts', 'src/core/data/validate-rules-data.ts', 'src/core/stock/check-instance.ts']) {
      expect(read(file)).not.toMatch(/^import (?!type )[^;]*from 'ajv/m);
    }
  });
});
