// Builds the text of src/core/spec/spec.types.ts from the schema; shared by the
// generator script and the staleness test so both use the same options.
import { compile } from 'json-schema-to-typescript';
import schema from '../src/core/spec/spec.schema.json' with { type: 'json' };
import { checkedSchema } from '../src/core/spec/checked-schema.ts';

const banner = '/* Generated from src/core/spec/spec.schema.json by `npm run gen`. Do not edit. */';

export async function specTypesSource(): Promise<string> {
  const options = { bannerComment: '', additionalProperties: false, style: { singleQuote: true }, ignoreMinAndMaxItems: true } as const;
  const input = await compile(structuredClone(schema) as never, 'BuildSpecification', options);
  const checked = await compile(checkedSchema(structuredClone(schema)) as never, 'CheckedSpecification', options);
  return `${banner}\n\n// As written by the user (numbers or unit strings; optional keys may be absent).\n${input}\n// After unit conversion and defaults: what the computation core receives.\n${checked}`;
}
