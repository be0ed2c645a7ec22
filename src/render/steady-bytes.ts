import type ExcelJS from 'exceljs';
import { deflateStoredZip, type DeflateRaw } from './zip-deflate.ts';
import { CENTRAL_ENTRY, LOCAL_ENTRY, endRecordAt } from './zip-records.ts';

// The same input must give the same file, byte for byte, so that a result can
// be compared, hashed or kept under version control. A workbook carries dates
// in two places: its properties (created, modified) and every zip entry's
// modification time, which the zip writer takes from the clock. Both are set
// to one fixed moment here.

/** The moment every workbook we write says it was made. */
export const STEADY_DATE = new Date('2000-01-01T00:00:00Z');

/** A date as the zip format's 16-bit DOS time and date (two-second steps, from 1980). */
function dosStamp(d: Date): { time: number; date: number } {
  return {
    time: (d.getUTCHours() << 11) | (d.getUTCMinutes() << 5) | Math.floor(d.getUTCSeconds() / 2),
    date: ((d.getUTCFullYear() - 1980) << 9) | ((d.getUTCMonth() + 1) << 5) | d.getUTCDate(),
  };
}

/**
 * A copy of a zip archive with every entry's modification time set to
 * STEADY_DATE, in the central directory and in each entry's own header.
 * Nothing else changes; an archive that is not a plain zip is refused.
 */
export function steadyZip(bytes: Uint8Array): Uint8Array {
  const out = new Uint8Array(bytes);
  const view = new DataView(out.buffer, out.byteOffset, out.byteLength);
  const end = endRecordAt(view);
  const entries = view.getUint16(end + 10, true);
  const { time, date } = dosStamp(STEADY_DATE);
  let at = view.getUint32(end + 16, true);
  for (let i = 0; i < entries; i++) {
    if (view.getUint32(at, true) !== CENTRAL_ENTRY) throw new Error(`not a zip archive: no directory entry at byte ${at}`);
    view.setUint16(at + 12, time, true);
    view.setUint16(at + 14, date, true);
    const local = view.getUint32(at + 42, true);
    if (view.getUint32(local, true) !== LOCAL_ENTRY) throw new Error(`not a zip archive: no entry header at byte ${local}`);
    view.setUint16(local + 10, time, true);
    view.setUint16(local + 12, date, true);
    at += 46 + view.getUint16(at + 28, true) + view.getUint16(at + 30, true) + view.getUint16(at + 32, true);
  }
  return out;
}

/**
 * A workbook's bytes with fixed dates: its properties before writing, its zip entries after. `deflateRaw`: a
 * faster raw deflate than the workbook library's own (Node's zlib, given by the caller): the library then only
 * stores its entries and each is deflated with it (zip-deflate.ts).
 */
export async function steadyWorkbookBytes(wb: ExcelJS.Workbook, deflateRaw?: DeflateRaw): Promise<Uint8Array> {
  wb.created = STEADY_DATE;
  wb.modified = STEADY_DATE;
  if (!deflateRaw) return steadyZip(new Uint8Array(await wb.xlsx.writeBuffer()));
  const stored = new Uint8Array(await wb.xlsx.writeBuffer({ zip: { compression: 'STORE' } }));
  return steadyZip(deflateStoredZip(stored, deflateRaw));
}
