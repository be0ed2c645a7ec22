// A zip archive's entries read from its central directory, for tests that
// look inside a workbook at what the spreadsheet library does not read back.
import { inflateRawSync } from 'node:zlib';

export interface ZipEntry {
  name: string;
  /** The DOS modification date and time, as stored. */
  date: number;
  time: number;
  text: () => string;
}

export function zipEntries(bytes: Uint8Array): ZipEntry[] {
  const buf = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const end = buf.lastIndexOf(Buffer.from([0x50, 0x4b, 0x05, 0x06]));
  if (end < 0) throw new Error('not a zip archive');
  const count = buf.readUInt16LE(end + 10);
  let at = buf.readUInt32LE(end + 16);
  const out: ZipEntry[] = [];
  for (let i = 0; i < count; i++) {
    const method = buf.readUInt16LE(at + 10);
    const size = buf.readUInt32LE(at + 20);
    const nameLength = buf.readUInt16LE(at + 28);
    const skip = nameLength + buf.readUInt16LE(at + 30) + buf.readUInt16LE(at + 32);
    const local = buf.readUInt32LE(at + 42);
    const name = buf.toString('utf8', at + 46, at + 46 + nameLength);
    const start = local + 30 + buf.readUInt16LE(local + 26) + buf.readUInt16LE(local + 28);
    const data = buf.subarray(start, start + size);
    out.push({ name, time: buf.readUInt16LE(at + 12), date: buf.readUInt16LE(at + 14), text: () => (method === 8 ? inflateRawSync(data) : data).toString('utf8') });
    at += 46 + skip;
  }
  return out;
}
