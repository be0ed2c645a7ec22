// The help a planner reads beside each cell of the fill-in workbook (the
// schema's descriptions): what the key is, its unit, a typical range and
// where to measure it. A range said to be that of the examples in specs/ is
// checked against those files; the species offered are every species in the
// rules data's species file.
import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'yaml';
import ExcelJS from 'exceljs';
import schema from '../../src/core/spec/spec.schema.json' with { type: 'json' };
import { specSections, type Field } from '../../src/core/spec/spec-fields.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { specificationWorkbook } from '../../src/render/spec-workbook/spec-sheets.ts';
import { rulesData } from '../support/fixtures.ts';
import { CHOICES } from '../support/spec-workbook.ts';
import { REPO } from '../support/run-cli.ts';

/** Every field under its full key: `box.floor.depth_mm`, `crew[].x_mm`. */
const FIELDS = new Map<string, Field>(
  specSections().flatMap((s) => [
    ...s.fields.map((f): [string, Field] => [[...s.path, ...f.path].join('.'), f]),
    ...s.tables.flatMap((t) => t.fields.map((f): [string, Field] => [`${[...s.path, ...t.path].join('.')}[].${f.key}`, f])),
  ]),
);

// How each unit symbol is said in the help.
const UNIT_WORDS: Record<string, string> = { mm: 'in mm', kg: 'in kg', N: 'in N', 'N/mm': 'in N/mm', m: 'in m', cm: 'in cm', 'km/h': 'in km/h', g: 'in g', '%': 'in per cent', '°': 'in degrees' };

// Keys whose size is the builder's own choice, with nothing typical to say: the extra parts' sizes
// and count, a fitted test result and the version.
const NO_RANGE = /^(stock\.extra_parts\[\]\.(length_mm|width_mm|thickness_mm|quantity)|floor_straps\.measured\.(damping_ratio|stiffness_N_per_mm)|spec_version)$/;

/** The example builds: the demos and the validation records; teaching-flawed.yaml is wrong on purpose. */
function exampleValues(): Map<string, number[]> {
  const files = [
    ...readdirSync(join(REPO, 'specs')).filter((f) => f.endsWith('.yaml') && f !== 'teaching-flawed.yaml').map((f) => join(REPO, 'specs', f)),
    ...readdirSync(join(REPO, 'specs', 'validation')).filter((f) => f.endsWith('.yaml')).map((f) => join(REPO, 'specs', 'validation', f)),
  ];
  const out = new Map<string, number[]>();
  for (const file of files) {
    const p = prepareSpec(parse(readFileSync(file, 'utf8')), rulesData);
    if (!p.ok) throw new Error(`${file} does not prepare`);
    for (const e of p.entries.filter((x) => !x.defaulted)) {
      const key = e.path.replace(/\[\d+\]/g, '[]');
      const values = [e.value].flat().filter((v): v is number => typeof v === 'number');
      if (values.length) out.set(key, [...(out.get(key) ?? []), ...values]);
    }
  }
  return out;
}

/** The generic texts of the schema's shared definitions, which say nothing of a particular key. */
const GENERIC = Object.entries(schema.$defs as Record<string, { description?: string }>)
  .filter(([name]) => !['grade', 'grain_slope'].includes(name))
  .map(([, d]) => d.description)
  .filter((d): d is string => typeof d === 'string');

describe('the fill-in help', () => {
  it('gives every key a help of its own, never only the shared definition\'s', () => {
    for (const [key, f] of FIELDS) {
      expect(f.help.length, key).toBeGreaterThan(10);
      expect(GENERIC, key).not.toContain(f.help);
    }
  });

  it('says the unit of every key that has one', () => {
    for (const [key, f] of FIELDS) {
      if (!f.unit) continue;
      expect(UNIT_WORDS[f.unit], `${key}: a unit the test has no words for`).toBeDefined();
      expect(f.help, key).toContain(UNIT_WORDS[f.unit]);
    }
  });

  it('gives every number a typical range: the examples\' or one marked as a judgement', () => {
    for (const [key, f] of FIELDS) {
      if (!['number', 'integer', 'list'].includes(f.type) || NO_RANGE.test(key)) continue;
      expect(f.help, key).toMatch(/Examples in specs\/: |Typically [-\d.]+ to [-\d.]+ .*\((from memory|common practice)\)/);
    }
  });

  it('states the examples\' range as the example builds in specs/ hold it', () => {
    const examples = exampleValues();
    for (const [key, f] of FIELDS) {
      const m = /Examples in specs\/: (-?[\d.]+)(?: to (-?[\d.]+))?\./.exec(f.help);
      if (!m) continue;
      const values = examples.get(key);
      expect(values, `${key}: no example in specs/ gives it`).toBeDefined();
      const [low, high] = [Math.min(...values!), Math.max(...values!)];
      expect([Number(m[1]), Number(m[2] ?? m[1])], `${key}: the examples in specs/ range ${low} to ${high}`).toEqual([low, high]);
    }
  });

  it('says where each position is measured from, and that the kerf is the saw\'s cut', () => {
    for (const [key, f] of FIELDS) {
      if (/(^|\.|\])x_mm$|\.(rear|root|yoke)_x_mm$/.test(key)) expect(f.help, key).toContain('forward from the rear edge of the floor');
      if (/(^|\.|\])y_mm$/.test(key)) expect(f.help, key).toContain('to the left of the centre line');
      if (/(^|\.|\])z_mm$/.test(key)) expect(f.help, key).toContain('above level ground');
    }
    const kerf = FIELDS.get('stock.kerf_mm')!.help;
    expect(kerf).toMatch(/width of the cut a saw blade makes/);
    expect(kerf).not.toMatch(/coordinate/i);
  });
});

describe('the species the fill-in workbook offers', () => {
  it('are every species in rules/materials/species.yaml, in its order', async () => {
    const file = parse(readFileSync(join(REPO, 'rules', 'materials', 'species.yaml'), 'utf8')) as Record<string, unknown>;
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(await specificationWorkbook(undefined, CHOICES).xlsx.writeBuffer());
    const lists = wb.getWorksheet('Lists')!;
    expect(lists.getCell('A1').value).toBe('species');
    const offered: unknown[] = [];
    for (let r = 2; lists.getCell(r, 1).value !== null; r++) offered.push(lists.getCell(r, 1).value);
    expect(offered).toEqual(Object.keys(file));
    expect(offered.length).toBeGreaterThan(20);
  });
});
