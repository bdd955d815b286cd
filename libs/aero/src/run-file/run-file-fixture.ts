import { readRunFile } from './read-run-file';
import { RunFileError, type RunFileIssue } from './run-file-error';
import type { RunFileSummary } from './read-run-file-options';
import type { RunSample } from './run-sample';

/** Canonical 14-column header row used by the specs. */
export const CANONICAL_HEADER =
  'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]';

/** A plausible data row for `CANONICAL_HEADER` (invented values). */
export const CANONICAL_ROW = '0.000, 1, 0.0, 2.5, 850.2, 1013.25, 20.5, 45, 12.5, -0.3, 150.2, 0.01, -2.5, 0.03';

/** A copy of a sample that outlives the reader's reused object. */
export type SampleCopy = Omit<RunSample, 'loads' | 'bridges'> & { loads: number[]; bridges: number[] };

/** Copies the reused sample object. */
export function copySample(sample: RunSample): SampleCopy {
  return { ...sample, loads: Array.from(sample.loads), bridges: Array.from(sample.bridges) };
}

/** Splits bytes into chunks of `size` (the last may be shorter). */
export function chunksOf(bytes: Buffer, size: number): Buffer[] {
  const chunks: Buffer[] = [];
  for (let i = 0; i < bytes.length; i += size) chunks.push(bytes.subarray(i, i + size));
  return chunks;
}

/** Outcome of reading a file: samples and summary, or the issues. */
export interface ReadOutcome {
  samples: SampleCopy[];
  summary?: RunFileSummary;
  issues: RunFileIssue[];
}

/**
 * Reads `text` (or bytes) fed in chunks of `chunkSize` bytes and collects what came out.
 * @param content file content
 * @param chunkSize bytes per chunk (default: one chunk)
 * @param maxIssues passed to readRunFile
 */
export async function readAll(content: string | Buffer, chunkSize?: number, maxIssues?: number): Promise<ReadOutcome> {
  const bytes = typeof content === 'string' ? Buffer.from(content, 'utf8') : content;
  const samples: SampleCopy[] = [];
  try {
    const summary = await readRunFile(chunksOf(bytes, chunkSize ?? Math.max(1, bytes.length)), {
      fileName: 'run.csv',
      maxIssues,
      onSample: (sample) => samples.push(copySample(sample)),
    });
    return { samples, summary, issues: [] };
  } catch (error) {
    if (error instanceof RunFileError) return { samples, issues: error.issues };
    throw error;
  }
}

/** Reads `content` and returns its issues as `[code, line, column]` triples. */
export async function issuesOf(content: string | Buffer, chunkSize?: number): Promise<[string, number, number][]> {
  const { issues } = await readAll(content, chunkSize);
  return issues.map((issue) => [issue.code, issue.line, issue.column]);
}

/** 1-based column of the first occurrence of `needle` in `line`. */
export function columnOf(line: string, needle: string): number {
  const index = line.indexOf(needle);
  if (index === -1) throw new Error(`columnOf: "${needle}" is not in "${line}"`);
  return index + 1;
}

/** A file of the canonical header and the given rows, one line each, newline-terminated. */
export function canonicalFile(...rows: string[]): string {
  return [CANONICAL_HEADER, ...rows].join('\n') + '\n';
}
