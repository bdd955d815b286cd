import type { RunFileHeader } from './run-file-header';
import type { RunSample } from './run-sample';

/** What `readRunFile` accepts as input: chunks of bytes or text, e.g. `fs.createReadStream(path)`. */
export type RunFileInput =
  | AsyncIterable<Buffer | Uint8Array | string>
  | Iterable<Buffer | Uint8Array>
  | NodeJS.ReadableStream;

/** Options of `readRunFile`. */
export interface ReadRunFileOptions {
  /** Name of the file, used in every message. */
  fileName: string;
  /** Called once, after the header row has been checked and before the first sample. */
  onHeader?: (header: RunFileHeader) => void;
  /**
   * Called for every valid row, in file order, until the first issue is found. The sample object is
   * reused: copy what you keep. If `readRunFile` rejects, discard everything received.
   */
  onSample: (sample: RunSample) => void;
  /** Called after each input chunk with the total bytes read so far. */
  onProgress?: (bytesRead: number) => void;
  /** Collect up to this many row issues before stopping (default 50). */
  maxIssues?: number;
  /** Aborts reading; the promise then rejects with the signal's reason. */
  signal?: AbortSignal;
}

/** Result of a complete, valid read. */
export interface RunFileSummary {
  header: RunFileHeader;
  /** Number of data rows delivered to `onSample`. */
  sampleCount: number;
  /** Bytes consumed, including the BOM if any. */
  bytesRead: number;
  /** Number of lines in the file (a final line ending does not start a new line). */
  lineCount: number;
}
