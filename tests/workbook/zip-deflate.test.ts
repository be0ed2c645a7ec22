// A workbook written with its entries stored, then each entry deflated by
// Node's zlib (the path a command takes): every entry reads back as stored,
// with its CRC-32 (checked here against zlib's own), the spreadsheet library
// reads the workbook, and the result workbook is the same bytes from run to run.
import { crc32, deflateRawSync } from 'node:zlib';
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { deflateStoredZip } from '../../src/render/zip-deflate.ts';
import { renderWorkbook } from '../../src/render/workbook.ts';
import { nativeDeflateRaw } from '../../src/node/native-deflate.ts';
import { sampleResult } from '../fixtures/sample-result.ts';
import { readDemo } from '../support/fixtures.ts';
import { zipEntries } from './zip-entries.ts';

async function storedWorkbook(): Promise<Uint8Array> {
  const wb = new ExcelJS.Workbook();
  const ws = wb.addWorksheet('Axle');
  ws.getCell('A1').value = 'length, mm';
  ws.getCell('B1').value = 1380;
  return new Uint8Array(await wb.xlsx.writeBuffer({ zip: { compression: 'STORE' } }));
}

/** Each entry's method and CRC-32 from the central directory. */
function directory(bytes: Uint8Array): { method: number; crc: number }[] {
  const buf = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const end = buf.lastIndexOf(Buffer.from([0x50, 0x4b, 0x05, 0x06]));
  const out: { method: number; crc: number }[] = [];
  for (let i = 0, at = buf.readUInt32LE(end + 16); i < buf.readUInt16LE(end + 10); i++) {
    out.push({ method: buf.readUInt16LE(at + 10), crc: buf.readUInt32LE(at + 16) });
    at += 46 + buf.readUInt16LE(at + 28) + buf.readUInt16LE(at + 30) + buf.readUInt16LE(at + 32);
  }
  return out;
}

describe('deflating a stored zip', () => {
  it('keeps every entry, deflated, with the CRC of its plain bytes', async () => {
    const stored = await storedWorkbook();
    const packed = deflateStoredZip(stored, (d) => deflateRawSync(d));
    const before = zipEntries(stored);
    const after = zipEntries(packed);
    expect(after.map((e) => e.name)).toEqual(before.map((e) => e.name));
    expect(after.map((e) => e.text())).toEqual(before.map((e) => e.text()));
    expect(directory(stored).every((e) => e.method === 0)).toBe(true);
    expect(directory(packed).every((e) => e.method === 8)).toBe(true);
    // zlib's CRC-32 of each plain entry is the one the directory carries.
    expect(directory(packed).map((e) => e.crc)).toEqual(after.map((e) => crc32(Buffer.from(e.text(), 'utf8'))));
    expect(packed.length).toBeLessThan(stored.length);
  });

  it('is read back by the spreadsheet library', async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(Buffer.from(deflateStoredZip(await storedWorkbook(), nativeDeflateRaw)) as unknown as ExcelJS.Buffer);
    expect(wb.getWorksheet('Axle')?.getCell('B1').value).toBe(1380);
  });

  it('refuses an archive whose entries are already compressed, and bytes that are not a zip', async () => {
    const packed = deflateStoredZip(await storedWorkbook(), nativeDeflateRaw);
    expect(() => deflateStoredZip(packed, nativeDeflateRaw)).toThrow(/is not stored \(method 8\)/);
    expect(() => deflateStoredZip(new TextEncoder().encode('a cut list, not an archive'), nativeDeflateRaw)).toThrow(/not a zip archive/);
  });

  it('gives the result workbook the same content as the library deflate, and the same bytes from run to run', async () => {
    const result = { ...sampleResult(), input: readDemo('demo-two-crew') };
    const own = await renderWorkbook(result, undefined, nativeDeflateRaw);
    expect(Buffer.from(await renderWorkbook(result, undefined, nativeDeflateRaw)).equals(Buffer.from(own))).toBe(true);
    const library = await renderWorkbook(result);
    const text = (b: Uint8Array) => zipEntries(b).map((e) => `${e.name}\n${e.text()}`);
    expect(text(own)).toEqual(text(library));
  });
});
