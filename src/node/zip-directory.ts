// The central directory of a zip container (an .xlsx workbook is one), read
// by hand so that a workbook's parts can be counted and sized before any
// spreadsheet library unpacks them. Only what a workbook uses: no ZIP64, no
// encryption, parts stored or deflated.
import { inflateRawSync } from 'node:zlib';

export interface ZipPart {
  name: string;
  /** 0 stored, 8 deflated. */
  method: number;
  /** The unpacked size the directory states (it may lie: unpacking checks it). */
  statedSize: number;
  packedSize: number;
  /** Where the part's local header starts. */
  offset: number;
}

export type ZipDirectory = { ok: true; parts: ZipPart[]; count: number } | { ok: false; reason: string };

const END_SIGNATURE = 0x06054b50;
const CENTRAL_SIGNATURE = 0x02014b50;
const LOCAL_SIGNATURE = 0x04034b50;
const END_SIZE = 22;
const CENTRAL_SIZE = 46;
const LOCAL_SIZE = 30;

/** The parts the directory lists; with `maxParts`, only the count is read when it is larger. */
export function readZipDirectory(zip: Uint8Array, maxParts: number): ZipDirectory {
  const bytes = Buffer.from(zip.buffer, zip.byteOffset, zip.byteLength);
  const end = findEnd(bytes);
  if (end < 0) return { ok: false, reason: 'it is not a zip container (no end of central directory)' };
  const count = bytes.readUInt16LE(end + 10);
  const size = bytes.readUInt32LE(end + 12);
  const start = bytes.readUInt32LE(end + 16);
  if (count === 0xffff || start === 0xffffffff || size === 0xffffffff) return { ok: false, reason: 'it is a ZIP64 container, which a workbook of this size never needs' };
  if (count > maxParts) return { ok: true, parts: [], count };
  if (start + size > end) return { ok: false, reason: 'its central directory lies outside the file' };
  const parts: ZipPart[] = [];
  let at = start;
  for (let i = 0; i < count; i++) {
    if (at + CENTRAL_SIZE > end || bytes.readUInt32LE(at) !== CENTRAL_SIGNATURE) return { ok: false, reason: `its central directory is damaged at entry ${i + 1}` };
    const flags = bytes.readUInt16LE(at + 8);
    const nameLength = bytes.readUInt16LE(at + 28);
    const skip = nameLength + bytes.readUInt16LE(at + 30) + bytes.readUInt16LE(at + 32);
    const name = bytes.toString('utf8', at + CENTRAL_SIZE, Math.min(at + CENTRAL_SIZE + nameLength, end));
    if (flags & 1) return { ok: false, reason: `the part ${name} is encrypted` };
    parts.push({ name, method: bytes.readUInt16LE(at + 10), packedSize: bytes.readUInt32LE(at + 20), statedSize: bytes.readUInt32LE(at + 24), offset: bytes.readUInt32LE(at + 42) });
    at += CENTRAL_SIZE + skip;
  }
  return { ok: true, parts, count };
}

// The end record sits in the last 22 bytes, or before a comment of up to 65,535 bytes.
function findEnd(bytes: Buffer): number {
  for (let at = bytes.length - END_SIZE; at >= Math.max(0, bytes.length - END_SIZE - 0xffff); at--) {
    if (bytes.readUInt32LE(at) === END_SIGNATURE && at + END_SIZE + bytes.readUInt16LE(at + 20) === bytes.length) return at;
  }
  return -1;
}

/**
 * A part unpacked, never to more than `max` bytes: undefined when it would
 * unpack to more (whatever the directory states); a string when it cannot
 * be unpacked at all (the reason).
 */
export function unpackPart(zip: Uint8Array, part: ZipPart, max: number): Buffer | undefined | string {
  const bytes = Buffer.from(zip.buffer, zip.byteOffset, zip.byteLength);
  const at = part.offset;
  if (at + LOCAL_SIZE > bytes.length || bytes.readUInt32LE(at) !== LOCAL_SIGNATURE) return `the part ${part.name} has no local header where the directory says`;
  const from = at + LOCAL_SIZE + bytes.readUInt16LE(at + 26) + bytes.readUInt16LE(at + 28);
  if (from + part.packedSize > bytes.length) return `the part ${part.name} runs past the end of the file`;
  const packed = bytes.subarray(from, from + part.packedSize);
  if (part.method === 0) return packed.length > max ? undefined : packed;
  if (part.method !== 8) return `the part ${part.name} is packed by method ${part.method}; a workbook's parts are stored or deflated`;
  try {
    // One byte more than allowed tells "exactly the limit" from "over it".
    const out = inflateRawSync(packed, { maxOutputLength: max + 1 });
    return out.length > max ? undefined : out;
  } catch (e) {
    if ((e as { code?: string }).code === 'ERR_BUFFER_TOO_LARGE') return undefined;
    return `the part ${part.name} cannot be unpacked (${(e as Error).message})`;
  }
}
