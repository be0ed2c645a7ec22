// templates/specification.xlsx must be what `npm run gen:template` makes now,
// byte for byte: the workbook carries fixed dates, in its properties and zip.
import { describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { defaultRulesDir, loadRulesData } from '../../src/node/load-rules-data.ts';
import { TEMPLATE_FILE, templateBytes } from '../../src/render/spec-workbook/template.ts';
import { REPO } from '../support/run-cli.ts';

describe(TEMPLATE_FILE, () => {
  it('is fresh: regenerate it with npm run gen:template', async () => {
    const kept = readFileSync(join(REPO, TEMPLATE_FILE));
    const fresh = await templateBytes(loadRulesData(defaultRulesDir()));
    expect(kept.equals(Buffer.from(fresh))).toBe(true);
  });

  it('has a cover, a sheet per section and the species drop-down', async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(join(REPO, TEMPLATE_FILE));
    const names = wb.worksheets.map((w) => w.name);
    expect(names[0]).toBe('Start here');
    expect(names).toEqual(expect.arrayContaining(['General', 'Box', 'Axle', 'Wheels', 'Pole', 'Yoke', 'Floor straps', 'Lashings', 'Crew', 'Loads carried', 'Team', 'Operation', 'Stock']));
    const axle = wb.getWorksheet('Axle')!;
    const row = [...Array(axle.rowCount).keys()].map((i) => i + 1).find((r) => axle.getCell(r, 1).value === 'species')!;
    const rule = axle.getCell(row, 3).dataValidation;
    expect(rule.type).toBe('list');
    // The range names the hidden list; every species of the rules data is in it.
    const lists = wb.getWorksheet('Lists')!;
    const [, from, to] = /\$A\$(\d+):\$A\$(\d+)/.exec(String(rule.formulae[0]))!;
    const listed = [...Array(Number(to) - Number(from) + 1).keys()].map((i) => lists.getCell(Number(from) + i, 1).value);
    expect(listed).toEqual(Object.keys(loadRulesData(defaultRulesDir()).species));
    // A range check from the schema: the axle length is at least 500 and at most 4000 mm.
    const len = [...Array(axle.rowCount).keys()].map((i) => i + 1).find((r) => axle.getCell(r, 1).value === 'length_mm')!;
    expect(axle.getCell(len, 3).dataValidation).toMatchObject({ type: 'decimal', operator: 'between', formulae: [500, 4000] });
    expect(axle.getCell(len, 3).fill).not.toEqual(axle.getCell(len, 2).fill); // inputs look different from labels
  });
});
