/**
 * Reduction benchmark: generates a 1,000,000-row, 14-column canonical run file (~100 MB) in the OS temp
 * folder, then, in this one process, times a plain byte read of the file and `reduceRun` on it.
 * Prints rows/s, wall time, the ratio reduction / plain read and the peak RSS.
 *
 * Run: npm run bench:reduce [-- rows]
 */
import { createReadStream, createWriteStream, existsSync, statSync } from 'node:fs';
import { once } from 'node:events';
import { cpus, tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseReductionConfig } from '../../libs/aero/src/config';
import { reduceRun } from '../../libs/aero/src/reduction';
import { readRunFile } from '../../libs/aero/src/run-file';

const HEADER =
  'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]\n';

/** Invented run: 1000 samples per point, yaw sweeping −10…+10 deg, small wobble on every channel. */
async function generate(path: string, rows: number): Promise<void> {
  const out = createWriteStream(path);
  out.write('# run: 9001\n# tunnel: bench hall (invented)\n# model: bench body (invented)\n');
  out.write(HEADER);
  let batch = '';
  for (let i = 0; i < rows; i++) {
    const point = Math.floor(i / 1000) + 1;
    const yaw = ((point % 21) - 10).toFixed(2);
    const w = Math.sin(i * 0.37);
    batch +=
      `${(i * 0.002).toFixed(3)}, ${point}, ${yaw}, 0.00, ${(1500 + w).toFixed(2)}, ${(1008.6 + w * 0.1).toFixed(2)}, ${(21.3 + w * 0.05).toFixed(2)}, ` +
      `${(48 + w).toFixed(1)}, ${(65.4 + w * 0.8).toFixed(3)}, ${(-0.3 + w * 0.05).toFixed(3)}, ${(16.6 + w * 0.3).toFixed(3)}, ` +
      `${(0.012 + w * 1e-3).toFixed(5)}, ${(-6.1 + w * 0.1).toFixed(4)}, ${(0.03 + w * 0.002).toFixed(5)}\n`;
    if (batch.length > 1 << 20) {
      if (!out.write(batch)) await once(out, 'drain');
      batch = '';
    }
  }
  out.end(batch);
  await once(out, 'finish');
}

const config = parseReductionConfig({
  tunnel: { kind: 'closed', sectionArea: 4.32, tunnelShapeFactor: 0.86, pressureGradient: -1.8 },
  article: { referenceArea: 0.1375, referenceAreaKind: 'frontal', referenceLength: 0.72, modelVolume: 0.105 },
  balance: { capacities: [400, 400, 1200, 120, 200, 120] },
  zeros: { tare: { yaw: [-12, 0, 12], pitch: [-1, 1], loads: [[[0.1, 0, -0.6, 0, 0.1, 0], [0.1, 0, -0.6, 0, 0.1, 0]], [[0, 0, -0.6, 0, 0.12, 0], [0, 0, -0.6, 0, 0.12, 0]], [[-0.1, 0, -0.6, 0, 0.1, 0], [-0.1, 0, -0.6, 0, 0.1, 0]]] } },
  corrections: { solidBlockage: 'thom', wakeBlockage: 'streamlined', horizontalBuoyancy: true },
  uncertainty: { loads: [0.4, 0.4, 1, 0.05, 0.08, 0.05], dynamicPressure: 1.5 },
});

async function plainRead(path: string): Promise<number> {
  let bytes = 0;
  for await (const chunk of createReadStream(path, { highWaterMark: 1 << 20 })) bytes += (chunk as Buffer).length;
  return bytes;
}

/** Wall time and CPU time (user + system) of one piece of work, s. CPU time is steadier on a shared machine. */
async function timed<T>(work: () => Promise<T>): Promise<[T, number, number]> {
  const cpu = process.cpuUsage();
  const start = process.hrtime.bigint();
  const value = await work();
  const wall = Number(process.hrtime.bigint() - start) / 1e9;
  const used = process.cpuUsage(cpu);
  return [value, wall, (used.user + used.system) / 1e6];
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const ROUNDS = 3;

const rows = process.argv[2] ? Number(process.argv[2]) : 1_000_000;
const path = join(tmpdir(), `tunnelwright-bench-reduce-${rows}.csv`);
if (!existsSync(path)) await generate(path, rows);
const size = statSync(path).size;
console.log(`file ${path}: ${rows} rows, ${(size / 1e6).toFixed(1)} MB; ${cpus()[0]?.model ?? 'cpu'} ×${cpus().length}, node ${process.version}`);
await plainRead(path); // warm the page cache so every timing reads from memory
const plain: number[][] = [];
const reader: number[][] = [];
const reduce: number[][] = [];
let points = 0;
let firstRoundRss = 0;
for (let round = 1; round <= ROUNDS; round++) {
  const [, plainWall, plainCpu] = await timed(() => plainRead(path));
  // The reader alone, for scale: the part of the reduction that is parsing.
  const [, readerWall, readerCpu] = await timed(() => readRunFile(createReadStream(path, { highWaterMark: 1 << 20 }), { fileName: path, onSample: () => undefined }));
  const [result, reduceWall, reduceCpu] = await timed(() => reduceRun(createReadStream(path, { highWaterMark: 1 << 20 }), config, { fileName: path }));
  if (result.sampleCount !== rows) throw new Error(`bench-reduce: reduced ${result.sampleCount} rows, expected ${rows}`);
  points = result.points.length;
  if (round === 1) firstRoundRss = process.resourceUsage().maxRSS / 1024;
  plain.push([plainWall, plainCpu]);
  reader.push([readerWall, readerCpu]);
  reduce.push([reduceWall, reduceCpu]);
  console.log(
    `round ${round}: plain read ${plainWall.toFixed(3)} s wall / ${plainCpu.toFixed(3)} s CPU | readRunFile ${readerWall.toFixed(3)} / ${readerCpu.toFixed(3)} | ` +
      `reduceRun ${reduceWall.toFixed(3)} / ${reduceCpu.toFixed(3)}`,
  );
}
const [plainWall, plainCpu] = [median(plain.map((x) => x[0])), median(plain.map((x) => x[1]))];
const [readerWall, readerCpu] = [median(reader.map((x) => x[0])), median(reader.map((x) => x[1]))];
const [reduceWall, reduceCpu] = [median(reduce.map((x) => x[0])), median(reduce.map((x) => x[1]))];
console.log(`median of ${ROUNDS} rounds (wall / CPU):`);
console.log(`  plain read:        ${plainWall.toFixed(3)} s / ${plainCpu.toFixed(3)} s (${(size / 1e6 / plainWall).toFixed(0)} MB/s)`);
console.log(`  readRunFile alone: ${readerWall.toFixed(3)} s / ${readerCpu.toFixed(3)} s (${(rows / readerWall / 1e6).toFixed(3)} M rows/s)`);
console.log(`  reduceRun:         ${reduceWall.toFixed(3)} s / ${reduceCpu.toFixed(3)} s (${(rows / reduceWall / 1e6).toFixed(3)} M rows/s, ${points} points)`);
console.log(`  ratio reduction / plain read: ${(reduceWall / plainWall).toFixed(2)}× wall (target ≤ 3×); reduction / reader alone: ${(reduceWall / readerWall).toFixed(2)}× wall, ${(reduceCpu / readerCpu).toFixed(2)}× CPU`);
console.log(`  peak RSS after one plain read, one read and one reduction: ${firstRoundRss.toFixed(0)} MB (target ≤ 150 MB); after all rounds: ${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MB`);
