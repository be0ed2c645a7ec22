// The zip directory reader and the sheet scan that size a workbook before
// the spreadsheet library opens it. The library itself is the check on the
// hand-written containers: what it opens, the reader must read alike.
import ExcelJS from 'exceljs';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { scanSheet, workbookLimitIssues } from '../../src/node/workbook-limits.ts';
import { readZipDirectory, unpackPart } from '../../src/node/zip-directory.ts';
import { bareWorkbook, rowXml, sheetXml } from '../support/bare-workbook.ts';
import { REPO } from '../support/run-cli.ts';
import { deflatedZeros, zipBytes } from '../support/zip-writer.ts';

const TEMPLATE = new Uint8Array(readFileSync(join(REPO, 'templates', 'specification.xlsx')));

describe('the zip directory', () => {
  it('reads every part of the template, and the parts packed again open in the spreadsheet library as the template does', async () => {
    const dir = readZipDirectory(TEMPLATE, 1000);
    if (!dir.ok) throw new Error(dir.reason);
    expect(dir.parts.length).toBe(dir.count);
    const repacked = zipBytes(dir.parts.map((p) => ({ name: p.name, data: unpackPart(TEMPLATE, p, p.statedSize) as Buffer })));
    const names = async (bytes: Uint8Array) => {
      const wb = new ExcelJS.Workbook();
      await wb.xlsx.load(bytes as unknown as ArrayBuffer);
      return wb.worksheets.map((w) => `${w.name}:${w.rowCount}`);
    };
    expect(await names(repacked)).toEqual(await names(TEMPLATE));
    expect(workbookLimitIssues(TEMPLATE, 'template.xlsx')).toEqual([]);
  });

  it('reports the count alone when it is past the limit, without reading the entries', () => {
    const zip = bareWorkbook([{ name: 'General', xml: sheetXml('') }]);
    const dir = readZipDirectory(zip, 2);
    expect(dir.ok && [dir.count, dir.parts.length]).toEqual([5, 0]);
  });

  it('stops unpacking at the allowed size whatever the directory states', () => {
    const zeros = deflatedZeros(50e6);
    const zip = zipBytes([{ name: 'big.xml', ...zeros, statedSize: 100 }]);
    const dir = readZipDirectory(zip, 10);
    if (!dir.ok) throw new Error(dir.reason);
    expect(dir.parts[0].statedSize).toBe(100);
    const started = performance.now();
    expect(unpackPart(zip, dir.parts[0], 1000)).toBeUndefined();
    expect(performance.now() - started).toBeLessThan(2000);
    // Within the allowance, the part comes back whole.
    const small = zipBytes([{ name: 'small.xml', ...deflatedZeros(1000) }]);
    const part = (readZipDirectory(small, 10) as { parts: Parameters<typeof unpackPart>[1][] }).parts[0];
    expect((unpackPart(small, part, 1000) as Buffer).length).toBe(1000);
    expect(unpackPart(small, part, 999)).toBeUndefined();
  });

  it('says what is wrong with a file that is not a zip container', () => {
    expect(readZipDirectory(new TextEncoder().encode('spec_version: 1\n'), 10)).toEqual({ ok: false, reason: 'it is not a zip container (no end of central directory)' });
  });
});

describe('the sheet scan', () => {
  it('counts rows and cells and finds the last of each, as the spreadsheet library does', async () => {
    const xml = sheetXml([rowXml(1, ['a', 1]), rowXml(7, [2, 3, 4])].join(''), 'A1:C8');
    const scan = scanSheet(xml, Infinity);
    expect(scan).toEqual({ lastRow: 7, lastColumn: 3, cells: 5, stated: { row: 8, column: 3 }, styledColumns: 0 });
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(bareWorkbook([{ name: 'S', xml }]) as unknown as ArrayBuffer);
    const ws = wb.getWorksheet('S')!;
    expect([ws.rowCount, ws.columnCount]).toEqual([scan.lastRow, scan.lastColumn]);
  });

  it('takes a row without its number as the row after the one before (the number is optional in the file format)', () => {
    const xml = sheetXml(`${rowXml(4, [1])}<row><c><v>5</v></c></row><row/>`);
    expect(scanSheet(xml, Infinity)).toMatchObject({ lastRow: 6, cells: 2 });
  });

  it('reads elements with a namespace prefix and a stated range of one cell', () => {
    const xml = '<x:worksheet><x:dimension ref="B2"/><x:sheetData><x:row r="2"><x:c r="B2"/></x:row></x:sheetData></x:worksheet>';
    expect(scanSheet(xml, Infinity)).toEqual({ lastRow: 2, lastColumn: 2, cells: 1, stated: { row: 2, column: 2 }, styledColumns: 0 });
  });
});
