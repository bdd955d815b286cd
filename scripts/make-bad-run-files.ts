/**
 * Writes a corpus of awkward and broken run files, each with what the server must say about it.
 *   node --import tsx scripts/make-bad-run-files.ts [folder]   # default: a new folder under the OS temp dir
 * Used by the ingest integration tests; every value is invented.
 */
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** What the server must answer for one file. */
export type BadFileExpectation =
  /** Stored and reduced, with these warning codes (maybe none). */
  | { outcome: 'reduced'; warnings: string[] }
  /** Stored, and the reduction fails with this code at this line and column. */
  | { outcome: 'failed'; code: string; line: number; column: number }
  /** Refused at upload with this HTTP status; nothing stored. */
  | { outcome: 'refused'; status: number };

/** One file of the corpus. */
export interface BadRunFile {
  name: string;
  bytes: Buffer;
  expect: BadFileExpectation;
}

export const HEADER = 'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]';
const CELLS = ['0.000', '1', '0.0', '2.5', '850.2', '1013.25', '20.5', '45', '12.5', '-0.3', '150.2', '0.01', '-2.5', '0.03'];
export const ROW = CELLS.join(', ');

/** A data row of point `point` at time `time`, with small invented variations. */
export function dataRow(point: number, time: number): string {
  const cells = [...CELLS];
  cells[0] = time.toFixed(3);
  cells[1] = String(point);
  cells[2] = ((point - 1) * 2).toFixed(1);
  cells[4] = (850 + (time % 7) * 0.1).toFixed(2);
  cells[8] = (12.5 + (time % 5) * 0.01).toFixed(3);
  return cells.join(', ');
}

/** A valid body: `points` points of `samples` rows each. */
export function validRows(points = 3, samples = 4): string[] {
  const rows: string[] = [];
  for (let p = 1; p <= points; p++) for (let s = 0; s < samples; s++) rows.push(dataRow(p, (p - 1) * samples + s));
  return rows;
}

/** The row with cell `index` replaced, and the 1-based column where that cell starts. */
function rowWith(index: number, value: string): { row: string; column: number } {
  const cells = [...CELLS];
  cells[index] = value;
  return { row: cells.join(', '), column: index === 0 ? 1 : cells.slice(0, index).join(', ').length + 3 };
}

const text = (...lines: string[]) => Buffer.from(lines.join('\n') + '\n', 'utf8');
const failed = (code: string, line: number, column: number): BadFileExpectation => ({ outcome: 'failed', code, line, column });
/** 1-based column where `needle` starts in `line`. */
const columnOf = (line: string, needle: string) => line.indexOf(needle) + 1;

