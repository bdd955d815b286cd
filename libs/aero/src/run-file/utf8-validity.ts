/**
 * Finds the first byte that is not part of a well-formed UTF-8 sequence (RFC 3629: no overlongs,
 * no surrogates, nothing above U+10FFFF), or a NUL byte, which no text run file contains.
 * @param bytes buffer to check
 * @param start first byte (inclusive)
 * @param end last byte (exclusive)
 * @returns offset of the first bad byte, or -1 when the range is clean UTF-8 text
 */
export function findInvalidUtf8(bytes: Uint8Array, start: number, end: number): number {
  let i = start;
  while (i < end) {
    const b = bytes[i];
    if (b === 0) return i;
    if (b < 0x80) {
      i++;
      continue;
    }
    let need: number;
    let min: number;
    if (b >= 0xc2 && b <= 0xdf) {
      need = 1;
      min = 0x80;
    } else if (b >= 0xe0 && b <= 0xef) {
      need = 2;
      min = 0x800;
    } else if (b >= 0xf0 && b <= 0xf4) {
      need = 3;
      min = 0x10000;
    } else return i;
    if (i + need >= end) return i;
    let cp = b & (0x3f >> need);
    for (let k = 1; k <= need; k++) {
      const c = bytes[i + k];
      if ((c & 0xc0) !== 0x80) return i;
      cp = (cp << 6) | (c & 0x3f);
    }
    if (cp < min || cp > 0x10ffff || (cp >= 0xd800 && cp <= 0xdfff)) return i;
    i += need + 1;
  }
  return -1;
}

/**
 * Counts characters (code points) in a UTF-8 byte range, for 1-based columns in messages.
 * @param bytes buffer
 * @param start first byte (inclusive)
 * @param end last byte (exclusive)
 */
export function countUtf8Characters(bytes: Uint8Array, start: number, end: number): number {
  let count = 0;
  for (let i = start; i < end; i++) if ((bytes[i] & 0xc0) !== 0x80) count++;
  return count;
}
