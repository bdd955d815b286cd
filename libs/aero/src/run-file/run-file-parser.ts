import { BRIDGE_CHANNELS, LOAD_CHANNELS, type ChannelId } from './channel-id';
import { parseHeaderRow } from './header-row';
import { NUMERIC_METADATA_KEYS, parseMetadataLine } from './metadata-line';
import { runFileIssue, type RunFileErrorCode, type RunFileIssue } from './run-file-error';
import type { RunFileHeader } from './run-file-header';
import { createRunSample, type RunSample } from './run-sample';
import { countUtf8Characters, findInvalidUtf8 } from './utf8-validity';
import { VALUE_RANGES } from './value-ranges';

/** Longest accepted line, bytes before the line feed (64 KiB). */
export const MAX_LINE_BYTES = 65_536;
/** Bytes at the start of a file searched for NUL, the mark of a binary file. */
const SNIFF_BYTES = 8192;

const TAB = 9;
const LF = 10;
const CR = 13;
const SPACE = 32;
const HASH = 35;
const PLUS = 43;
const COMMA = 44;
const MINUS = 45;
const DOT = 46;
const DIGIT_0 = 48;
const DIGIT_9 = 57;
const SEMICOLON = 59;
const UPPER_E = 69;
const LOWER_E = 101;

/** Exact powers of ten 10^0 … 10^22 (all representable in binary64). */
const POW10 = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));
const NUMBER_PATTERN = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const DECIMAL_COMMA_PATTERN = /^[+-]?\d*,\d+(?:[eE][+-]?\d+)?$/;

/**
 * Byte-level streaming parser of one run file: feed it chunks in order, then call `finish`.
 * Lines are found with `Buffer.indexOf`; numbers are read straight from the bytes (Clinger's fast
 * path: at most 15 significant digits and 22 decimals give a correctly rounded `mantissa / 10^k`),
 * with `Number()` as the fallback for exponents and long mantissas. Only a line cut by a chunk
 * boundary is copied. Memory stays constant: at most one line (64 KiB) is held.
 */
export class RunFileParser {
  /** Issues found so far, in line order. */
  readonly issues: RunFileIssue[] = [];
  /** Whether reading must stop (fatal issue, or `maxIssues` reached). */
  stopped = false;
  header: RunFileHeader | undefined;
  sampleCount = 0;
  bytesRead = 0;
  /** Lines completed so far. */
  lineCount = 0;

  private readonly sample: RunSample = createRunSample();
  private readonly metadata: Record<string, string> = {};
  private readonly metadataLines = new Map<string, number>();
  private pending: Buffer[] = [];
  private pendingLength = 0;
  private sawText = false;
  private sniffLine = 1;
  private sniffColumn = 1;

  // Per-column plan, filled from the header row.
  private columnCount = 0;
  private delimiter = COMMA;
  private isExtra = new Uint8Array(0);
  private scale = new Float64Array(0);
  private offset = new Float64Array(0);
  private minimum = new Float64Array(0);
  private maximum = new Float64Array(0);
  private values = new Float64Array(0);
  private columnNames: string[] = [];
  private columnUnits: string[] = [];
  private rangeText: string[] = [];
  private pointIndex = -1;
  private loadIndex = new Int32Array(6);
  private loadsGiven = true;
  private timeIndex = -1;
  private yawIndex = -1;
  private pitchIndex = -1;
  private qIndex = -1;
  private dpIndex = -1;
  private baroIndex = -1;
  private tempIndex = -1;
  private rhIndex = -1;
  private speedIndex = -1;

  constructor(
    private readonly fileName: string,
    private readonly maxIssues: number,
    private readonly onHeader: ((header: RunFileHeader) => void) | undefined,
    private readonly onSample: (sample: RunSample) => void,
  ) {}

  /**
   * Parses every complete line of a chunk and keeps the cut-off rest for the next one.
   * @param chunk next bytes of the file
   */
  feed(chunk: Buffer): void {
    if (this.stopped) return;
    if (this.bytesRead < SNIFF_BYTES && this.sniffForNul(chunk)) return;
    this.bytesRead += chunk.length;
    let start = 0;
    if (this.pendingLength > 0) {
      const newline = chunk.indexOf(LF);
      if (newline === -1) {
        this.keepPending(chunk);
        return;
      }
      this.pending.push(chunk.subarray(0, newline));
      const line = Buffer.concat(this.pending, this.pendingLength + newline);
      this.pending = [];
      this.pendingLength = 0;
      this.line(line, 0, line.length, false);
      start = newline + 1;
    }
    const end = chunk.length;
    while (start < end && !this.stopped) {
      const newline = chunk.indexOf(LF, start);
      if (newline === -1) {
        this.keepPending(chunk.subarray(start));
        return;
      }
      this.line(chunk, start, newline, false);
      start = newline + 1;
    }
  }