/** Builds the corpus; `limitBytes` is the upload limit the server under test uses (for the over-limit file). */
export function badRunFiles(limitBytes: number): BadRunFile[] {
  const files: BadRunFile[] = [];
  const add = (name: string, bytes: Buffer, expect: BadFileExpectation) => files.push({ name, bytes, expect });
  const body = validRows();
  const H = HEADER.length;

  add('empty.csv', Buffer.alloc(0), failed('EMPTY_FILE', 1, 1));
  add('bom-and-blank-lines.csv', Buffer.from('\uFEFF\r\n\n  \n', 'utf8'), failed('EMPTY_FILE', 1, 1));
  add('nul-in-row.csv', text(HEADER, ROW, 'ab\0cd'), failed('BINARY_FILE', 3, 3));
  add('invalid-utf8-header.bin', Buffer.concat([Buffer.from('time [s], po'), Buffer.from([0xff]), Buffer.from('int\n')]), failed('BINARY_FILE', 1, 13));
  add('truncated.csv', Buffer.from(`${HEADER}\n${ROW}\n${ROW.slice(0, 30)}`, 'utf8'), failed('TRUNCATED', 3, 31));
  add('bom.csv', Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), text(HEADER, ...body)]), { outcome: 'reduced', warnings: [] });
  add('crlf.csv', Buffer.from([HEADER, ...body].join('\r\n') + '\r\n', 'utf8'), { outcome: 'reduced', warnings: [] });
  add('bom-crlf-metadata.csv', Buffer.from('\uFEFF# run: 12\r\n# operator: demo\r\n' + [HEADER, ...body].join('\r\n') + '\r\n', 'utf8'), { outcome: 'reduced', warnings: [] });
  add('one-sample-point.csv', text(HEADER, ...body, dataRow(9, 99)), { outcome: 'reduced', warnings: ['FEW_SAMPLES'] });
  add('duplicate-column.csv', text(`${HEADER}, fx [lbf]`, `${ROW}, 1`), failed('DUPLICATE_COLUMN', 1, H + 3));
  add('duplicate-column-alias.csv', text(`${HEADER}, q_dyn [Pa]`, `${ROW}, 1`), failed('DUPLICATE_COLUMN', 1, H + 3));
  add('header-row-twice.csv', text(HEADER, HEADER, ...body), failed('NOT_A_NUMBER', 2, 1));
  add('missing-mz-column.csv', text(HEADER.replace(', Mz [N m]', ''), ...body.map((r) => r.slice(0, r.lastIndexOf(',')))), failed('MISSING_CHANNEL', 1, 1));
  add('missing-pressure-column.csv', text(HEADER.replace(', q [Pa]', '')), failed('MISSING_CHANNEL', 1, 1));
  add('extra-cells.csv', text(HEADER, `${ROW}, 7, 8`), failed('RAGGED_ROW', 2, ROW.length + 3));
  const short = CELLS.slice(0, 13).join(', ');
  add('missing-cell.csv', text(HEADER, ROW, short), failed('RAGGED_ROW', 3, short.length + 1));
  add('unknown-column.csv', text(`${HEADER}, Fxx [N]`, `${ROW}, 1`), failed('UNKNOWN_COLUMN', 1, H + 3));
  const torr = HEADER.replace('q [Pa]', 'q [Torr]');
  add('unknown-unit-pressure.csv', text(torr, ROW), failed('UNKNOWN_UNIT', 1, columnOf(torr, 'q [')));
  const fyPa = HEADER.replace('Fy [N]', 'Fy [Pa]');
  add('unknown-unit-force.csv', text(fyPa, ROW), failed('UNKNOWN_UNIT', 1, columnOf(fyPa, 'Fy')));
  const noUnit = HEADER.replace('Fz [N]', 'Fz');
  add('missing-unit.csv', text(noUnit, ROW), failed('MISSING_UNIT', 1, columnOf(noUnit, 'Fz')));
  for (const [label, value, index] of [
    ['nan', 'NaN', 4],
    ['text', 'abc', 8],
    ['infinity', 'Inf', 0],
    ['overflow', '1e400', 9],
    ['two-points', '1.2.3', 5],
    ['inner-space', '12 5', 10],
    ['hex', '0x1A', 11],
    ['quoted', '"850.2"', 4],
    ['double-minus', '--1', 12],
  ] as const) {
    const { row, column } = rowWith(index, value);
    add(`not-a-number-${label}.csv`, text(HEADER, ROW, row), failed('NOT_A_NUMBER', 3, column));
  }
  const emptyCell = CELLS.slice(0, 4).join(', ') + ',, ' + CELLS.slice(5).join(', ');
  add('empty-cell.csv', text(HEADER, emptyCell), failed('NOT_A_NUMBER', 2, emptyCell.indexOf(',,') + 2));
  const semi = (line: string) => line.replaceAll(', ', ';');
  const commaRow = semi(rowWith(4, '850,2').row);
  add('decimal-comma-semicolon.csv', text(semi(HEADER), commaRow), failed('DECIMAL_COMMA', 2, columnOf(commaRow, '850,2')));
  // The comma splits the cell in two, so the row has one field too many: reported at the first extra one.
  const splitRow = rowWith(4, '850,2').row;
  add('decimal-comma-comma.csv', text(HEADER, splitRow), failed('RAGGED_ROW', 2, splitRow.lastIndexOf(', ') + 3));
  for (const [label, index, value] of [
    ['barometer-low', 5, '250'],
    ['barometer-high', 5, '1250'],
    ['temperature-low', 6, '-40.5'],
    ['temperature-high', 6, '95'],
    ['humidity-high', 7, '100.1'],
    ['humidity-negative', 7, '-1'],
    ['negative-q', 4, '-0.5'],
    ['fractional-point', 1, '1.5'],
    ['negative-point', 1, '-1'],
    ['pitch-beyond-360', 3, '361'],
    ['yaw-beyond-360', 2, '-400'],
  ] as const) {
    const { row, column } = rowWith(index, value);
    add(`out-of-range-${label}.csv`, text(HEADER, row), failed('OUT_OF_RANGE', 2, column));
  }
  add('huge-line.csv', text(HEADER, `${ROW}, ${'9'.repeat(70_000)}`), failed('LINE_TOO_LONG', 2, 65_537));
  add('no-header.csv', text(ROW, ROW), failed('NO_HEADER', 1, 1));
  add('only-metadata.csv', Buffer.from('# run: 1\n# nothing else\n\n'), failed('NO_HEADER', 3, 1));
  add('header-only.csv', text('# run: 3', HEADER), failed('NO_SAMPLES', 2, 1));
  const deep = validRows(50, 100);
  const deepBad = rowWith(8, 'x12.5');
  add('bad-cell-deep.csv', text(HEADER, ...deep.slice(0, 4321), deepBad.row, ...deep.slice(4321)), failed('NOT_A_NUMBER', 4323, deepBad.column));
  const still = validRows(2, 4).map((row) => row.replace(/, 85\d\.\d\d, /, ', 0, '));
  add('zero-wind.csv', text(HEADER, ...still), failed('ZERO_WIND', 2, 1));
  const filler = Buffer.from(`${HEADER}\n` + `${ROW}\n`.repeat(Math.ceil((limitBytes + 1) / (ROW.length + 1))), 'utf8');
  add('over-the-limit.csv', filler, { outcome: 'refused', status: 413 });
  return files;
}

/** Writes the corpus to `dir` and returns the files with their paths. */
export function writeBadRunFiles(dir: string, limitBytes: number): (BadRunFile & { path: string })[] {
  mkdirSync(dir, { recursive: true });
  return badRunFiles(limitBytes).map((file) => {
    const path = join(dir, file.name);
    writeFileSync(path, file.bytes);
    return { ...file, path };
  });
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const dir = process.argv[2] ? resolve(process.argv[2]) : mkdtempSync(join(tmpdir(), 'tw-bad-run-files-'));
  const written = writeBadRunFiles(dir, Number(process.env.UPLOAD_LIMIT_BYTES ?? 1024 * 1024));
  for (const file of written) console.log(`${file.name.padEnd(36)} ${String(file.bytes.length).padStart(9)} B  ${JSON.stringify(file.expect)}`);
  console.log(`\n${written.length} files in ${dir}`);
}
