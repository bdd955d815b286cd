import { describe, expect, it } from 'vitest';
import { countUtf8Characters, findInvalidUtf8 } from './utf8-validity';

const bytes = (...b: number[]) => Uint8Array.from(b);

// Well-formed and ill-formed sequences as defined by RFC 3629 sec. 3 and 4 (UTF-8 syntax).
describe('findInvalidUtf8', () => {
  it('accepts ASCII, two-, three- and four-byte characters', () => {
    const text = Buffer.from('a ä € 𝄞');
    expect(findInvalidUtf8(text, 0, text.length)).toBe(-1);
  });
  it('rejects an overlong form (C0 80 for U+0000)', () => expect(findInvalidUtf8(bytes(0x41, 0xc0, 0x80), 0, 3)).toBe(1));
  it('rejects an overlong three-byte form (E0 80 AF)', () => expect(findInvalidUtf8(bytes(0xe0, 0x80, 0xaf), 0, 3)).toBe(0));
  it('rejects a UTF-16 surrogate (ED A0 80 = U+D800)', () => expect(findInvalidUtf8(bytes(0xed, 0xa0, 0x80), 0, 3)).toBe(0));
  it('rejects code points above U+10FFFF (F4 90 80 80)', () => expect(findInvalidUtf8(bytes(0xf4, 0x90, 0x80, 0x80), 0, 4)).toBe(0));
  it('rejects a sequence cut by the end of the range', () => expect(findInvalidUtf8(bytes(0x61, 0xe2, 0x82), 0, 3)).toBe(1));
  it('rejects a lone continuation byte', () => expect(findInvalidUtf8(bytes(0x61, 0x80), 0, 2)).toBe(1));
  it('rejects NUL, which no text run file contains', () => expect(findInvalidUtf8(bytes(0x61, 0x00), 0, 2)).toBe(1));
  it('checks only the given range', () => expect(findInvalidUtf8(bytes(0xff, 0x61, 0xff), 1, 2)).toBe(-1));
});

describe('countUtf8Characters', () => {
  it('counts code points, not bytes', () => {
    const text = Buffer.from('xä€𝄞');
    expect(text.length).toBe(10);
    expect(countUtf8Characters(text, 0, text.length)).toBe(4);
  });
  it('counts zero in an empty range', () => expect(countUtf8Characters(bytes(0x61), 0, 0)).toBe(0));
});
