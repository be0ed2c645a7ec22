// The schema of a specification after unit strings are converted and defaults
// applied: derived from the one source schema, never written by hand.

type Json = unknown;

function isObject(v: Json): v is Record<string, Json> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** number-or-unit-string becomes number; keys with a default become required. */
export function checkedSchema(schema: Json): Json {
  if (Array.isArray(schema)) return schema.map(checkedSchema);
  if (!isObject(schema)) return schema;
  const out: Record<string, Json> = {};
  for (const [k, v] of Object.entries(schema)) out[k] = checkedSchema(v);
  // Shared definitions get their own names so both type sets can live in one file.
  if (typeof out.$ref === 'string') out.$ref = out.$ref.replace('#/$defs/', '#/$defs/checked_');
  if (isObject(out.$defs)) {
    out.$defs = Object.fromEntries(Object.entries(out.$defs).map(([k, v]) => [`checked_${k}`, v]));
  }
  const type = out.type;
  if (Array.isArray(type) && type.includes('number') && type.includes('string')) out.type = 'number';
  if (isObject(out.properties)) {
    const required = new Set(Array.isArray(out.required) ? (out.required as string[]) : []);
    for (const [key, prop] of Object.entries(out.properties)) {
      if (isObject(prop) && ('default' in prop || 'x-default' in prop)) required.add(key);
    }
    out.required = [...required];
  }
  if (out.title === 'BuildSpecification') out.title = 'CheckedSpecification';
  return out;
}
