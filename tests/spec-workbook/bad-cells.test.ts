// `axletree check` on a workbook with bad cells: each must end with exit
// code 2, name the key and its sheet and cell, write nothing and leave the
// workbook as it was.
import { describe, expect, it } from 'vitest';
import { existsSync, readFileSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type ExcelJS from 'exceljs';
import { cellLabel, demoWorkbook, tableCell, valueCell } from '../support/spec-workbook.ts';
import { freshDir, runCli } from '../support/run-cli.ts';

interface Case {
  name: string;
  /** Spoil the workbook; return the fragments the error output must hold. */
  spoil: (wb: ExcelJS.Workbook) => string[];
}

const CASES: Case[] = [
  {
    name: 'text in a number cell',
    spoil: (wb) => {
      const cell = valueCell(wb, 'Axle', 'length_mm');
      cell.value = 'long';
      return [`axle.length_mm (${cellLabel('Axle', cell)})`, '"long"', '[1020]'];
    },
  },
  {
    name: 'text in a whole-number cell',
    spoil: (wb) => {
      const cell = valueCell(wb, 'Wheels', 'spokes');
      cell.value = 'six';
      return [`wheels.spokes (${cellLabel('Wheels', cell)})`, '"six"', 'a whole number', '[1032]'];
    },
  },
  {
    name: 'an unknown species typed over the drop-down',
    spoil: (wb) => {
      const cell = valueCell(wb, 'Axle', 'species');
      cell.value = 'balsa';
      return [`axle.species (${cellLabel('Axle', cell)})`, 'unknown species "balsa"', 'white-ash', '[1101]'];
    },
  },
  {
    name: 'an unknown material in a table',
    spoil: (wb) => {
      const cell = tableCell(wb, 'Lashings', 'lashings', 1, 'material');
      cell.value = 'string';
      return [`lashings[1].material (${cellLabel('Lashings', cell)})`, 'unknown material "string"', '[1102]'];
    },
  },
  {
    name: 'an empty required cell',
    spoil: (wb) => {
      const cell = valueCell(wb, 'Wheels', 'track_mm');
      cell.value = null;
      return [`wheels.track_mm (${cellLabel('Wheels', cell)})`, 'required key track_mm', '[1030]'];
    },
  },
  {
    name: 'an empty required cell in a table',
    spoil: (wb) => {
      const cell = tableCell(wb, 'Crew', 'crew', 1, 'x_mm');
      const label = cellLabel('Crew', cell);
      cell.value = null;
      return [`crew[1].x_mm (${label})`, 'required key x_mm', '[1030]'];
    },
  },
  {
    name: 'a number out of range in a sheet with spaces in its name',
    spoil: (wb) => {
      const cell = valueCell(wb, 'Floor straps', 'pitch_mm');
      cell.value = 900;
      return [`floor_straps.pitch_mm ('Floor straps'!${cell.address})`, '900', '[1033]'];
    },
  },
  {
    name: 'an extra sheet',
    spoil: (wb) => {
      wb.addWorksheet('Notes').getCell('A1').value = 'my notes';
      return ['(Notes!A1)', 'the sheet "Notes" is not part of a specification workbook', 'Axle', '[1041]'];
    },
  },
  {
    name: 'a missing sheet',
    spoil: (wb) => {
      wb.removeWorksheet(wb.getWorksheet('Yoke')!.id);
      return ['yoke: the workbook has no sheet "Yoke"', '[1040]'];
    },
  },
  {
    name: 'a key typed into the key column',
    spoil: (wb) => {
      const ws = wb.getWorksheet('Pole')!;
      const row = ws.rowCount + 2;
      ws.getCell(row, 1).value = 'lenght_mm';
      ws.getCell(row, 3).value = 3000;
      return [`(Pole!A${row})`, '"lenght_mm"', '[1042]'];
    },
  },
];

describe('checking a workbook with bad cells', () => {
  it.each(CASES)('$name', async ({ spoil }) => {
    const wb = await demoWorkbook();
    const expected = spoil(wb);
    const dir = await freshDir('axletree-bad-cells-');
    const file = join(dir, 'spec.xlsx');
    await writeFile(file, new Uint8Array(await wb.xlsx.writeBuffer()));
    const before = readFileSync(file);
    const r = await runCli(['check', '--no-decisive', 'spec.xlsx', '--out', 'out'], dir);
    expect(r.code).toBe(2);
    for (const text of expected) expect(r.err).toContain(text);
    expect(r.err).not.toMatch(/\n\s+at /); // no stack trace
    expect(existsSync(join(dir, 'out'))).toBe(false);
    expect(readFileSync(file).equals(before)).toBe(true);
  });

  it('refuses a file that is not a workbook', async () => {
    const dir = await freshDir('axletree-bad-cells-');
    await writeFile(join(dir, 'spec.xlsx'), 'spec_version: 1\n');
    const r = await runCli(['check', 'spec.xlsx'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('as an .xlsx workbook');
  });
});

describe('a workbook with unit strings and digits typed as text', () => {
  it('converts them as YAML would', async () => {
    const wb = await demoWorkbook();
    valueCell(wb, 'Wheels', 'diameter_mm').value = '37 in'; // 939.8 mm
    valueCell(wb, 'Wheels', 'spokes').value = '6';
    const dir = await freshDir('axletree-cells-');
    await writeFile(join(dir, 'spec.xlsx'), new Uint8Array(await wb.xlsx.writeBuffer()));
    const r = await runCli(['check', '--no-decisive', 'spec.xlsx', '--out', 'out', '--json'], dir);
    expect(r.code).not.toBe(2);
    const result = JSON.parse(r.out);
    const entry = (p: string) => result.spec_as_checked.find((e: { path: string }) => e.path === p).value;
    expect(entry('wheels.diameter_mm')).toBeCloseTo(37 * 25.4, 9);
    expect(entry('wheels.spokes')).toBe(6);
  });
});
