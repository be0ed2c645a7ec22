// `npm run gen`: the generated sources, from the schema and the rule files.
import { writeFileSync } from 'node:fs';
import { specTypesSource } from './spec-types-source.ts';
import { ruleIndexSource, RULES_DIR } from './rule-index-source.ts';
import { writeValidators } from './validator-source.ts';

const types = new URL('../src/core/spec/spec.types.ts', import.meta.url);
writeFileSync(types, await specTypesSource());
console.log(`wrote ${types.pathname}`);
const index = new URL('index.ts', RULES_DIR);
writeFileSync(index, ruleIndexSource());
console.log(`wrote ${index.pathname}`);
for (const path of writeValidators()) console.log(`wrote ${path}`);
