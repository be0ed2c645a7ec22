import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { ruleFiles, ruleIndexSource, RULES_DIR } from '../../scripts/rule-index-source.ts';
import { RULES } from '../../src/core/rules/index.ts';

// Rules register themselves by living in src/core/rules/<family>/: the index
// is generated from the files, so a rule file that is not registered is a
// stale index, and this fails.
describe('rule registry', () => {
  it('src/core/rules/index.ts is what `npm run gen` makes from the rule files', () => {
    expect(readFileSync(new URL('index.ts', RULES_DIR), 'utf8'), 'the rule index is stale: run `npm run gen`').toBe(ruleIndexSource());
  });

  it('holds every rule file, and every rule id once, named after its family and file', () => {
    const files = ruleFiles();
    expect(RULES).toHaveLength(files.length);
    const ids = RULES.map((r) => r.id);
    expect(new Set(ids).size).toBe(ids.length);
    RULES.forEach((r, i) => expect(r.id).toBe(`${files[i].family}.${files[i].file.replace(/\.ts$/, '')}`));
  });
});
