/**
 * Writes a large valid run file (invented values) for end-to-end tests and benchmarks.
 *   node --import tsx scripts/make-large-run-file.ts <path> [rows] [samplesPerPoint]
 */
import { createWriteStream } from 'node:fs';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { HEADER } from './make-bad-run-files';

/** What was written. */
export interface LargeRunFile {
  path: string;
  rows: number;
  points: number;
  bytes: number;
}

/** Streams `rows` data rows, `samplesPerPoint` per point, to `path` without holding the file in memory. */
export async function writeLargeRunFile(path: string, rows: number, samplesPerPoint = 1000): Promise<LargeRunFile> {
  const out = createWriteStream(path);
  let bytes = 0;
  const write = (chunk: string) => {
    bytes += Buffer.byteLength(chunk);
    return out.write(chunk) ? Promise.resolve() : new Promise<void>((done) => out.once('drain', () => done()));
  };
  await write(`# run: bench\n# operator: generated\n${HEADER}\n`);
  let batch = '';
  for (let i = 0; i < rows; i++) {
    const point = Math.floor(i / samplesPerPoint) + 1;
    const yaw = (((point - 1) % 21) - 10).toFixed(1);
    const wobble = (i % 97) / 97;
    batch += `${(i * 0.001).toFixed(3)}, ${point}, ${yaw}, 0.0, ${(850 + wobble).toFixed(2)}, 1013.25, 20.5, 45, ${(12.5 + wobble * 0.1).toFixed(3)}, ${(Number(yaw) * 0.8).toFixed(3)}, 150.2, 0.01, -2.5, ${(Number(yaw) * 0.05).toFixed(3)}\n`;
    if (batch.length > 1 << 16) {
      await write(batch);
      batch = '';
    }
  }
  await write(batch);
  await new Promise<void>((done, fail) => out.end((error?: Error | null) => (error ? fail(error) : done())));
  return { path, rows, points: Math.ceil(rows / samplesPerPoint), bytes };
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const [path, rows = '1000000', per = '1000'] = process.argv.slice(2);
  if (!path) {
    console.error('usage: make-large-run-file.ts <path> [rows] [samplesPerPoint]');
    process.exitCode = 2;
  } else {
    const written = await writeLargeRunFile(resolve(path), Number(rows), Number(per));
    console.log(`${written.rows} rows, ${written.points} points, ${written.bytes} bytes → ${written.path}`);
  }
}
