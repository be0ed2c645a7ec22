// The specification's keys laid out for a fill-in form (the workbook and the
// commented YAML), walked from the schema so that a key added there appears
// here without being listed twice.
import schema from './spec.schema.json' with { type: 'json' };
import { unitOfKey } from '../units/units.ts';

type Node = Record<string, unknown>;

/** A schema node's description, or nothing. */
const describedAs = (n: Node | undefined): string | undefined => (typeof n?.description === 'string' ? n.description : undefined);

/** The rules-data tables a key's values are chosen from. */
export type ChoiceTable = 'species' | 'leathers' | 'grounds';

export interface Field {
  /** Path from the section (for a table, from one entry). */
  path: string[];
  /** The path as one dotted key, as shown in the key column or a table header. */
  key: string;
  label: string;
  /** `list`: an array of scalars, written in one cell. */
  type: 'number' | 'integer' | 'string' | 'boolean' | 'list';
  /** True where a string with a unit ("65 in") is accepted and converted. */
  unitStrings: boolean;
  /** Unit symbol from the key's suffix, or ''. */
  unit: string;
  enum?: readonly (string | number)[];
  choices?: ChoiceTable;
  minimum?: number;
  exclusiveMinimum?: number;
  maximum?: number;
  default?: unknown;
  /** True where the default is computed from other keys. */
  computedDefault: boolean;
  /** Required once its parent object is given. */
  required: boolean;
  help: string;
}

/** An array of objects: one row per entry, one column per field. */
export interface Table {
  path: string[];
  key: string;
  label: string;
  help: string;
  fields: Field[];
  required: boolean;
  minItems?: number;
  maxItems?: number;
}

export interface Section {
  /** The sheet that holds it. */
  sheet: string;
  /** Top-level key, or [] for the top-level scalars. */
  path: string[];
  help: string;
  required: boolean;
  fields: Field[];
  tables: Table[];
}

const ROOT = schema as unknown as Node;
const DEFS = ROOT.$defs as Record<string, Node>;
const GENERAL_SHEET = 'General';

// The check's result workbook already has a sheet called Loads (the load
// table), and one workbook cannot hold two sheets of one name.
const SHEET_NAMES: Record<string, string> = { loads: 'Loads carried' };

/** A $ref merged with the keywords beside it; those beside it win. */
function resolve(node: Node): Node {
  const ref = node.$ref;
  if (typeof ref !== 'string') return node;
  const { $ref: _ignored, ...own } = node;
  return { ...resolve(DEFS[ref.replace('#/$defs/', '')]), ...own };
}

function isObject(n: Node): boolean {
  return n.type === 'object' || (n.properties !== undefined && n.type === undefined);
}

function isTable(n: Node): boolean {
  return n.type === 'array' && isObject(resolve(n.items as Node));
}

