// A plain zip container written by hand, for workbooks the bad-input
// catalogue needs that no spreadsheet program would write: a sheet reaching
// the last row, a deflated run of zeros, a directory whose sizes lie.
import { crc32, deflateRawSync } from 'node:zlib';

export interface ZipEntry {
  name: string;
  /** The entry's content; or `deflated` with `size` and `crc` for content built elsewhere (a stream of zeros). */
  data?: string | Uint8Array;
  deflated?: Uint8Array;
  size?: number;
  crc?: number;
  /** The uncompressed size the headers state, when it should differ from the true one. */
  statedSize?: number;
}

/** The bytes of a zip holding the entries, each deflated. */
export function zipBytes(entries: readonly ZipEntry[]): Uint8Array {
  const locals: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const e of entries) {
    const raw = e.data === undefined ? undefined : typeof e.data === 'string' ? Buffer.from(e.data, 'utf8') : Buffer.from(e.data);
    const packed = e.deflated ?? deflateRawSync(raw!);
    const size = e.statedSize ?? e.size ?? raw!.length;
    const crc = e.crc ?? crc32(raw!);
    const name = Buffer.from(e.name, 'utf8');
    const local = Buffer.alloc(30);
    local.writeUInt32LE(0x04034b50, 0);
    local.writeUInt16LE(20, 4); // version needed
    local.writeUInt16LE(0x0800, 6); // names in UTF-8
    local.writeUInt16LE(8, 8); // deflate
    local.writeUInt32LE(crc >>> 0, 14);
    local.writeUInt32LE(packed.length, 18);
    local.writeUInt32LE(size, 22);
    local.writeUInt16LE(name.length, 26);
    locals.push(local, name, Buffer.from(packed));
    const central = Buffer.alloc(46);
    central.writeUInt32LE(0x02014b50, 0);
    central.writeUInt16LE(20, 4);
    central.writeUInt16LE(20, 6);
    central.writeUInt16LE(0x0800, 8);
    central.writeUInt16LE(8, 10);
    central.writeUInt32LE(crc >>> 0, 16);
    central.writeUInt32LE(packed.length, 20);
    central.writeUInt32LE(size, 24);
    central.writeUInt16LE(name.length, 28);
    central.writeUInt32LE(offset, 42);
    centrals.push(central, name);
    offset += local.length + name.length + packed.length;
  }
  const directory = Buffer.concat(centrals);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(entries.length, 8);
  end.writeUInt16LE(entries.length, 10);
  end.writeUInt32LE(directory.length, 12);
  end.writeUInt32LE(offset, 16);
  return new Uint8Array(Buffer.concat([...locals, directory, end]));
}

/**
 * A deflated run of `size` zero bytes, written as one fixed-code deflate
 * block (a literal zero, then copies of 258 bytes at distance 1), so that
 * a gigabyte costs a few megabytes and no time. Its CRC is left at 0: a
 * reader that refuses the size never gets as far as checking it.
 */
export function deflatedZeros(size: number): { deflated: Uint8Array; size: number; crc: number } {
  const out = new Uint8Array(Math.ceil((3 + 8 + Math.ceil(size / 258) * 13 + 258 * 8 + 7) / 8) + 1);
  let bit = 0;
  const put = (b: number) => {
    if (b) out[bit >> 3] |= 1 << (bit & 7);
    bit++;
  };
  // Huffman codes go most significant bit first; the block header least significant first.
  const code = (value: number, length: number) => {
    for (let i = length - 1; i >= 0; i--) put((value >> i) & 1);
  };
  put(1); // the last block
  put(1); // fixed codes (type 01, low bit first)
  put(0);
  const literalZero = () => code(0x30, 8);
  let left = size;
  if (left > 0) {
    literalZero();
    left--;
  }
  for (; left >= 258; left -= 258) {
    code(0xc5, 8); // length 258 (code 285, no extra bits)
    code(0, 5); // distance 1 (code 0)
  }
  for (; left > 0; left--) literalZero();
  code(0, 7); // end of block (code 256)
  return { deflated: out.subarray(0, Math.ceil(bit / 8)), size, crc: 0 };
}
