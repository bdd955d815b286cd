/**
 * Reader-only benchmark: generates a 1,000,000-row canonical run file in the OS temp folder, then
 * times a plain byte read of it and `readRunFile` on it (64 KiB and 1 MiB stream chunks), each in its own child process so that each
 * peak RSS (`process.resourceUsage().maxRSS`) is its own. Prints rows/s, wall time, ratio and RSS.
 *
 * Run: node --import tsx scripts/bench/bench-read.ts [rows]
 */
import { execFileSync } from 'node:child_process';
import { createReadStream, createWriteStream, existsSync, statSync } from 'node:fs';
import { once } from 'node:events';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { readRunFile } from '../../libs/aero/src/run-file';

const HEADER =
  'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]\n';

/** Writes an invented run: 1000 samples per set condition, pitch sweeping -10…+10 deg. */
async function generate(path: string, rows: number): Promise<void> {
  const out = createWriteStream(path);
  out.write('# run: 901\n# tunnel: demo hall B\n# model: generic bluff body, invented\n');
  out.write(HEADER);
  let batch = '';
  for (let i = 0; i < rows; i++) {
    const point = Math.floor(i / 1000) + 1;
    const pitch = ((point % 21) - 10).toFixed(2);
    const wobble = Math.sin(i * 0.37);
    const fx = (12.5 + wobble * 0.8).toFixed(4);
    const fy = (-0.3 + wobble * 0.05).toFixed(4);
    const fz = (150.2 + wobble * 3).toFixed(3);
    // One value in a hundred is written with an exponent, to exercise the slow number path.
    const mx = i % 100 === 0 ? (0.012 + wobble * 1e-3).toExponential(4) : (0.012 + wobble * 1e-3).toFixed(5);
    const my = (-2.5 + wobble * 0.1).toFixed(4);
    const mz = (0.03 + wobble * 0.002).toFixed(5);
    batch += `${(i * 0.002).toFixed(3)}, ${point}, 0.00, ${pitch}, ${(850 + wobble).toFixed(2)}, ${(1013.2 + wobble * 0.1).toFixed(2)}, ${(20.5 + wobble * 0.05).toFixed(2)}, ${(45 + wobble).toFixed(1)}, ${fx}, ${fy}, ${fz}, ${mx}, ${my}, ${mz}\n`;
    if (batch.length > 1 << 20) {
      if (!out.write(batch)) await once(out, 'drain');
      batch = '';
    }
  }
  out.end(batch);
  await once(out, 'finish');
}

async function plainRead(path: string, highWaterMark = 65_536): Promise<number> {
  let bytes = 0;
  for await (const chunk of createReadStream(path, { highWaterMark })) bytes += (chunk as Buffer).length;
  return bytes;
}

async function readerRead(path: string, highWaterMark: number): Promise<number> {
  let checksum = 0;
  const summary = await readRunFile(createReadStream(path, { highWaterMark }), {
    fileName: path,
    onSample: (sample) => {
      checksum += sample.loads[2];
    },
  });
  if (!Number.isFinite(checksum)) throw new Error('bench-read: checksum is not finite');
  return summary.sampleCount;
}

async function phase(kind: string, chunkBytes: number, path: string): Promise<void> {
  const start = process.hrtime.bigint();
  const cpuStart = process.cpuUsage();
  const count = kind === 'plain' ? await plainRead(path, chunkBytes) : await readerRead(path, chunkBytes);
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const cpu = process.cpuUsage(cpuStart);
  const cpuSeconds = (cpu.user + cpu.system) / 1e6;
  process.stdout.write(JSON.stringify({ seconds, cpuSeconds, count, maxRssMb: process.resourceUsage().maxRSS / 1024 }));
}

async function main(): Promise<void> {
  const [, , first, second] = process.argv;
  // Child phases are started as: --phase plain|reader <chunkBytes> <path>
  if (first === '--phase') {
    await phase(second, Number(process.argv[4]), process.argv[5]);
    return;
  }
  const rows = first ? Number(first) : 1_000_000;
  const path = join(tmpdir(), `tunnelwright-bench-read-${rows}.csv`);
  if (!existsSync(path)) await generate(path, rows);
  const size = statSync(path).size;
  const self = fileURLToPath(import.meta.url);
  const run = (kind: string, chunkBytes: number) =>
    JSON.parse(execFileSync(process.execPath, ['--import', 'tsx', self, '--phase', kind, String(chunkBytes), path], { encoding: 'utf8' })) as {
      seconds: number;
      cpuSeconds: number;
      count: number;
      maxRssMb: number;
    };
  console.log(`load average ${loadavg().map((l) => l.toFixed(2)).join(' ')} (other work on the machine skews wall times)`);
  console.log(`file ${path}: ${rows} rows, ${(size / 1e6).toFixed(1)} MB; ${cpus()[0]?.model ?? 'cpu'} ×${cpus().length}, node ${process.version}`);
  // Warm the page cache once so both timings read from memory.
  await plainRead(path);
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  for (const chunkBytes of [65_536, 1_048_576]) {
    const plainTimes: number[] = [];
    const readerTimes: number[] = [];
    for (let round = 1; round <= 5; round++) {
      const plain = run('plain', chunkBytes);
      const reader = run('reader', chunkBytes);
      plainTimes.push(plain.seconds);
      readerTimes.push(reader.seconds);
      if (reader.count !== rows) throw new Error(`bench-read: reader delivered ${reader.count} rows, expected ${rows}`);
      console.log(
        `${chunkBytes / 1024} KiB chunks, round ${round}: plain read ${plain.seconds.toFixed(3)} s, CPU ${plain.cpuSeconds.toFixed(3)} s (${(size / 1e6 / plain.seconds).toFixed(0)} MB/s, peak RSS ${plain.maxRssMb.toFixed(0)} MB) | ` +
          `readRunFile ${reader.seconds.toFixed(3)} s, CPU ${reader.cpuSeconds.toFixed(3)} s (${(rows / reader.seconds / 1e6).toFixed(2)} M rows/s, peak RSS ${reader.maxRssMb.toFixed(0)} MB) | ` +
          `ratio ${(reader.seconds / plain.seconds).toFixed(2)}×`,
      );
    }
    const plainMedian = median(plainTimes);
    const readerMedian = median(readerTimes);
    console.log(
      `${chunkBytes / 1024} KiB chunks, median of 5: plain read ${plainMedian.toFixed(3)} s, readRunFile ${readerMedian.toFixed(3)} s ` +
        `(${(rows / readerMedian / 1e6).toFixed(2)} M rows/s), ratio ${(readerMedian / plainMedian).toFixed(2)}×`,
    );
  }
}

await main();
