import zlib from "node:zlib";

/**
 * Hand-built ZIP archives for the upload tests, including "bombs": an entry of `zeros` bytes
 * is written as one raw-deflate block of 1 MiB of zeros (a sync flush, so it ends on a byte
 * boundary) repeated, plus the empty final block — a few hundred kB that inflate to hundreds
 * of MB, built in milliseconds. `declaredSize` lets an entry lie about its size in both the
 * local header and the central directory. Layout per the PKWARE APPNOTE (section 4.3).
 */
export interface ZipEntrySpec {
  name: string;
  data?: Buffer;
  /** Inflates to this many zero bytes (a multiple of 1 MiB). */
  zeros?: number;
  /** Uncompressed size to declare instead of the true one. */
  declaredSize?: number;
}

const MIB = 1 << 20;
const EMPTY_FINAL_BLOCK = Buffer.from([0x03, 0x00]);

function zeroBlocks(bytes: number): { compressed: Buffer; crc: number } {
  if (bytes % MIB !== 0) throw new Error("zeros must be a multiple of 1 MiB");
  const chunk = Buffer.alloc(MIB);
  const block = zlib.deflateRawSync(chunk, { finishFlush: zlib.constants.Z_SYNC_FLUSH });
  const count = bytes / MIB;
  let crc = 0;
  for (let i = 0; i < count; i++) crc = zlib.crc32(chunk, crc);
  return { compressed: Buffer.concat([...Array<Buffer>(count).fill(block), EMPTY_FINAL_BLOCK]), crc };
}

export function buildZip(entries: ZipEntrySpec[]): Buffer {
  const locals: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const entry of entries) {
    const name = Buffer.from(entry.name, "utf8");
    const { compressed, crc, size } = entry.zeros !== undefined
      ? { ...zeroBlocks(entry.zeros), size: entry.zeros }
      : { compressed: zlib.deflateRawSync(entry.data ?? Buffer.alloc(0)), crc: zlib.crc32(entry.data ?? Buffer.alloc(0)), size: (entry.data ?? Buffer.alloc(0)).length };
    const declared = entry.declaredSize ?? size;
    const local = Buffer.alloc(30);
    local.writeUInt32LE(0x04034b50, 0);
    local.writeUInt16LE(20, 4); // version needed
    local.writeUInt16LE(0x0800, 6); // UTF-8 names
    local.writeUInt16LE(8, 8); // deflate
    local.writeUInt32LE(crc >>> 0, 14);
    local.writeUInt32LE(compressed.length, 18);
    local.writeUInt32LE(declared, 22);
    local.writeUInt16LE(name.length, 26);
    locals.push(local, name, compressed);
    const central = Buffer.alloc(46);
    central.writeUInt32LE(0x02014b50, 0);
    central.writeUInt16LE(20, 4);
    central.writeUInt16LE(20, 6);
    central.writeUInt16LE(0x0800, 8);
    central.writeUInt16LE(8, 10);
    central.writeUInt32LE(crc >>> 0, 16);
    central.writeUInt32LE(compressed.length, 20);
    central.writeUInt32LE(declared, 24);
    central.writeUInt16LE(name.length, 28);
    central.writeUInt32LE(offset, 42);
    centrals.push(central, name);
    offset += 30 + name.length + compressed.length;
  }
  const directory = Buffer.concat(centrals);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(entries.length, 8);
  end.writeUInt16LE(entries.length, 10);
  end.writeUInt32LE(directory.length, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...locals, directory, end]);
}