  /** Parses the last line (if it has no line ending) and checks that the file had a header and samples. */
  finish(): void {
    if (this.stopped) return;
    if (this.pendingLength > 0) {
      const line = this.pending.length === 1 ? this.pending[0] : Buffer.concat(this.pending, this.pendingLength);
      this.pending = [];
      this.pendingLength = 0;
      this.line(line, 0, line.length, true);
      if (this.stopped) return;
    }
    if (!this.header) {
      if (!this.sawText) this.fatal('EMPTY_FILE', 1, 1, 'the file is empty');
      else this.fatal('NO_HEADER', Math.max(1, this.lineCount), 1, 'no header row found: the file has only metadata, comments or blank lines');
    } else if (this.sampleCount === 0 && this.issues.length === 0) {
      this.fatal('NO_SAMPLES', this.header.headerLine, 1, `no data rows after the header row on line ${this.header.headerLine}`);
    }
  }

  private keepPending(piece: Buffer): void {
    if (this.pendingLength + piece.length > MAX_LINE_BYTES + 1) {
      this.fatal('LINE_TOO_LONG', this.lineCount + 1, MAX_LINE_BYTES + 1, `line ${this.lineCount + 1} is longer than ${MAX_LINE_BYTES} bytes`);
      return;
    }
    this.pending.push(piece);
    this.pendingLength += piece.length;
  }

  /** Reports a NUL byte in the first 8 KiB as a binary file, with its line and column. */
  private sniffForNul(chunk: Buffer): boolean {
    const limit = Math.min(chunk.length, SNIFF_BYTES - this.bytesRead);
    for (let i = 0; i < limit; i++) {
      const b = chunk[i];
      if (b === 0) {
        this.fatal('BINARY_FILE', this.sniffLine, this.sniffColumn, 'the file contains NUL bytes: it is binary, not a text run file');
        return true;
      }
      if (b === LF) {
        this.sniffLine++;
        this.sniffColumn = 1;
      } else if ((b & 0xc0) !== 0x80) this.sniffColumn++;
    }
    return false;
  }

  private line(buf: Buffer, start: number, end: number, last: boolean): void {
    this.lineCount++;
    if (end - start > MAX_LINE_BYTES + (end > start && buf[end - 1] === CR ? 1 : 0)) {
      this.fatal('LINE_TOO_LONG', this.lineCount, MAX_LINE_BYTES + 1, `line ${this.lineCount} is longer than ${MAX_LINE_BYTES} bytes`);
      return;
    }
    if (this.header) this.dataLine(buf, start, end, last);
    else this.preambleLine(buf, start, end);
  }

  private preambleLine(buf: Buffer, start: number, end: number): void {
    const lineNumber = this.lineCount;
    if (lineNumber === 1 && end - start >= 3 && buf[start] === 0xef && buf[start + 1] === 0xbb && buf[start + 2] === 0xbf) start += 3;
    const bad = findInvalidUtf8(buf, start, end);
    if (bad !== -1) {
      this.fatal('BINARY_FILE', lineNumber, 1 + countUtf8Characters(buf, start, bad),
        buf[bad] === 0 ? 'NUL byte: the file is binary, not a text run file' : 'invalid UTF-8 byte: a run file is UTF-8 text');
      return;
    }
    let text = buf.toString('utf8', start, end);
    if (text.endsWith('\r')) text = text.slice(0, -1);
    const trimmed = text.trim();
    if (trimmed === '') return;
    this.sawText = true;
    if (trimmed.startsWith('#')) {
      this.metadataLine(text, lineNumber);
      return;
    }
    const parsed = parseHeaderRow(text, lineNumber, this.fileName);
    if (!parsed.row || this.issues.length > 0) {
      for (const issue of parsed.issues) this.addIssue(issue);
      this.stopped = true;
      return;
    }
    this.planColumns(parsed.row.columns.map((c) => c.channel), parsed.row.units, parsed.row.delimiter);
    this.columnNames = parsed.row.columns.map((c) => c.name);
    this.columnUnits = parsed.row.columns.map((c) => c.unit);
    this.header = {
      fileName: this.fileName,
      metadata: this.metadata,
      columns: parsed.row.columns,
      loadKind: parsed.row.loadKind,
      pressureKind: parsed.row.pressureKind,
      headerLine: lineNumber,
      delimiter: parsed.row.delimiter,
    };
    this.onHeader?.(this.header);
  }