/** `floor.frame.bend_radius_mm` → `Floor frame bend radius`. */
export function labelOf(path: readonly string[]): string {
  const last = path[path.length - 1] ?? '';
  const bare = unitOfKey(last) ? last.slice(0, last.lastIndexOf('_')) : last;
  const words = [...path.slice(0, -1), bare].join(' ').replace(/_/g, ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

// The schema names the rules file a key's values come from; that file is the list.
function choicesOf(n: Node): ChoiceTable | undefined {
  const file = /rules\/(?:materials\/)?(species|leathers|grounds)\.yaml/.exec((describedAs(n) ?? ''));
  return file?.[1] as ChoiceTable | undefined;
}

function scalarType(n: Node): Field['type'] {
  if (n.type === 'array') return 'list';
  const types = ([] as unknown[]).concat(n.type ?? []);
  if (types.includes('integer')) return 'integer';
  if (types.includes('number')) return 'number';
  if (types.includes('boolean')) return 'boolean';
  if (n.const !== undefined) return typeof n.const === 'number' ? 'number' : 'string';
  return 'string';
}

function field(raw: Node, path: string[], required: boolean): Field {
  const n = resolve(raw);
  const item = n.type === 'array' ? resolve(n.items as Node) : n;
  const types = ([] as unknown[]).concat(item.type ?? []);
  const name = path[path.length - 1];
  const enumValues = (n.enum ?? (n.const !== undefined ? [n.const] : undefined)) as (string | number)[] | undefined;
  return {
    path,
    key: path.join('.'),
    label: labelOf(path),
    type: scalarType(n),
    unitStrings: types.includes('number') && types.includes('string'),
    unit: unitOfKey(name)?.symbol ?? '',
    ...(enumValues ? { enum: enumValues } : {}),
    ...(choicesOf(n) ? { choices: choicesOf(n) } : {}),
    ...(typeof item.minimum === 'number' ? { minimum: item.minimum } : {}),
    // A property's own minimum above its definition's "more than 0" is the bound that holds.
    ...(typeof item.exclusiveMinimum === 'number' && !(typeof item.minimum === 'number' && item.minimum > item.exclusiveMinimum) ? { exclusiveMinimum: item.exclusiveMinimum } : {}),
    ...(typeof item.maximum === 'number' ? { maximum: item.maximum } : {}),
    ...(n.default !== undefined ? { default: n.default } : {}),
    computedDefault: n['x-default'] === 'computed',
    required,
    help: (describedAs(n) ?? describedAs(item) ?? ''),
  };
}

/** Scalar fields and tables under an object, its nested objects flattened into dotted keys. */
function walkObject(node: Node, prefix: string[], fields: Field[], tables: Table[], requiredHere: boolean): void {
  const required = new Set((node.required as string[] | undefined) ?? []);
  for (const [key, raw] of Object.entries((node.properties ?? {}) as Record<string, Node>)) {
    const n = resolve(raw);
    const path = [...prefix, key];
    const req = requiredHere && required.has(key);
    if (isTable(n)) tables.push(table(n, path, req));
    else if (isObject(n)) walkObject(n, path, fields, tables, req);
    else fields.push(field(raw, path, req));
  }
}

function table(n: Node, path: string[], required: boolean): Table {
  const fields: Field[] = [];
  const nested: Table[] = [];
  walkObject(resolve(n.items as Node), [], fields, nested, true);
  if (nested.length) throw new Error(`a table inside the table ${path.join('.')} cannot be laid out in one sheet`);
  return {
    path,
    key: path.join('.'),
    label: labelOf(path),
    help: (describedAs(n) ?? ''),
    fields,
    required,
    ...(typeof n.minItems === 'number' ? { minItems: n.minItems } : {}),
    ...(typeof n.maxItems === 'number' ? { maxItems: n.maxItems } : {}),
  };
}

function sheetName(key: string): string {
  const plain = key.replace(/_/g, ' ');
  return SHEET_NAMES[key] ?? plain.charAt(0).toUpperCase() + plain.slice(1);
}

/** Every section of the specification, in schema order; the top-level scalars first, as General. */
export function specSections(): Section[] {
  const required = new Set(ROOT.required as string[]);
  const general: Section = { sheet: GENERAL_SHEET, path: [], help: (describedAs(ROOT) ?? ''), required: true, fields: [], tables: [] };
  const sections: Section[] = [general];
  for (const [key, raw] of Object.entries(ROOT.properties as Record<string, Node>)) {
    const n = resolve(raw);
    const req = required.has(key);
    const section: Section = { sheet: sheetName(key), path: [key], help: (describedAs(n) ?? ''), required: req, fields: [], tables: [] };
    if (isTable(n)) section.tables.push(table(n, [], req));
    else if (isObject(n)) walkObject(n, [], section.fields, section.tables, true);
    else {
      general.fields.push(field(raw, [key], req));
      continue;
    }
    sections.push(section);
  }
  return sections;
}
