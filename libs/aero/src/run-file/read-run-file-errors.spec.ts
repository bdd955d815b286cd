import { describe, expect, it } from 'vitest';
import { readRunFile } from './read-run-file';
import { RunFileError } from './run-file-error';
import { CANONICAL_HEADER, CANONICAL_ROW, canonicalFile, columnOf, issuesOf, readAll } from './run-file-fixture';

const CELLS = CANONICAL_ROW.split(', ');
/** Canonical row with cell `index` replaced, and the 1-based column where that cell starts. */
function rowWith(index: number, value: string): { row: string; column: number } {
  const cells = [...CELLS];
  cells[index] = value;
  const before = cells.slice(0, index).join(', ');
  return { row: cells.join(', '), column: index === 0 ? 1 : before.length + 3 };
}
const H = CANONICAL_HEADER.length;

describe('EMPTY_FILE', () => {
  it('reports a file of zero bytes', async () => expect(await issuesOf('')).toEqual([['EMPTY_FILE', 1, 1]]));
  it('reports a file of only a BOM and blank lines', async () =>
    expect(await issuesOf('\uFEFF\r\n\n  \n')).toEqual([['EMPTY_FILE', 1, 1]]));
});

describe('BINARY_FILE', () => {
  it('reports a NUL byte near the start with its line and column', async () =>
    expect(await issuesOf(`${CANONICAL_HEADER}\nab\0cd\n`)).toEqual([['BINARY_FILE', 2, 3]]));

  it('reports invalid UTF-8 in the header row', async () => {
    const bytes = Buffer.concat([Buffer.from('time [s], po'), Buffer.from([0xff]), Buffer.from('int\n')]);
    expect(await issuesOf(bytes)).toEqual([['BINARY_FILE', 1, 13]]);
  });

  it('reports invalid UTF-8 and NUL bytes in a data row far into the file', async () => {
    const filler = Array.from({ length: 200 }, () => CANONICAL_ROW);
    const { row, column } = rowWith(4, '85\u0000');
    // A binary byte is pointed at itself: the NUL is the third character of the cell.
    expect(await issuesOf(canonicalFile(...filler, row))).toEqual([['BINARY_FILE', 202, column + 2]]);
    const bad = Buffer.concat([Buffer.from(canonicalFile(...filler) + '0, 1, 0, 0, '), Buffer.from([0xc3, 0x28]), Buffer.from(', 1\n')]);
    expect(await issuesOf(bad)).toEqual([['BINARY_FILE', 202, 13]]);
  });
});

describe('NO_HEADER', () => {
  it('reports a file of only metadata and comments at its last line', async () =>
    expect(await issuesOf('# run: 1\n# nothing else\n\n')).toEqual([['NO_HEADER', 3, 1]]));
  it('reports a data row where the header row should be', async () =>
    expect(await issuesOf(`${CANONICAL_ROW}\n`)).toEqual([['NO_HEADER', 1, 1]]));
});

