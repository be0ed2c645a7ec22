// The workbench's form covers every value of the specification's schema: an
// independent walk of the schema JSON (every leaf under every object, list
// entries as `list[]`) must give exactly the form's keys.
import { describe, expect, it } from 'vitest';
import schema from '../../src/core/spec/spec.schema.json' with { type: 'json' };
import type { Field } from '../../src/core/spec/spec-fields.ts';
import { formKeys, formSections, rangeText } from '../../src/web/form-model.ts';
import { valueOfText } from '../../src/web/field-input.ts';

type Node = Record<string, unknown>;
const defs = (schema as unknown as { $defs: Record<string, Node> }).$defs;
const deref = (n: Node): Node => (typeof n.$ref === 'string' ? { ...deref(defs[n.$ref.replace('#/$defs/', '')]), ...n, $ref: undefined } : n);

function leaves(n: Node, prefix: string): string[] {
  const node = deref(n);
  if (node.properties) return Object.entries(node.properties as Record<string, Node>).flatMap(([k, v]) => leaves(v, prefix ? `${prefix}.${k}` : k));
  if (node.type === 'array') {
    const item = deref(node.items as Node);
    if (item.properties) return Object.entries(item.properties as Record<string, Node>).flatMap(([k, v]) => leaves(v, `${prefix}[].${k}`));
  }
  return [prefix];
}

describe('the workbench form', () => {
  it('has a control for every value of the schema, and nothing else', () => {
    const expected = leaves(schema, '').sort();
    expect(expected.length).toBeGreaterThan(100);
    expect(formKeys().sort()).toEqual(expected);
  });

  it('has one section per part of the build, as the fill-in workbook has', () => {
    const titles = formSections().map((s) => s.title);
    expect(titles[0]).toBe('General');
    for (const part of ['Box', 'Axle', 'Wheels', 'Pole', 'Yoke', 'Crew', 'Team']) expect(titles).toContain(part);
  });

  it('states each range as the schema gives it', () => {
    const crew = formSections().find((s) => s.id === 'crew')!.tables[0].table.fields.find((f) => f.key === 'mass_kg')!;
    // spec.schema.json: crew mass_kg minimum 20, maximum 250.
    expect(rangeText(crew)).toBe('20 to 250 kg');
  });

  it('reads typed text as the spec takes it: empty leaves the key out, numbers as numbers, units as text', () => {
    const axle = formSections().find((s) => s.id === 'axle')!.fields.find((f) => f.field.key === 'x_mm')!.field;
    expect(valueOfText('', axle)).toBeUndefined();
    expect(valueOfText(' 240 ', axle)).toBe(240);
    expect(valueOfText('1.5e2', axle)).toBe(150);
    // Anything else goes to the spec as typed: a value with a unit is converted there, nonsense is refused at the field.
    expect(valueOfText('9.5 in', axle)).toBe('9.5 in');
    expect(valueOfText('abc', axle)).toBe('abc');
  });
});

describe('a range in words', () => {
  const base: Field = { path: ['x'], key: 'x', label: 'X', type: 'number', unitStrings: false, unit: '%', computedDefault: false, required: false, help: '' };
  it.each([
    [{ minimum: 20, maximum: 250 }, '20 to 250 %'],
    [{ exclusiveMinimum: 0, maximum: 100 }, 'more than 0, at most 100 %'],
    [{ exclusiveMinimum: 0 }, 'more than 0 %'],
    [{ minimum: 1 }, 'at least 1 %'],
    [{ maximum: 9 }, 'at most 9 %'],
    [{}, ''],
  ])('%o reads "%s"', (bounds, text) => {
    expect(rangeText({ ...base, ...bounds })).toBe(text);
  });
});