  private metadataLine(text: string, lineNumber: number): void {
    const entry = parseMetadataLine(text);
    if (!entry) return;
    const column = 1 + text.indexOf('#');
    const previous = this.metadataLines.get(entry.key);
    if (previous !== undefined) {
      this.addIssue(runFileIssue('INVALID_METADATA', this.fileName, lineNumber, column, `metadata key "${entry.key}" repeats line ${previous}`));
      return;
    }
    if (NUMERIC_METADATA_KEYS.includes(entry.key)) {
      const value = NUMBER_PATTERN.test(entry.value) ? Number(entry.value) : NaN;
      if (!(value > 0 && Number.isFinite(value))) {
        this.addIssue(runFileIssue('INVALID_METADATA', this.fileName, lineNumber, column,
          `metadata "${entry.key}" must be a positive number, got "${entry.value}"`));
        return;
      }
    }
    this.metadataLines.set(entry.key, lineNumber);
    this.metadata[entry.key] = entry.value;
  }

  private planColumns(channels: ChannelId[], units: ({ scale: number; offset: number } | undefined)[], delimiter: ',' | ';'): void {
    const n = channels.length;
    this.columnCount = n;
    this.delimiter = delimiter === ';' ? SEMICOLON : COMMA;
    this.isExtra = new Uint8Array(n);
    this.scale = new Float64Array(n);
    this.offset = new Float64Array(n);
    this.minimum = new Float64Array(n).fill(-Infinity);
    this.maximum = new Float64Array(n).fill(Infinity);
    this.values = new Float64Array(n);
    this.rangeText = new Array<string>(n).fill('');
    const indexOf = (id: ChannelId) => channels.indexOf(id);
    for (let c = 0; c < n; c++) {
      const unit = units[c];
      if (!unit) {
        this.isExtra[c] = 1;
        continue;
      }
      this.scale[c] = unit.scale;
      this.offset[c] = unit.offset;
      const range = VALUE_RANGES[channels[c]];
      if (range) {
        this.minimum[c] = range.min;
        this.maximum[c] = range.max;
        this.rangeText[c] = range.text;
      }
    }
    this.pointIndex = indexOf('point');
    this.timeIndex = indexOf('time');
    this.yawIndex = indexOf('yaw');
    this.pitchIndex = indexOf('pitch');
    this.qIndex = indexOf('q');
    this.dpIndex = indexOf('dp_ref');
    this.baroIndex = indexOf('p_baro');
    this.tempIndex = indexOf('T_air');
    this.rhIndex = indexOf('RH');
    this.speedIndex = indexOf('V');
    this.loadsGiven = indexOf('Fx') !== -1;
    const set = this.loadsGiven ? LOAD_CHANNELS : BRIDGE_CHANNELS;
    for (let k = 0; k < 6; k++) this.loadIndex[k] = indexOf(set[k]);
  }

