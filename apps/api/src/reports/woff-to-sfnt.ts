import { inflateSync } from 'node:zlib';

/**
 * Unpacks a WOFF 1.0 font into the plain TrueType/OpenType (sfnt) bytes it wraps, using Node's zlib. pdfkit's font
 * reader would otherwise inflate every table in JavaScript on each document.
 */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.toString('ascii', 0, 4) !== 'wOFF') throw new Error('Not a WOFF 1.0 font');
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables: { tag: Buffer; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < numTables; i++) {
    const entry = 44 + i * 20;
    const offset = woff.readUInt32BE(entry + 4);
    const compLength = woff.readUInt32BE(entry + 8);
    const origLength = woff.readUInt32BE(entry + 12);
    const stored = woff.subarray(offset, offset + compLength);
    tables.push({ tag: woff.subarray(entry, entry + 4), checksum: woff.readUInt32BE(entry + 16), data: compLength < origLength ? inflateSync(stored) : stored });
  }
  let searchRange = 1;
  let entrySelector = 0;
  while (searchRange * 2 <= numTables) {
    searchRange *= 2;
    entrySelector++;
  }
  const header = Buffer.alloc(12 + 16 * numTables);
  header.writeUInt32BE(flavor, 0);
  header.writeUInt16BE(numTables, 4);
  header.writeUInt16BE(searchRange * 16, 6);
  header.writeUInt16BE(entrySelector, 8);
  header.writeUInt16BE(numTables * 16 - searchRange * 16, 10);
  const parts: Buffer[] = [header];
  let offset = header.length;
  tables.forEach((t, i) => {
    const record = 12 + i * 16;
    t.tag.copy(header, record);
    header.writeUInt32BE(t.checksum, record + 4);
    header.writeUInt32BE(offset, record + 8);
    header.writeUInt32BE(t.data.length, record + 12);
    const padding = (4 - (t.data.length % 4)) % 4;
    parts.push(t.data, Buffer.alloc(padding));
    offset += t.data.length + padding;
  });
  return Buffer.concat(parts);
}
