/**
 * Result-sheet benchmark: renders the invented sample sheet with extra configurations so that it runs to 8 A4 pages
 * with its 4 charts, and prints the wall time of the first (cold) render, which loads fonts and chart.js, then the
 * wall and CPU time of five warm rounds in this one process, their medians, the page count and the file size.
 * Target: median wall time ≤ 1.5 s on the 2-core development machine.
 *
 * Run: npm run bench:report [-- rounds] [-- out.pdf]
 */
import { writeFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { renderResultSheet } from '../../apps/api/src/reports/render-result-sheet';
import { buildSampleResultSheet } from '../../apps/api/src/reports/sample-result-sheet';

const rounds = Number(process.argv[2] ?? 5);
const out = process.argv[3];
const TARGET_PAGES = 8;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

function pageCount(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type \/Page\b/g) ?? []).length;
}

/** Adds configurations until the sheet reaches the target page count. */
let coldSeconds: number | undefined;

async function eightPageSheet() {
  for (let extra = 0; extra <= 8; extra++) {
    const data = await buildSampleResultSheet({ extraConfigurations: extra });
    const start = process.hrtime.bigint();
    const pages = pageCount(await renderResultSheet(data));
    coldSeconds ??= Number(process.hrtime.bigint() - start) / 1e9;
    if (pages >= TARGET_PAGES) return { data, pages, extra };
  }
  throw new Error(`The sample sheet did not reach ${TARGET_PAGES} pages`);
}

const { data, pages, extra } = await eightPageSheet();
const points = data.configurations.reduce((n, c) => n + c.points.length, 0);
console.log(`result sheet: ${pages} pages, ${data.configurations.length} configurations (${extra} extra), ${points} points, 4 charts`);
console.log(`first (cold) render in this process: wall ${(coldSeconds ?? NaN).toFixed(3)} s`);
console.log(`machine: ${cpus().length} × ${cpus()[0]?.model ?? 'unknown CPU'}, Node ${process.version}`);

const walls: number[] = [];
const cpuTimes: number[] = [];
let pdf: Buffer | undefined;
for (let round = 1; round <= rounds; round++) {
  const cpu = process.cpuUsage();
  const start = process.hrtime.bigint();
  pdf = await renderResultSheet(data);
  const wall = Number(process.hrtime.bigint() - start) / 1e9;
  const used = process.cpuUsage(cpu);
  const cpuSeconds = (used.user + used.system) / 1e6;
  walls.push(wall);
  cpuTimes.push(cpuSeconds);
  console.log(`round ${round}: wall ${wall.toFixed(3)} s, CPU ${cpuSeconds.toFixed(3)} s`);
}
console.log(`median wall ${median(walls).toFixed(3)} s, median CPU ${median(cpuTimes).toFixed(3)} s (target ≤ 1.5 s)`);
if (!pdf) throw new Error('No rounds were run');
console.log(`size ${pdf.length} bytes (${(pdf.length / 1024).toFixed(1)} KiB), ${pageCount(pdf)} pages`);
if (out) {
  writeFileSync(out, pdf);
  console.log(`written to ${out}`);
}
