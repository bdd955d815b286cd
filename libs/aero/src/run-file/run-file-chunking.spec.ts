import { describe, expect, it } from 'vitest';
import { CANONICAL_HEADER, CANONICAL_ROW, readAll } from './run-file-fixture';

// One file with every feature that a chunk boundary could split: BOM, metadata, CRLF, exponents,
// long mantissas, multi-byte characters in an extra column, comments and blank lines, > 8 KiB.
const rows = Array.from({ length: 300 }, (_, i) => {
  const fx = i % 3 === 0 ? `${(1.25 + i).toFixed(3)}e-1` : (12.5 + i / 7).toString();
  return `${(i * 0.002).toFixed(3)}, ${1 + Math.floor(i / 10)}, -1.5, ${(i % 21) - 10}, 850.${i}, 1013.25, 20.5, 45, ${fx}, -0.3, 150.2, 0.01, -2.5, 0.03, Prüfstand µ ${i}`;
});
const GOOD = `\uFEFF# run: 77\r\n# tunnel: Hall B (invented)\r\n${CANONICAL_HEADER}, x_note\r\n${rows.slice(0, 150).join('\r\n')}\r\n# half-way\r\n\r\n${rows.slice(150).join('\r\n')}\r\n`;

const BAD_ROWS = [...rows];
BAD_ROWS[40] = BAD_ROWS[40].replace('850.40', '850,40');
BAD_ROWS[120] = BAD_ROWS[120].replace('1013.25', '20');
BAD_ROWS[200] = BAD_ROWS[200].replace(' 45,', ' abc,');
const BAD = `${CANONICAL_HEADER}, x_note\n${BAD_ROWS.join('\n')}\n${CANONICAL_ROW.slice(0, 25)}`;

describe('chunk boundaries', () => {
  it('gives identical samples and summary for 1-byte, 7-byte, 64 KiB and whole-file chunks', async () => {
    const whole = await readAll(GOOD);
    expect(whole.issues).toEqual([]);
    expect(whole.samples).toHaveLength(300);
    for (const size of [1, 7, 65_536]) {
      const chunked = await readAll(GOOD, size);
      expect(chunked.issues).toEqual([]);
      expect(chunked.samples).toEqual(whole.samples);
      expect(chunked.summary).toEqual(whole.summary);
    }
  });

  it('gives identical issues for every chunk size', async () => {
    const whole = await readAll(BAD);
    expect(whole.issues.map((i) => [i.code, i.line])).toEqual([
      ['RAGGED_ROW', 42],
      ['OUT_OF_RANGE', 122],
      ['NOT_A_NUMBER', 202],
      ['TRUNCATED', 302],
    ]);
    for (const size of [1, 7, 65_536]) expect((await readAll(BAD, size)).issues).toEqual(whole.issues);
  });

  it('finds a binary byte past the first 8 KiB at every chunk size', async () => {
    const bytes = Buffer.from(GOOD.replace('850.250', '850.2\u00000'));
    const whole = await readAll(bytes);
    expect(whole.issues.map((i) => i.code)).toEqual(['BINARY_FILE']);
    for (const size of [1, 7, 65_536]) expect((await readAll(bytes, size)).issues).toEqual(whole.issues);
  });
});
