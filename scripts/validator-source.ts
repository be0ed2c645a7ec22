// Builds the validator modules under src/core/**/generated/ from the JSON
// Schemas with ajv's standalone code, so that at run time no schema is
// compiled and no code is made from strings. Shared by `npm run gen` and the
// test that fails when a committed validator is stale.
import { readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Ajv2020, type Options } from 'ajv/dist/2020.js';
import standaloneCode from 'ajv/dist/standalone/index.js';

interface Validator {
  /** The schema, from the repository root. */
  schema: string;
  /** The generated module (JavaScript: type-checking ajv's output gains nothing and costs seconds), from the repository root. */
  out: string;
  /** Ajv's options; they decide the errors the validator gives (verbose: each error carries its schema). */
  options: Options;
  /** Annotation keywords of our own that the schema may hold. */
  keywords?: string[];
}

export const VALIDATORS: readonly Validator[] = [
  {
    schema: 'src/core/spec/spec.schema.json',
    out: 'src/core/spec/generated/spec-validator.js',
    options: { allErrors: true, useDefaults: true, allowUnionTypes: true, strict: true, strictTypes: false, verbose: true },
    keywords: ['x-default'],
  },
  { schema: 'src/core/data/rules-data.schema.json', out: 'src/core/data/generated/rules-data-validator.js', options: { allErrors: true, verbose: true, strict: true } },
  { schema: 'src/core/stock/instance.schema.json', out: 'src/core/stock/generated/instance-validator.js', options: { allErrors: true, strict: true, verbose: true } },
];

const ROOT = new URL('../', import.meta.url);
// Ajv's standalone code requires a few small runtime helpers even as ESM; the
// pure ones are copied in, so the generated module imports nothing.
const PURE_HELPERS = new Set(['ucs2length', 'equal']);
const HELPER = /require\("ajv\/dist\/runtime\/(\w+)"\)\.default/g;

export function validatorSource(v: Validator): string {
  const ajv = new Ajv2020({ ...v.options, code: { source: true, esm: true } });
  for (const keyword of v.keywords ?? []) ajv.addKeyword({ keyword, schemaType: 'string' });
  const schema = JSON.parse(readFileSync(new URL(v.schema, ROOT), 'utf8')) as object;
  const code = standaloneCode(ajv, ajv.compile(schema)).replace(HELPER, (_all, name: string) => {
    if (!PURE_HELPERS.has(name)) throw new Error(`${v.schema}: the validator needs ajv's runtime helper ${name}, which is not known to be self-contained`);
    return `(${String(createRequire(import.meta.url)(`ajv/dist/runtime/${name}`).default)})`;
  });
  return `${banner(v)}\n${code}\n`;
}

/** The declarations beside a validator module. */
export function validatorTypes(v: Validator): string {
  return `${banner(v)}\nimport type { ValidateFunction } from 'ajv/dist/2020.js';\n\nexport declare const validate: ValidateFunction;\nexport default validate;\n`;
}

const banner = (v: Validator) => `/* Generated from ${v.schema} by \`npm run gen\` (scripts/validator-source.ts). Do not edit. */`;

/** Where the declarations of a validator module live. */
export const typesPath = (v: Validator) => v.out.replace(/\.js$/, '.d.ts');

/** Write every validator module; returns the paths written. */
export function writeValidators(): string[] {
  return VALIDATORS.flatMap((v) => {
    const out = new URL(v.out, ROOT);
    const types = new URL(typesPath(v), ROOT);
    writeFileSync(out, validatorSource(v));
    writeFileSync(types, validatorTypes(v));
    return [out.pathname, types.pathname];
  });
}
