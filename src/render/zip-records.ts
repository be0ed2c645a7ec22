// The zip format's record signatures and the end record, shared by the
// workbook writers that rewrite an archive (steady-bytes.ts, zip-deflate.ts).

export const LOCAL_ENTRY = 0x04034b50;
export const CENTRAL_ENTRY = 0x02014b50;
export const END_OF_DIRECTORY = 0x06054b50;
/** The end record is 22 bytes and may be followed by a comment of up to 65535. */
export const END_RECORD_SIZE = 22;

/** Where the end-of-directory record starts, searched back from the end past any comment. */
export function endRecordAt(view: DataView): number {
  const last = view.byteLength - END_RECORD_SIZE;
  for (let at = last; at >= Math.max(0, last - 0xffff); at--) {
    if (view.getUint32(at, true) === END_OF_DIRECTORY) return at;
  }
  throw new Error('not a zip archive: no end-of-directory record');
}
