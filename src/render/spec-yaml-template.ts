// The fill-in specification as a commented YAML file, laid out from the same
// schema walk as the workbook: each key with its help above it, optional keys
// left as comments showing their default.
import { stringify } from 'yaml';
import { CAUTIONS } from '../core/cautions.ts';
import { specSections, type Field, type Section, type Table } from '../core/spec/spec-fields.ts';
import { defaultText } from './spec-workbook/section-sheet.ts';
import { blankSpec, valueAt } from '../core/input/spec-values.ts';

const STEP = '  ';

function scalar(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(scalar).join(', ')}]`;
  return stringify(v, { lineWidth: 0 }).trimEnd();
}

/** The default as YAML, or how the key may be filled: required, optional, computed. */
function defaultYaml(f: Field): string {
  const d = defaultText(f);
  return ['required', 'optional', 'computed'].includes(d) ? d : scalar(f.default);
}

/** `(mm) required.` or `(mm) default 150.`: how a key may be filled. */
function about(f: Field): string {
  const d = defaultYaml(f);
  const how = d === 'required' || d === 'optional' ? `${d}.` : d === 'computed' ? 'default: computed.' : `default ${d}.`;
  return `${f.unit ? `(${f.unit}) ` : ''}${how}`;
}

function comment(indent: string, text: string): string[] {
  return text ? [`${indent}# ${text}`] : [];
}

/** A field's line: live when it has a value or must be filled; else commented, showing its default. */
function fieldLine(indent: string, name: string, f: Field, value: unknown): string {
  if (value !== undefined) return `${indent}${name}: ${scalar(value)}`;
  if (f.required) return `${indent}${name}:`;
  const d = defaultYaml(f);
  return `${indent}# ${name}:${d === 'optional' || d === 'computed' ? '' : ` ${d}`}`;
}

const isLive = (f: Field, value: unknown) => value !== undefined || f.required;

/** The fields of one object, re-nested from their dotted paths. */
function objectLines(fields: readonly Field[], value: unknown, depth: number, withHelp: boolean): string[] {
  const out: string[] = [];
  const groups = new Map<string, Field[]>();
  for (const f of fields) groups.set(f.path[0], [...(groups.get(f.path[0]) ?? []), f]);
  const indent = STEP.repeat(depth);
  for (const [name, group] of groups) {
    const child = valueAt(value, [name]);
    if (group.length === 1 && group[0].path.length === 1) {
      const f = group[0];
      if (withHelp) out.push(...comment(indent, `${about(f)} ${f.help}`.trim()));
      out.push(fieldLine(indent, name, f, child));
      continue;
    }
    const inner = group.map((f) => ({ ...f, path: f.path.slice(1) }));
    const live = group.some((f) => isLive(f, valueAt(value, f.path)));
    const lines = objectLines(inner, child, depth + 1, withHelp);
    out.push(live ? `${indent}${name}:` : `${indent}# ${name}:`);
    // A header left as a comment comments out everything under it.
    out.push(...(live ? lines : lines.map((l) => (l.trimStart().startsWith('#') ? l : `${indent}#${l.slice(indent.length)}`))));
  }
  return out;
}

function tableLines(name: string, table: Table, value: unknown, depth: number): string[] {
  const indent = STEP.repeat(depth);
  const entries = Array.isArray(value) ? value : [];
  const limits = [table.minItems ? `at least ${table.minItems}` : '', table.maxItems !== undefined ? `at most ${table.maxItems}` : ''].filter(Boolean).join(', ');
  const out = comment(indent, `${table.label || name}: one entry per item${limits ? ` (${limits})` : ''}.${table.help ? ` ${table.help}` : ''}`);
  for (const f of table.fields) out.push(...comment(indent, `  ${f.key} ${about(f)} ${f.help}`.trimEnd()));
  const shown = entries.length ? entries : [undefined];
  const live = entries.length > 0 || table.required;
  out.push(`${indent}${live ? '' : '# '}${name}:`);
  for (const entry of shown) {
    const lines = objectLines(table.fields, entry, depth + 2, false);
    // The first live key carries the entry's dash.
    const first = lines.findIndex((l) => !l.trimStart().startsWith('#'));
    lines.forEach((l, i) => {
      const text = i === first ? `${STEP.repeat(depth + 1)}- ${l.trimStart()}` : l;
      out.push(live || text.trimStart().startsWith('#') ? text : `${indent}# ${text.slice(indent.length)}`);
    });
    if (first < 0 && live) out.splice(out.length - lines.length, 0, `${STEP.repeat(depth + 1)}-`);
  }
  return out;
}

function sectionLines(s: Section, value: unknown): string[] {
  const out = ['', `# ${s.sheet}${s.help ? `: ${s.help}` : ''}`];
  if (!s.path.length) return [...out, ...objectLines(s.fields, value, 0, true)];
  const name = s.path[0];
  if (s.tables.length === 1 && s.tables[0].path.length === 0) return [...out, ...tableLines(name, s.tables[0], value, 0)];
  const body = [...objectLines(s.fields, value, 1, true), ...s.tables.flatMap((t) => tableLines(t.path.join('.'), t, valueAt(value, t.path), 1))];
  const live = value !== undefined || s.required;
  if (live) return [...out, `${name}:`, ...body];
  return [...out, `# ${name}:`, ...body.map((l) => (l.trimStart().startsWith('#') ? l : `#${l}`))];
}

/** A commented YAML specification: blank, or holding the values of `raw`. */
export function specYaml(raw?: unknown): string {
  const head = [
    '# Chariot build specification. Fill in the values after the colons; a key',
    '# left as a comment takes the default shown. Values are in the unit of the',
    '# key (the suffix: _mm, _kg, ...); another unit may be written as a string',
    '# ("65 in", "180 lb"). Then run: npx axletree check <this file>.',
    '#',
    ...CAUTIONS.map((c) => `# CAUTION: ${c}`),
  ];
  const sections = specSections();
  const spec = raw ?? blankSpec(sections);
  return [...head, ...sections.flatMap((s) => sectionLines(s, valueAt(spec, s.path)))].join('\n') + '\n';
}