  /** Parses one data row into `values` (SI), checks it and hands the sample on. */
  private dataLine(buf: Buffer, lineStart: number, end: number, last: boolean): void {
    let p = lineStart;
    let b = 0;
    while (p < end && ((b = buf[p]) === SPACE || b === TAB || b === CR)) p++;
    if (p === end || b === HASH) return;
    const n = this.columnCount;
    const values = this.values;
    const delimiter = this.delimiter;
    const isExtra = this.isExtra;
    const offset = this.offset;
    const scale = this.scale;
    for (let c = 0; c < n; c++) {
      while (p < end && ((b = buf[p]) === SPACE || b === TAB)) p++;
      const cellStart = p;
      if (isExtra[c] === 1) {
        while (p < end && buf[p] !== delimiter) p++;
        const bad = findInvalidUtf8(buf, cellStart, p);
        if (bad !== -1) {
          this.binaryInRow(buf, lineStart, bad);
          return;
        }
      } else {
        b = p < end ? buf[p] : -1;
        let negative = false;
        if (b === MINUS) {
          negative = true;
          b = ++p < end ? buf[p] : -1;
        } else if (b === PLUS) b = ++p < end ? buf[p] : -1;
        let mantissa = 0;
        let digits = 0;
        let decimals = 0;
        while (b >= DIGIT_0 && b <= DIGIT_9) {
          mantissa = mantissa * 10 + (b - DIGIT_0);
          digits++;
          b = ++p < end ? buf[p] : -1;
        }
        if (b === DOT) {
          b = ++p < end ? buf[p] : -1;
          while (b >= DIGIT_0 && b <= DIGIT_9) {
            mantissa = mantissa * 10 + (b - DIGIT_0);
            digits++;
            decimals++;
            b = ++p < end ? buf[p] : -1;
          }
        }
        let value: number;
        if (b === LOWER_E || b === UPPER_E || digits > 15 || decimals > 22) {
          // Slow path: exponent or more digits than a double holds exactly.
          let cellEnd = p;
          while (cellEnd < end && buf[cellEnd] !== delimiter) cellEnd++;
          while (cellEnd > cellStart && ((b = buf[cellEnd - 1]) === SPACE || b === TAB || b === CR)) cellEnd--;
          const text = buf.toString('latin1', cellStart, cellEnd);
          value = NUMBER_PATTERN.test(text) ? Number(text) : NaN;
          if (!Number.isFinite(value)) {
            this.badCell(buf, lineStart, cellStart, end, c);
            return;
          }
          p = cellEnd;
        } else if (digits === 0) {
          this.badCell(buf, lineStart, cellStart, end, c);
          return;
        } else {
          value = decimals === 0 ? mantissa : mantissa / POW10[decimals];
          if (negative) value = -value;
        }
        while (p < end && ((b = buf[p]) === SPACE || b === TAB || b === CR)) p++;
        values[c] = (value + offset[c]) * scale[c];
      }
      if (p < end) {
        if (buf[p] !== delimiter) {
          this.badCell(buf, lineStart, cellStart, end, c);
          return;
        }
        if (c === n - 1) {
          this.raggedRow(buf, lineStart, p + 1, end, true, last);
          return;
        }
        p++;
      } else if (c < n - 1) {
        this.raggedRow(buf, lineStart, end, end, false, last, c + 1);
        return;
      }
    }
    const line = this.lineCount;
    const minimum = this.minimum;
    const maximum = this.maximum;
    for (let c = 0; c < n; c++) {
      const value = values[c];
      if (!(value >= minimum[c] && value <= maximum[c])) {
        this.outOfRange(buf, lineStart, end, c);
        return;
      }
    }
    const point = values[this.pointIndex];
    if (!Number.isInteger(point)) {
      this.outOfRange(buf, lineStart, end, this.pointIndex);
      return;
    }
    if (this.issues.length > 0) return;
    const sample = this.sample;
    sample.line = line;
    sample.time = this.timeIndex >= 0 ? values[this.timeIndex] : NaN;
    sample.point = point;
    sample.yaw = values[this.yawIndex];
    sample.pitch = values[this.pitchIndex];
    sample.dynamicPressure = this.qIndex >= 0 ? values[this.qIndex] : NaN;
    sample.referencePressureDifference = this.dpIndex >= 0 ? values[this.dpIndex] : NaN;
    sample.barometricPressure = values[this.baroIndex];
    sample.temperature = values[this.tempIndex];
    sample.relativeHumidity = values[this.rhIndex];
    sample.speed = this.speedIndex >= 0 ? values[this.speedIndex] : NaN;
    const target = this.loadsGiven ? sample.loads : sample.bridges;
    const loadIndex = this.loadIndex;
    for (let k = 0; k < 6; k++) target[k] = values[loadIndex[k]];
    this.sampleCount++;
    this.onSample(sample);
  }

  /** Finds where the cell starting at `cellStart` ends (next delimiter or line end). */
  private cellEnd(buf: Buffer, cellStart: number, end: number): number {
    let p = cellStart;
    while (p < end && buf[p] !== this.delimiter) p++;
    return p;
  }

  private columnAt(buf: Buffer, lineStart: number, at: number): number {
    return 1 + countUtf8Characters(buf, lineStart, at);
  }

