import { describe, expect, it } from 'vitest';
import { previewRunFile } from './preview-run-file';
import { CANONICAL_HEADER, CANONICAL_ROW, canonicalFile, chunksOf } from './run-file-fixture';

describe('previewRunFile', () => {
  it('returns the header and the first rows as cells', async () => {
    const rows = Array.from({ length: 30 }, (_, i) => CANONICAL_ROW.replace('0.000', (i * 0.002).toFixed(3)));
    const preview = await previewRunFile(`# run: 4\n${canonicalFile(...rows)}`, { fileName: 'run-4.csv', rows: 5 });
    expect(preview.issues).toEqual([]);
    expect(preview.header?.metadata).toEqual({ run: '4' });
    expect(preview.header?.columns.map((c) => c.unit).slice(0, 8)).toEqual(['s', '', 'deg', 'deg', 'Pa', 'hPa', 'degC', '%']);
    expect(preview.rows).toHaveLength(5);
    expect(preview.rows[4][0]).toBe('0.008');
    expect(preview.rows[0]).toHaveLength(14);
  });

  it('stops reading early on a long stream', async () => {
    let yielded = 0;
    async function* many() {
      yield Buffer.from(`${CANONICAL_HEADER}\n`);
      for (let i = 0; i < 10_000; i++) {
        yielded++;
        yield Buffer.from(`${CANONICAL_ROW}\n`);
      }
    }
    const preview = await previewRunFile(many(), { fileName: 'long.csv', rows: 3 });
    expect(preview.rows).toHaveLength(3);
    expect(yielded).toBe(3);
  });

  it('does not report TRUNCATED or NO_SAMPLES for a file it did not read to the end', async () => {
    const file = Buffer.from(canonicalFile(...Array.from({ length: 2000 }, () => CANONICAL_ROW)) + CANONICAL_ROW.slice(0, 20));
    const preview = await previewRunFile(chunksOf(file, 4096), { fileName: 'cut.csv', rows: 10 });
    expect(preview.issues).toEqual([]);
  });

  it('reports issues of the rows shown instead of throwing', async () => {
    const bad = CANONICAL_ROW.replace('850.2', 'n/a');
    const preview = await previewRunFile(canonicalFile(CANONICAL_ROW, bad), { fileName: 'bad.csv' });
    expect(preview.header).toBeDefined();
    expect(preview.rows[1][4]).toBe('n/a');
    expect(preview.issues.map((i) => [i.code, i.line])).toEqual([['NOT_A_NUMBER', 3]]);
  });

  it('returns header issues and the raw rows when the header is unusable', async () => {
    const header = CANONICAL_HEADER.replace('q [Pa]', 'q [Torr]');
    const preview = await previewRunFile(`${header}\n${CANONICAL_ROW}\n`, { fileName: 'unit.csv' });
    expect(preview.header).toBeUndefined();
    expect(preview.issues.map((i) => i.code)).toEqual(['UNKNOWN_UNIT']);
    expect(preview.rows[0][0]).toBe('time [s]');
  });

  it('reports an empty file', async () => {
    const preview = await previewRunFile('', { fileName: 'empty.csv' });
    expect(preview).toEqual({ header: undefined, rows: [], issues: [expect.objectContaining({ code: 'EMPTY_FILE', line: 1, column: 1 })] });
  });

  it('rejects a row count that is not a positive integer', async () => {
    await expect(previewRunFile('', { fileName: 'x.csv', rows: 0 })).rejects.toThrow(RangeError);
  });
});
