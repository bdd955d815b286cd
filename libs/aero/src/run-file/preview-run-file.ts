import { detectDelimiter } from './header-row';
import type { RunFileInput } from './read-run-file-options';
import { toBuffer } from './read-run-file';
import type { RunFileIssue } from './run-file-error';
import type { RunFileHeader } from './run-file-header';
import { RunFileParser } from './run-file-parser';

/** Options of `previewRunFile`. */
export interface PreviewRunFileOptions {
  /** Name of the file, used in every message. */
  fileName: string;
  /** Lines after the header row to show and check (default 20). */
  rows?: number;
}

/** First rows of a file as text cells, with the detected header and the issues found in them. */
export interface RunFilePreview {
  /** Detected columns, units and metadata; undefined when the header is unusable. */
  header?: RunFileHeader;
  /** Cells of the first data rows, trimmed, as written (no unit conversion). */
  rows: string[][];
  /** Issues in the part read: header problems, or problems of the rows shown. */
  issues: RunFileIssue[];
}

/** Slice size fed to the parser, so that a preview of one big buffer stops early. */
const PREVIEW_SLICE = 65_536;

/**
 * Reads only the start of a run file: the header and the first `rows` lines after it, checked by the
 * same parser as `readRunFile`. Never throws for problems of the file; they come back as `issues`.
 * Problems that only the end of the file shows (NO_SAMPLES, TRUNCATED) are reported only when the
 * preview reached the end.
 * @param input chunks or a stream, or the whole file as a string
 * @param options file name and number of rows
 * @throws RangeError when `rows` is not a positive integer; errors of the input stream itself
 * @example const { header, rows, issues } = await previewRunFile(fs.createReadStream(p), { fileName: 'run-12.csv' });
 */
export async function previewRunFile(input: RunFileInput | string, options: PreviewRunFileOptions): Promise<RunFilePreview> {
  const rowCount = options.rows ?? 20;
  if (!Number.isInteger(rowCount) || rowCount < 1) throw new RangeError(`previewRunFile requires rows ≥ 1, got ${rowCount}`);
  const parser = new RunFileParser(options.fileName, rowCount, undefined, () => {});
  const source = typeof input === 'string' ? [Buffer.from(input, 'utf8')] : (input as AsyncIterable<Buffer | Uint8Array | string>);
  const kept: Buffer[] = [];
  const enough = () => parser.stopped || (parser.header !== undefined && parser.lineCount >= parser.header.headerLine + rowCount);
  let ended = true;
  reading: for await (const chunk of source) {
    const bytes = toBuffer(chunk);
    for (let start = 0; start < bytes.length; start += PREVIEW_SLICE) {
      const slice = bytes.subarray(start, start + PREVIEW_SLICE);
      kept.push(slice);
      parser.feed(slice);
      if (enough()) {
        ended = false;
        break reading;
      }
    }
  }
  if (ended && !parser.stopped) parser.finish();

  let text = Buffer.concat(kept).toString('utf8');
  if (text.startsWith('\uFEFF')) text = text.slice(1);
  // Only lines the parser completed are shown.
  const lines = text.split('\n').slice(0, parser.lineCount);
  const header = parser.header;
  const firstRow = header ? header.headerLine : 0;
  const delimiter = header?.delimiter ?? detectDelimiter(lines.find((l) => l.trim() !== '' && !l.trim().startsWith('#')) ?? '');
  const rows = lines
    .slice(firstRow, firstRow + rowCount)
    .map((line) => line.replace(/\r$/, ''))
    .filter((line) => line.trim() !== '' && !line.trim().startsWith('#'))
    .map((line) => line.split(delimiter).map((cell) => cell.trim()));
  return { header, rows, issues: parser.issues };
}
