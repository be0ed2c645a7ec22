// YAML → workbook → specification must give back every demo spec exactly:
// unit strings stay strings, optional keys stay absent, lists stay lists.
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'yaml';
import { parseSpecWorkbook } from '../../src/core/input/parse-spec-workbook.ts';
import { specificationWorkbook } from '../../src/render/spec-workbook/spec-sheets.ts';
import { specYaml } from '../../src/render/spec-yaml-template.ts';
import { defaultRulesDir, loadRulesData } from '../../src/node/load-rules-data.ts';
import { prepareSpec } from '../../src/core/spec/prepare.ts';
import { CHOICES } from '../support/spec-workbook.ts';
import { REPO } from '../support/run-cli.ts';

const DEMOS = readdirSync(join(REPO, 'specs')).filter((f) => f.endsWith('.yaml'));
const DATA = loadRulesData(defaultRulesDir());

describe.each(DEMOS)('%s', (file) => {
  const raw = parse(readFileSync(join(REPO, 'specs', file), 'utf8'));

  it('comes back from the workbook unchanged, and checks the same', async () => {
    const bytes = Buffer.from(await specificationWorkbook(raw, CHOICES).xlsx.writeBuffer());
    const read = await parseSpecWorkbook(bytes);
    if (!read.ok) throw new Error(JSON.stringify(read.issues));
    expect(read.raw).toEqual(raw);
    const a = prepareSpec(raw, DATA);
    const b = prepareSpec(read.raw, DATA);
    expect(b).toEqual(a);
  });

  it('comes back from the commented YAML unchanged', () => {
    expect(parse(specYaml(raw))).toEqual(raw);
  });
});

describe('demo specs hold what the round trip must carry', () => {
  it('unit strings and optional keys among them', () => {
    const all = DEMOS.map((f) => readFileSync(join(REPO, 'specs', f), 'utf8')).join('\n');
    expect(all).toMatch(/_mm: "[\d.]+ (in|m|ft)/); // a unit string
    expect(all).toMatch(/mass_kg: "\d+ lb"/);
    expect(all).toMatch(/lengths_mm: \[/); // a list in one cell
  });
});

describe('the blank workbook', () => {
  it('reads as a specification holding only its version', async () => {
    const read = await parseSpecWorkbook(Buffer.from(await specificationWorkbook(undefined, CHOICES).xlsx.writeBuffer()));
    expect(read.ok && read.raw).toEqual({ spec_version: 1 });
  });
});
