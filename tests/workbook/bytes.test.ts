// The same input gives the same bytes, whatever the clock says: the result
// workbook and the fill-in workbook carry fixed dates in their properties and
// in every zip entry.
import { afterEach, describe, expect, it, vi } from 'vitest';
import ExcelJS from 'exceljs';
import { renderWorkbook } from '../../src/render/workbook.ts';
import { specificationWorkbookBytes } from '../../src/render/spec-workbook/spec-sheets.ts';
import { STEADY_DATE, steadyZip } from '../../src/render/steady-bytes.ts';
import { sampleResult } from '../fixtures/sample-result.ts';
import { readDemo } from '../support/fixtures.ts';
import { CHOICES } from '../support/spec-workbook.ts';
import { zipEntries } from './zip-entries.ts';

/** Two renderings a year apart by the clock. */
async function twice(render: () => Promise<Uint8Array>): Promise<[Uint8Array, Uint8Array]> {
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(new Date('2031-03-04T05:06:07Z'));
  const a = await render();
  vi.setSystemTime(new Date('2032-08-09T10:11:13Z'));
  const b = await render();
  return [a, b];
}

afterEach(() => {
  vi.useRealTimers();
});

describe('workbook bytes', () => {
  const result = { ...sampleResult(), input: readDemo('demo-two-crew') };

  it('the result workbook is byte-identical from two runs at different times', async () => {
    const [a, b] = await twice(async () => new Uint8Array(await renderWorkbook(result)));
    expect(Buffer.from(a).equals(Buffer.from(b))).toBe(true);
    // Dated 2000-01-01 00:00 everywhere: DOS date (20 << 9 | 1 << 5 | 1), time 0.
    const stamps = zipEntries(a).map((e) => `${e.date}:${e.time}`);
    expect(stamps.length).toBeGreaterThan(10);
    expect(new Set(stamps)).toEqual(new Set([`${(20 << 9) | (1 << 5) | 1}:0`]));
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(Buffer.from(a) as unknown as ExcelJS.Buffer);
    expect(wb.created.toISOString()).toBe(STEADY_DATE.toISOString());
    expect(wb.modified.toISOString()).toBe(STEADY_DATE.toISOString());
  });

  it('the fill-in workbook is byte-identical from two runs at different times', async () => {
    const [a, b] = await twice(() => specificationWorkbookBytes(readDemo('demo-rear-axle'), CHOICES));
    expect(Buffer.from(a).equals(Buffer.from(b))).toBe(true);
  });

  it('a different input gives different bytes', async () => {
    const a = await renderWorkbook(result);
    const b = await renderWorkbook({ ...result, spec_name: `${result.spec_name}, second` });
    expect(Buffer.from(a).equals(Buffer.from(b))).toBe(false);
  });

  it('refuses bytes that are not a zip archive', () => {
    expect(() => steadyZip(new TextEncoder().encode('not a zip file at all, just some text'))).toThrow(/not a zip archive/);
  });
});
