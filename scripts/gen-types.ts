import { writeFileSync } from 'node:fs';
import { specTypesSource } from './spec-types-source.ts';

const target = new URL('../src/core/spec/spec.types.ts', import.meta.url);
writeFileSync(target, await specTypesSource());
console.log(`wrote ${target.pathname}`);