describe('header row errors', () => {
  it('DUPLICATE_COLUMN: the same channel twice, also through an alias', async () => {
    expect(await issuesOf(`${CANONICAL_HEADER}, fx [lbf]\n${CANONICAL_ROW}, 1\n`)).toEqual([['DUPLICATE_COLUMN', 1, H + 3]]);
    expect(await issuesOf(`${CANONICAL_HEADER}, q_dyn [Pa]\n`)).toEqual([['DUPLICATE_COLUMN', 1, H + 3]]);
  });

  it('UNKNOWN_COLUMN: a name that is no channel and not x_', async () =>
    expect(await issuesOf(`${CANONICAL_HEADER}, Fxx [N]\n`)).toEqual([['UNKNOWN_COLUMN', 1, H + 3]]));

  it('counts columns in characters, not bytes, and not the BOM', async () => {
    expect(await issuesOf(`x_ä, Fxx [N], ${CANONICAL_HEADER}\n`)).toEqual([['UNKNOWN_COLUMN', 1, 6]]);
    expect(await issuesOf(`\uFEFFFxx [N], ${CANONICAL_HEADER}\n`)).toEqual([['UNKNOWN_COLUMN', 1, 1]]);
  });

  it('UNKNOWN_UNIT: a unit not accepted for the channel', async () => {
    const header = CANONICAL_HEADER.replace('q [Pa]', 'q [Torr]');
    expect(await issuesOf(`${header}\n`)).toEqual([['UNKNOWN_UNIT', 1, columnOf(header, 'q [')]]);
    const force = CANONICAL_HEADER.replace('Fy [N]', 'Fy [Pa]');
    expect(await issuesOf(`${force}\n`)).toEqual([['UNKNOWN_UNIT', 1, columnOf(force, 'Fy')]]);
  });

  it('MISSING_UNIT: a channel written without its bracket', async () => {
    const header = CANONICAL_HEADER.replace('Fz [N]', 'Fz');
    expect(await issuesOf(`${header}\n`)).toEqual([['MISSING_UNIT', 1, columnOf(header, 'Fz')]]);
    const rh = CANONICAL_HEADER.replace('RH [%]', 'RH');
    expect(await issuesOf(`${rh}\n`)).toEqual([['MISSING_UNIT', 1, columnOf(rh, 'RH')]]);
  });

  it('MISSING_CHANNEL: no pressure, an incomplete load set, a missing RH', async () => {
    expect(await issuesOf(`${CANONICAL_HEADER.replace(', q [Pa]', '')}\n`)).toEqual([['MISSING_CHANNEL', 1, 1]]);
    const { issues } = await readAll(`${CANONICAL_HEADER.replace(', Mz [N m]', '')}\n`);
    expect(issues.map((i) => [i.code, i.line, i.column])).toEqual([['MISSING_CHANNEL', 1, 1]]);
    expect(issues[0].message).toContain('missing Mz');
    expect(await issuesOf(`${CANONICAL_HEADER.replace(', RH [%]', '')}\n`)).toEqual([['MISSING_CHANNEL', 1, 1]]);
  });

  it('CONFLICTING_CHANNELS: both q and dp_ref, or loads and bridges', async () => {
    expect(await issuesOf(`${CANONICAL_HEADER}, dp_ref [Pa]\n`)).toEqual([['CONFLICTING_CHANNELS', 1, H + 3]]);
    expect(await issuesOf(`${CANONICAL_HEADER}, R1 [mV/V]\n`)).toEqual([['CONFLICTING_CHANNELS', 1, H + 3]]);
  });

  it('INVALID_METADATA: a q_factor that is no positive number, a repeated key', async () => {
    expect(await issuesOf(`# q_factor: abc\n${canonicalFile(CANONICAL_ROW)}`)).toEqual([['INVALID_METADATA', 1, 1]]);
    expect(await issuesOf(`# q_factor: -1\n${canonicalFile(CANONICAL_ROW)}`)).toEqual([['INVALID_METADATA', 1, 1]]);
    expect(await issuesOf(`# run: 1\n  # run: 2\n${canonicalFile(CANONICAL_ROW)}`)).toEqual([['INVALID_METADATA', 2, 3]]);
  });
});

describe('data row errors', () => {
  it('RAGGED_ROW: too few fields points past the last one, too many at the first extra', async () => {
    const short = CELLS.slice(0, 13).join(', ');
    expect(await issuesOf(canonicalFile(CANONICAL_ROW, short))).toEqual([['RAGGED_ROW', 3, short.length + 1]]);
    expect(await issuesOf(canonicalFile(`${CANONICAL_ROW}, 7, 8`))).toEqual([['RAGGED_ROW', 2, CANONICAL_ROW.length + 3]]);
  });

  it('RAGGED_ROW: a decimal comma in a comma-separated file adds fields', async () => {
    const { row } = rowWith(4, '850,2');
    const { issues } = await readAll(canonicalFile(row));
    expect(issues[0].code).toBe('RAGGED_ROW');
    expect(issues[0].message).toContain('decimal comma');
  });

  it.each([
    ['NaN', 4],
    ['abc', 8],
    ['Inf', 0],
    ['1e400', 9],
    ['1.2.3', 5],
    ['12 5', 10],
    ['0x1A', 11],
    ['"850.2"', 4],
    ['--1', 12],
  ])('NOT_A_NUMBER: "%s" in cell %i', async (text, index) => {
    const { row, column } = rowWith(index, text);
    expect(await issuesOf(canonicalFile(CANONICAL_ROW, row))).toEqual([['NOT_A_NUMBER', 3, column]]);
  });

  it('NOT_A_NUMBER: an empty cell, pointing where the cell is', async () => {
    const row = CELLS.slice(0, 4).join(', ') + ',, ' + CELLS.slice(5).join(', ');
    expect(await issuesOf(canonicalFile(row))).toEqual([['NOT_A_NUMBER', 2, columnOf(row, ',,') + 1]]);
    const last = CELLS.slice(0, 13).join(', ') + ', ';
    expect(await issuesOf(canonicalFile(last))).toEqual([['NOT_A_NUMBER', 2, last.length + 1]]);
  });

  it('DECIMAL_COMMA: rejected clearly in a semicolon file', async () => {
    const semi = (line: string) => line.replaceAll(', ', ';');
    const row = semi(rowWith(4, '850,2').row);
    const { issues } = await readAll(`${semi(CANONICAL_HEADER)}\n${row}\n`);
    expect(issues.map((i) => [i.code, i.line, i.column])).toEqual([['DECIMAL_COMMA', 2, columnOf(row, '850,2')]]);
    expect(issues[0].message).toContain('import profile');
  });

  it.each([
    ['barometric pressure below 30 kPa', 5, '250'],
    ['barometric pressure above 120 kPa', 5, '1250'],
    ['temperature below -40 degC', 6, '-40.5'],
    ['temperature above 80 degC', 6, '95'],
    ['RH above 100 %', 7, '100.1'],
    ['RH below 0 %', 7, '-1'],
    ['negative q', 4, '-0.5'],
    ['non-integer point', 1, '1.5'],
    ['negative point', 1, '-1'],
    ['pitch beyond 360 deg', 3, '361'],
    ['yaw beyond -360 deg', 2, '-400'],
  ])('OUT_OF_RANGE: %s', async (_what, index, text) => {
    const { row, column } = rowWith(index, text);
    expect(await issuesOf(canonicalFile(row))).toEqual([['OUT_OF_RANGE', 2, column]]);
  });

  it('accepts the range edges: -40 and 80 degC, 0 and 100 %, 30 and 120 kPa, ±360 deg', async () => {
    const rows = [rowWith(6, '-40').row, rowWith(6, '80').row, rowWith(7, '0').row, rowWith(7, '100').row,
      rowWith(5, '300').row, rowWith(5, '1200').row, rowWith(3, '360').row, rowWith(2, '-360').row];
    const { samples, issues } = await readAll(canonicalFile(...rows));
    expect(issues).toEqual([]);
    expect(samples).toHaveLength(8);
  });

  it('reports issues of several rows in line order, one per row', async () => {
    const a = rowWith(4, 'x');
    const b = rowWith(7, '200');
    expect(await issuesOf(canonicalFile(a.row, CANONICAL_ROW, b.row))).toEqual([
      ['NOT_A_NUMBER', 2, a.column],
      ['OUT_OF_RANGE', 4, b.column],
    ]);
  });
});

