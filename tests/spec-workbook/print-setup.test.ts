// The fill-in workbook prints: every sheet on A4, one page wide, its header
// repeated; a table prints its entries and two blank rows to write more in by
// hand (at least five rows, or all it has), never its whole stock of empty rows.
import { describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { demoRaw, demoWorkbook } from '../support/spec-workbook.ts';

/** The last row a sheet prints, from its print area. */
function lastPrinted(ws: ExcelJS.Worksheet): number {
  return Number(/(\d+)$/.exec(ws.pageSetup.printArea ?? '')?.[1]);
}

/** The row holding entry number `n` of the only table on a sheet (entries are numbered in column A under the "#" header). */
function entryRow(ws: ExcelJS.Worksheet, n: number): number {
  let header = 0;
  ws.eachRow((row) => {
    if (!header && row.getCell(1).value === '#') header = row.number;
  });
  expect(header, ws.name).toBeGreaterThan(0);
  expect(ws.getCell(header + 1 + n, 1).value, `${ws.name} entry ${n}`).toBe(n);
  return header + 1 + n;
}

describe('the fill-in workbook, printed', () => {
  it('sets every visible sheet up for A4, one page wide, header rows repeated, named and numbered pages', async () => {
    const wb = await demoWorkbook();
    for (const ws of wb.worksheets.filter((w) => w.state !== 'hidden')) {
      expect(ws.pageSetup.paperSize, ws.name).toBe(9);
      expect([ws.pageSetup.fitToWidth, ws.pageSetup.fitToHeight], ws.name).toEqual([1, 0]);
      expect(ws.headerFooter.oddHeader, ws.name).toContain('Chariot build specification: Oak-hollow');
      expect(ws.headerFooter.oddFooter, ws.name).toContain('&P of &N');
    }
  });

  it('prints a table\'s entries and two blank rows, at least five rows, at most the rows it has', async () => {
    const raw = demoRaw();
    const wb = await demoWorkbook();
    const crew = (raw.crew as unknown[]).length;
    const lashings = (raw.lashings as unknown[]).length;
    // Crew holds at most 4: the demo's two and two blank rows.
    expect(lastPrinted(wb.getWorksheet('Crew')!)).toBe(entryRow(wb.getWorksheet('Crew')!, Math.min(4, Math.max(crew + 2, 5))));
    expect(lastPrinted(wb.getWorksheet('Lashings')!)).toBe(entryRow(wb.getWorksheet('Lashings')!, Math.max(lashings + 2, 5)));
    // The sheet holds twenty ready rows; the paper does not.
    expect(wb.getWorksheet('Lashings')!.getCell(entryRow(wb.getWorksheet('Lashings')!, 20), 1).value).toBe(20);
  });
});
