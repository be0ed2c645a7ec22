// The workbench's form, laid out from the specification's schema through the
// same walk as the fill-in workbook (spec-fields.ts): one section per part of
// the build, each field with its unit, help, range and default; lists of
// entries (crew, loads, lashings, stock) as tables with rows to add and remove.
import { specSections, type Field, type Table } from '../core/spec/spec-fields.ts';

export interface FormField {
  /** The full key path from the spec's root. */
  path: string[];
  field: Field;
}

export interface FormTable {
  /** The list's full key path from the root. */
  path: string[];
  table: Table;
}

export interface FormSection {
  id: string;
  title: string;
  help: string;
  required: boolean;
  fields: FormField[];
  tables: FormTable[];
}

export function formSections(): FormSection[] {
  return specSections().map((s) => ({
    id: s.path.length ? s.path.join('.') : 'general',
    title: s.sheet,
    help: s.help,
    required: s.required,
    fields: s.fields.map((f) => ({ path: [...s.path, ...f.path], field: f })),
    tables: s.tables.map((t) => ({ path: [...s.path, ...t.path], table: t })),
  }));
}

/** Every value the form edits, as a pattern: `axle.x_mm`, `crew[].mass_kg`. */
export function formKeys(sections: readonly FormSection[] = formSections()): string[] {
  return sections.flatMap((s) => [...s.fields.map((f) => f.path.join('.')), ...s.tables.flatMap((t) => t.table.fields.map((f) => `${t.path.join('.')}[].${f.path.join('.')}`))]);
}

/** The range a field allows, in words: `20 to 250 kg`, `more than 0 mm`. */
export function rangeText(f: Field): string {
  const unit = f.unit ? ` ${f.unit}` : '';
  const low = f.minimum !== undefined ? `${f.minimum}` : f.exclusiveMinimum !== undefined ? `more than ${f.exclusiveMinimum}` : undefined;
  if (low !== undefined && f.maximum !== undefined) return f.minimum !== undefined ? `${low} to ${f.maximum}${unit}` : `${low}, at most ${f.maximum}${unit}`;
  if (f.minimum !== undefined) return `at least ${f.minimum}${unit}`;
  if (low !== undefined) return `${low}${unit}`;
  if (f.maximum !== undefined) return `at most ${f.maximum}${unit}`;
  return '';
}
