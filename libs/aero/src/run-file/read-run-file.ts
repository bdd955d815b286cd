import { RunFileError } from './run-file-error';
import { RunFileParser } from './run-file-parser';
import type { ReadRunFileOptions, RunFileInput, RunFileSummary } from './read-run-file-options';

/** Default number of row issues collected before reading stops. */
export const DEFAULT_MAX_ISSUES = 50;

/**
 * Turns one input chunk into a Buffer without copying bytes.
 * @param chunk Buffer, Uint8Array or text (encoded as UTF-8)
 */
export function toBuffer(chunk: Buffer | Uint8Array | string): Buffer {
  if (typeof chunk === 'string') return Buffer.from(chunk, 'utf8');
  if (Buffer.isBuffer(chunk)) return chunk;
  return Buffer.from(chunk.buffer, chunk.byteOffset, chunk.byteLength);
}

/**
 * Reads a Tunnelwright run file (see docs/run-file-format.md) as a stream, converting every row to
 * SI and handing it to `onSample`. Memory stays constant whatever the file size.
 * @param input the file's bytes, e.g. `fs.createReadStream(path)` or an async iterable of chunks
 * @param options file name, callbacks, issue limit and abort signal
 * @returns counts of samples, bytes and lines, and the header
 * @throws RunFileError with every issue found (each with code, file, line and column) when the file is invalid;
 *   samples already delivered must then be discarded
 * @throws the signal's reason when `options.signal` aborts
 * @example
 * const summary = await readRunFile(fs.createReadStream('run-12.csv'), {
 *   fileName: 'run-12.csv', onSample: (s) => points.push(s.point),
 * });
 */
export async function readRunFile(input: RunFileInput, options: ReadRunFileOptions): Promise<RunFileSummary> {
  const { fileName, onHeader, onSample, onProgress, signal } = options;
  const maxIssues = options.maxIssues ?? DEFAULT_MAX_ISSUES;
  if (!(maxIssues >= 1)) throw new RangeError(`readRunFile requires maxIssues ≥ 1, got ${maxIssues}`);
  if (typeof input === 'string') throw new TypeError('readRunFile requires chunks or a stream; use readRunFileText for a string');
  signal?.throwIfAborted();
  const parser = new RunFileParser(fileName, Math.floor(maxIssues), onHeader, onSample);
  for await (const chunk of input as AsyncIterable<Buffer | Uint8Array | string>) {
    signal?.throwIfAborted();
    parser.feed(toBuffer(chunk));
    onProgress?.(parser.bytesRead);
    if (parser.stopped) break;
  }
  signal?.throwIfAborted();
  parser.finish();
  if (parser.issues.length > 0 || !parser.header) throw new RunFileError(parser.issues);
  return { header: parser.header, sampleCount: parser.sampleCount, bytesRead: parser.bytesRead, lineCount: parser.lineCount };
}

/**
 * Reads a run file held in a string (tests, previews of small uploads).
 * @param text the whole file
 * @param options as for `readRunFile`
 * @throws RunFileError when the file is invalid
 */
export function readRunFileText(text: string, options: ReadRunFileOptions): Promise<RunFileSummary> {
  return readRunFile([Buffer.from(text, 'utf8')], options);
}
