// A zip archive of stored (uncompressed) entries, written again with each
// entry deflated by a raw-deflate function the caller gives. The workbook
// library compresses with a deflate written in JavaScript, most of a
// workbook's writing time in a fresh process; a command run by Node hands in
// Node's own zlib (src/node/native-deflate.ts), and the page in the browser
// keeps the library's. Names, flags, CRCs and dates are carried over; the
// archive is rebuilt in the order of its central directory, without data
// descriptors (the sizes are known), as a plain zip of 16-bit counts.

import { CENTRAL_ENTRY, END_OF_DIRECTORY, END_RECORD_SIZE, LOCAL_ENTRY, endRecordAt } from './zip-records.ts';

/** Raw deflate (RFC 1951, no zlib or gzip wrapper). */
export type DeflateRaw = (data: Uint8Array) => Uint8Array;

const STORED = 0;
const DEFLATED = 8;
/** General-purpose flag bit 3: sizes and CRC follow the data in a descriptor. */
const DESCRIPTOR_FLAG = 0x0008;
/** The zip version a reader needs for a deflated entry (2.0). */
const DEFLATE_VERSION = 20;

interface Entry {
  /** The central directory record, copied and patched. */
  central: Uint8Array;
  /** The local header up to and including its extra field, copied and patched. */
  local: Uint8Array;
  data: Uint8Array;
}

/** Every entry of an archive of stored entries, each deflated with `deflateRaw`; an entry already compressed is refused. */
export function deflateStoredZip(bytes: Uint8Array, deflateRaw: DeflateRaw): Uint8Array {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const end = endRecordAt(view);
  const count = view.getUint16(end + 10, true);
  const entries: Entry[] = [];
  let at = view.getUint32(end + 16, true);
  for (let i = 0; i < count; i++) {
    if (view.getUint32(at, true) !== CENTRAL_ENTRY) throw new Error(`not a zip archive: no directory entry at byte ${at}`);
    const centralLength = 46 + view.getUint16(at + 28, true) + view.getUint16(at + 30, true) + view.getUint16(at + 32, true);
    const method = view.getUint16(at + 10, true);
    if (method !== STORED) throw new Error(`zip entry ${i + 1} is not stored (method ${method}): only stored entries are deflated here`);
    const size = view.getUint32(at + 20, true);
    const offset = view.getUint32(at + 42, true);
    if (view.getUint32(offset, true) !== LOCAL_ENTRY) throw new Error(`not a zip archive: no entry header at byte ${offset}`);
    const localLength = 30 + view.getUint16(offset + 26, true) + view.getUint16(offset + 28, true);
    const data = deflateRaw(bytes.subarray(offset + localLength, offset + localLength + size));
    entries.push({ central: bytes.slice(at, at + centralLength), local: bytes.slice(offset, offset + localLength), data });
    at += centralLength;
  }
  const total = entries.reduce((n, e) => n + e.local.length + e.data.length + e.central.length, 0) + END_RECORD_SIZE;
  const out = new Uint8Array(total);
  const o = new DataView(out.buffer);
  let put = 0;
  const offsets: number[] = [];
  for (const e of entries) {
    offsets.push(put);
    out.set(e.local, put);
    o.setUint16(put + 6, o.getUint16(put + 6, true) & ~DESCRIPTOR_FLAG, true);
    o.setUint16(put + 8, DEFLATED, true);
    o.setUint16(put + 4, Math.max(o.getUint16(put + 4, true), DEFLATE_VERSION), true);
    // The CRC and the plain size, from the directory (a local header with a descriptor holds zeros there).
    const c = new DataView(e.central.buffer, e.central.byteOffset, e.central.byteLength);
    o.setUint32(put + 14, c.getUint32(16, true), true);
    o.setUint32(put + 18, e.data.length, true);
    o.setUint32(put + 22, c.getUint32(24, true), true);
    put += e.local.length;
    out.set(e.data, put);
    put += e.data.length;
  }
  const directory = put;
  entries.forEach((e, i) => {
    out.set(e.central, put);
    o.setUint16(put + 8, o.getUint16(put + 8, true) & ~DESCRIPTOR_FLAG, true);
    o.setUint16(put + 10, DEFLATED, true);
    o.setUint16(put + 6, Math.max(o.getUint16(put + 6, true), DEFLATE_VERSION), true);
    o.setUint32(put + 20, e.data.length, true);
    o.setUint32(put + 42, offsets[i], true);
    put += e.central.length;
  });
  o.setUint32(put, END_OF_DIRECTORY, true);
  o.setUint16(put + 8, entries.length, true);
  o.setUint16(put + 10, entries.length, true);
  o.setUint32(put + 12, put - directory, true);
  o.setUint32(put + 16, directory, true);
  return out;
}