describe('LINE_TOO_LONG', () => {
  it('reports a data line over 64 KiB at column 65537', async () => {
    const huge = `1, ${'2'.repeat(70_000)}`;
    expect(await issuesOf(canonicalFile(huge))).toEqual([['LINE_TOO_LONG', 2, 65_537]]);
    expect(await issuesOf(canonicalFile(huge), 65_536)).toEqual([['LINE_TOO_LONG', 2, 65_537]]);
    expect(await issuesOf(canonicalFile(huge), 1000)).toEqual([['LINE_TOO_LONG', 2, 65_537]]);
  });

  it('accepts a line of exactly 65,536 bytes', async () => {
    const row = `${CANONICAL_ROW}, `;
    const padded = row + 'n'.repeat(65_536 - row.length);
    const { samples, issues } = await readAll(`${CANONICAL_HEADER}, x_note\n${padded}\n`, 4096);
    expect(issues).toEqual([]);
    expect(samples).toHaveLength(1);
  });

  it('stops without buffering an endless line', async () => {
    let yielded = 0;
    async function* endless() {
      for (;;) {
        yielded++;
        yield Buffer.alloc(65_536, 0x41);
      }
    }
    const reading = readRunFile(endless(), { fileName: 'huge.csv', onSample: () => {} });
    await expect(reading).rejects.toBeInstanceOf(RunFileError);
    await reading.catch((error: RunFileError) => expect(error.issues[0].code).toBe('LINE_TOO_LONG'));
    expect(yielded).toBeLessThanOrEqual(3);
  });
});

describe('NO_SAMPLES and TRUNCATED', () => {
  it('NO_SAMPLES: a header row and nothing else, reported at the header line', async () => {
    expect(await issuesOf(`# run: 1\n${CANONICAL_HEADER}\n# no rows\n\n`)).toEqual([['NO_SAMPLES', 2, 1]]);
    expect(await issuesOf(CANONICAL_HEADER)).toEqual([['NO_SAMPLES', 1, 1]]);
  });

  it('TRUNCATED: a last line with too few fields and no line ending', async () => {
    const cut = CANONICAL_ROW.slice(0, 30);
    const { issues } = await readAll(canonicalFile(CANONICAL_ROW) + cut);
    expect(issues.map((i) => [i.code, i.line, i.column])).toEqual([['TRUNCATED', 3, 31]]);
    expect(issues[0].message).toContain('6 of 14 fields');
  });

  it('RAGGED_ROW, not TRUNCATED, when the short last line has its line ending', async () => {
    const cut = CANONICAL_ROW.slice(0, 30);
    expect(await issuesOf(canonicalFile(CANONICAL_ROW, cut))).toEqual([['RAGGED_ROW', 3, 31]]);
  });
});
