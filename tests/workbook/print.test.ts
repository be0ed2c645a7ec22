// The demo's whole result workbook printed by LibreOffice: under 40 A4 pages
// (it was 592 before the sheets were set up to print). Skipped, saying why,
// only where LibreOffice is not installed (.ci/run installs it).
import { beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { renderWorkbook } from '../../src/render/workbook.ts';
import { demoResult } from './demo-result.ts';
import { pdfPageCount } from './pdf-pages.ts';
import { findSoffice, printToPdf } from './soffice.ts';

const soffice = findSoffice();
if (!soffice) console.warn('workbook print test: skipped, no soffice on the PATH; install LibreOffice (apt-get install libreoffice-calc-nogui) to run it.');

/** The most pages the demo's workbook may print on. */
const MOST_PAGES = 39;

describe.skipIf(!soffice)('the demo result workbook printed by LibreOffice', () => {
  let pages = 0;
  let sheets: ExcelJS.Worksheet[] = [];

  beforeAll(async () => {
    const bytes = await renderWorkbook(await demoResult('demo-two-crew'));
    const file = join(mkdtempSync(join(tmpdir(), 'axletree-print-test-')), 'result.xlsx');
    writeFileSync(file, bytes);
    pages = pdfPageCount(await printToPdf(soffice!, file));
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(bytes as unknown as ExcelJS.Buffer);
    sheets = wb.worksheets.filter((ws) => ws.state !== 'hidden');
  }, 300_000);

  it(`prints in at most ${MOST_PAGES} A4 pages, at least one a sheet`, () => {
    expect(pages).toBeGreaterThanOrEqual(sheets.length);
    expect(pages).toBeLessThanOrEqual(MOST_PAGES);
  });
});