  private binaryInRow(buf: Buffer, lineStart: number, bad: number): void {
    this.fatal('BINARY_FILE', this.lineCount, this.columnAt(buf, lineStart, bad),
      buf[bad] === 0 ? 'NUL byte: the file is binary, not a text run file' : 'invalid UTF-8 byte: a run file is UTF-8 text');
  }

  private badCell(buf: Buffer, lineStart: number, cellStart: number, end: number, c: number): void {
    let cellEnd = this.cellEnd(buf, cellStart, end);
    const bad = findInvalidUtf8(buf, cellStart, cellEnd);
    if (bad !== -1) {
      this.binaryInRow(buf, lineStart, bad);
      return;
    }
    let b: number;
    while (cellEnd > cellStart && ((b = buf[cellEnd - 1]) === SPACE || b === TAB || b === CR)) cellEnd--;
    const text = buf.toString('utf8', cellStart, cellEnd);
    const column = this.columnAt(buf, lineStart, cellStart);
    const where = `column "${this.columnNames[c]}"`;
    if (text === '') {
      this.rowIssue('NOT_A_NUMBER', column, `empty cell in ${where}; every cell of a data row needs a number`);
    } else if (this.delimiter === SEMICOLON && DECIMAL_COMMA_PATTERN.test(text)) {
      this.rowIssue('DECIMAL_COMMA', column,
        `"${text}" in ${where} uses a decimal comma; the run-file format needs a decimal point (use an import profile with decimalComma for such files)`);
    } else {
      const shown = text.length > 40 ? `${text.slice(0, 40)}…` : text;
      this.rowIssue('NOT_A_NUMBER', column, `"${shown}" in ${where} is not a number`);
    }
  }

  private raggedRow(buf: Buffer, lineStart: number, at: number, end: number, tooMany: boolean, last: boolean, fields = 0): void {
    let count = fields;
    if (tooMany) {
      count = this.columnCount + 1;
      for (let p = at; p < end; p++) if (buf[p] === this.delimiter) count++;
    }
    let stop = at;
    if (tooMany) while (stop < end && (buf[stop] === SPACE || buf[stop] === TAB)) stop++;
    else while (stop > lineStart && buf[stop - 1] === CR) stop--;
    const column = this.columnAt(buf, lineStart, stop);
    if (!tooMany && last) {
      this.fatal('TRUNCATED', this.lineCount, column,
        `the last line ends after ${count} of ${this.columnCount} fields without a line ending: the file looks cut off`);
      return;
    }
    const hint = tooMany && this.delimiter === COMMA ? ' (a decimal comma? the run-file format needs a decimal point)' : '';
    this.rowIssue('RAGGED_ROW', column, `row has ${count} fields, the header row has ${this.columnCount}${hint}`);
  }

  private outOfRange(buf: Buffer, lineStart: number, end: number, c: number): void {
    // Re-find the cell to point at it and quote it as written.
    let cellStart = lineStart;
    for (let k = 0; k < c; k++) cellStart = this.cellEnd(buf, cellStart, end) + 1;
    let b: number;
    while (cellStart < end && ((b = buf[cellStart]) === SPACE || b === TAB)) cellStart++;
    let cellEnd = this.cellEnd(buf, cellStart, end);
    while (cellEnd > cellStart && ((b = buf[cellEnd - 1]) === SPACE || b === TAB || b === CR)) cellEnd--;
    const text = buf.toString('latin1', cellStart, cellEnd);
    const unit = this.columnUnits[c] ? ` ${this.columnUnits[c]}` : '';
    this.rowIssue('OUT_OF_RANGE', this.columnAt(buf, lineStart, cellStart),
      `${this.columnNames[c]} = ${text}${unit} is out of range: it must be ${this.rangeText[c]}`);
  }

  private rowIssue(code: RunFileErrorCode, column: number, what: string): void {
    this.addIssue(runFileIssue(code, this.fileName, this.lineCount, column, what));
  }

  private addIssue(issue: RunFileIssue): void {
    this.issues.push(issue);
    if (this.issues.length >= this.maxIssues) this.stopped = true;
  }

  private fatal(code: RunFileErrorCode, line: number, column: number, what: string): void {
    this.issues.push(runFileIssue(code, this.fileName, line, column, what));
    this.stopped = true;
    this.pending = [];
    this.pendingLength = 0;
  }
}
