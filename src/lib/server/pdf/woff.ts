/**
 * WOFF 1.0 → SFNT (TrueType/OpenType) in memory (W3C, "WOFF File Format 1.0", 2012, §3–§5):
 * each table is zlib-inflated once with Node's zlib and laid out behind a standard offset table.
 * pdfkit reads WOFF itself, but it inflates the tables in JavaScript again for every document
 * (~0.5 s a PDF here); an SFNT made once at start-up avoids that.
 */
import { inflateSync } from 'node:zlib';

export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.toString('latin1', 0, 4) !== 'wOFF') throw new Error('not a WOFF 1.0 file');
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables = Array.from({ length: numTables }, (_, i) => {
    const at = 44 + i * 20;
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const raw = woff.subarray(offset, offset + compLength);
    return {
      tag: woff.subarray(at, at + 4),
      checksum: woff.readUInt32BE(at + 16),
      data: compLength < origLength ? inflateSync(raw) : raw
    };
  });
  const pow2 = 2 ** Math.floor(Math.log2(numTables));
  const header = Buffer.alloc(12 + 16 * numTables);
  header.writeUInt32BE(flavor, 0);
  header.writeUInt16BE(numTables, 4);
  header.writeUInt16BE(pow2 * 16, 6);
  header.writeUInt16BE(Math.log2(pow2), 8);
  header.writeUInt16BE(numTables * 16 - pow2 * 16, 10);
  const parts: Buffer[] = [header];
  let offset = header.length;
  tables.forEach((t, i) => {
    const rec = 12 + i * 16;
    t.tag.copy(header, rec);
    header.writeUInt32BE(t.checksum, rec + 4);
    header.writeUInt32BE(offset, rec + 8);
    header.writeUInt32BE(t.data.length, rec + 12);
    const padded = (t.data.length + 3) & ~3; // tables start on 4-byte boundaries
    parts.push(t.data, Buffer.alloc(padded - t.data.length));
    offset += padded;
  });
  return Buffer.concat(parts);
}
