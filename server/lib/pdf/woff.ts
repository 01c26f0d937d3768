/**
 * WOFF 1.0 to a plain sfnt (TrueType/OpenType) font, once, with Node's native zlib. fontkit reads
 * WOFF itself but inflates a table in JavaScript on every access, which made one offer take
 * seconds; the unwrapped font renders in milliseconds. Format: W3C, "WOFF File Format 1.0", 2012.
 */
import { inflateSync } from 'node:zlib';

const WOFF_SIGNATURE = 0x774f4646; // 'wOFF'
const WOFF_HEADER = 44;
const WOFF_ENTRY = 20;
const SFNT_HEADER = 12;
const SFNT_ENTRY = 16;

const pad4 = (n: number) => (n + 3) & ~3;

/** The sfnt inside a WOFF file; a buffer that is not WOFF is returned unchanged. */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.length < WOFF_HEADER || woff.readUInt32BE(0) !== WOFF_SIGNATURE) return woff;
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables = Array.from({ length: numTables }, (_, i) => {
    const at = WOFF_HEADER + i * WOFF_ENTRY;
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const stored = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(stored) : stored;
    if (data.length !== origLength) throw new Error('Corrupt WOFF table: inflated size differs from the directory.');
    return { tag: woff.readUInt32BE(at), checksum: woff.readUInt32BE(at + 16), data };
  });
  let size = SFNT_HEADER + numTables * SFNT_ENTRY;
  for (const t of tables) size += pad4(t.data.length);
  const out = Buffer.alloc(size);
  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(numTables * 16 - searchRange, 10);
  let dataAt = SFNT_HEADER + numTables * SFNT_ENTRY;
  tables.forEach((t, i) => {
    const at = SFNT_HEADER + i * SFNT_ENTRY;
    out.writeUInt32BE(t.tag, at);
    out.writeUInt32BE(t.checksum, at + 4);
    out.writeUInt32BE(dataAt, at + 8);
    out.writeUInt32BE(t.data.length, at + 12);
    t.data.copy(out, dataAt);
    dataAt += pad4(t.data.length);
  });
  return out;
}
