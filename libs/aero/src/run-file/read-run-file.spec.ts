import { describe, expect, it } from 'vitest';
import { readRunFile, readRunFileText } from './read-run-file';
import { RunFileError } from './run-file-error';
import { CANONICAL_HEADER, CANONICAL_ROW, canonicalFile, readAll } from './run-file-fixture';
import type { RunSample } from './run-sample';

const DEG = Math.PI / 180; // NIST SP 811 App. B.8: 1° = 1.745329E-02 rad (π/180 exactly)

describe('readRunFile on a canonical file', () => {
  const text = `# run: 12\n# tunnel: Hall B (invented)\n# q_factor: 1.0043\n${CANONICAL_HEADER}\n${CANONICAL_ROW}\n0.002, 2, -5.0, 10, 851.5, 1013.5, 21.0, 46.5, 1.25e1, -3E-1, 150.2, 0.01, -2.5, 0.03\n`;

  it('converts every channel to SI', async () => {
    const { samples, summary } = await readAll(text);
    expect(summary?.sampleCount).toBe(2);
    const [first, second] = samples;
    expect(first.line).toBe(5);
    expect(first.time).toBe(0);
    expect(first.point).toBe(1);
    expect(first.yaw).toBe(0);
    expect(first.pitch).toBeCloseTo(2.5 * DEG, 15);
    expect(first.dynamicPressure).toBe(850.2);
    expect(first.referencePressureDifference).toBeNaN();
    // 1 hPa = 100 Pa (SI prefix h = 1e2, NIST SP 811 Table 5)
    expect(first.barometricPressure).toBeCloseTo(101_325, 9);
    // T/K = t/°C + 273.15 (NIST SP 811 App. B.9)
    expect(first.temperature).toBeCloseTo(293.65, 12);
    expect(first.relativeHumidity).toBeCloseTo(0.45, 15);
    expect(first.speed).toBeNaN();
    expect(first.loads).toEqual([12.5, -0.3, 150.2, 0.01, -2.5, 0.03]);
    expect(first.bridges.every(Number.isNaN)).toBe(true);
    expect(second.line).toBe(6);
    expect(second.yaw).toBeCloseTo(-5 * DEG, 15);
    expect(second.loads[0]).toBe(12.5);
    expect(second.loads[1]).toBe(-0.3);
  });

  it('reports the header, metadata and counts', async () => {
    const headers: unknown[] = [];
    const summary = await readRunFileText(text, { fileName: 'run-12.csv', onHeader: (h) => headers.push(h), onSample: () => {} });
    expect(headers).toHaveLength(1);
    expect(summary.header.metadata).toEqual({ run: '12', tunnel: 'Hall B (invented)', q_factor: '1.0043' });
    expect(summary.header.headerLine).toBe(4);
    expect(summary.header.loadKind).toBe('loads');
    expect(summary.header.pressureKind).toBe('dynamic');
    expect(summary.header.columns.map((c) => c.channel)).toEqual([
      'time', 'point', 'yaw', 'pitch', 'q', 'p_baro', 'T_air', 'RH', 'Fx', 'Fy', 'Fz', 'Mx', 'My', 'Mz',
    ]);
    expect(summary.header.columns[5]).toEqual({ index: 5, name: 'p_baro', unit: 'hPa', channel: 'p_baro', siUnit: 'Pa' });
    expect(summary.lineCount).toBe(6);
    expect(summary.bytesRead).toBe(Buffer.byteLength(text));
  });

  it('reuses one sample object for every row', async () => {
    const seen = new Set<RunSample>();
    await readRunFileText(text, { fileName: 'run.csv', onSample: (s) => seen.add(s) });
    expect(seen.size).toBe(1);
  });

  it('parses numbers exactly like Number() for plain, exponent and long forms', async () => {
    const cells = ['0.1', '-0.30000000000000004', '1e-7', '6.02214076E23', '.5', '5.', '+3.25', '123456789012345678', '0.000001234567890123'];
    const rows = cells.map((cell) => `0, 1, 0, 0, 800, 1000, 20, 50, ${cell}, 0, 0, 0, 0, 0`);
    const { samples } = await readAll(canonicalFile(...rows));
    expect(samples.map((s) => s.loads[0])).toEqual(cells.map(Number));
  });
});

describe('readRunFile layouts', () => {
  it('reads dp_ref and bridge outputs, leaving q and loads NaN', async () => {
    const header = 'point, yaw [rad], pitch [rad], dp_ref [kPa], p_baro [kPa], T_air [K], RH [fraction], R1 [mV/V], R2 [mV/V], R3 [mV/V], R4 [mV/V], R5 [mV/V], R6 [mV/V]';
    const { samples, summary } = await readAll(`${header}\n3, 0.1, -0.05, 0.8, 101.3, 293.15, 0.5, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6\n`);
    expect(summary?.header.loadKind).toBe('bridges');
    expect(summary?.header.pressureKind).toBe('reference');
    const [s] = samples;
    expect(s.dynamicPressure).toBeNaN();
    expect(s.referencePressureDifference).toBe(800);
    expect(s.barometricPressure).toBeCloseTo(101_300, 9);
    expect(s.time).toBeNaN();
    expect(s.loads.every(Number.isNaN)).toBe(true);
    expect(s.bridges).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6]);
  });

  it('converts customary units on read', async () => {
    const header = 'time [ms], point, yaw [deg], pitch [deg], q [psf], p_baro [inH2O], T_air [degF], RH [%], V [mph], Fx [lbf], Fy [lbf], Fz [lbf], Mx [lbf ft], My [lbf·ft], Mz [N·m]';
    const { samples } = await readAll(`${header}\n1500, 1, 0, 0, 10, 400, 68, 50, 100, 1, 2, 3, 1, 2, 3\n`);
    const [s] = samples;
    expect(s.time).toBe(1.5);
    // NIST SP 811 App. B.8: psf 4.788026E+01 Pa, inH2O (39.2 °F) 2.49082E+02 Pa, mph 4.4704E-01 m/s,
    // lbf 4.448222E+00 N, lbf·ft 1.355818E+00 N·m; B.9: 68 °F = 20 °C = 293.15 K.
    expect(s.dynamicPressure / 478.8026 - 1).toBeLessThan(5e-7);
    expect(s.barometricPressure / (400 * 249.082) - 1).toBeLessThan(5e-7);
    expect(s.temperature).toBeCloseTo(293.15, 10);
    expect(s.speed).toBeCloseTo(44.704, 12);
    expect(Math.abs(s.loads[2] / (3 * 4.448222) - 1)).toBeLessThan(5e-7);
    expect(Math.abs(s.loads[4] / (2 * 1.355818) - 1)).toBeLessThan(5e-7);
    expect(s.loads[5]).toBe(3);
  });

  it('accepts aliases and any letter case in channel names', async () => {
    const header = 'TIME [S], Pt, YAW [DEG], Pitch [deg], q_dyn [pa], P_BAR [HPA], temperature [degc], humidity [%], fx [n], FY [N], fz [N], mx [nm], my [Nm], mz [NM]';
    const { samples, summary } = await readAll(`${header}\n${CANONICAL_ROW}\n`);
    expect(summary?.header.columns.map((c) => c.channel).slice(0, 8)).toEqual(['time', 'point', 'yaw', 'pitch', 'q', 'p_baro', 'T_air', 'RH']);
    expect(samples[0].dynamicPressure).toBe(850.2);
  });

  it('detects a semicolon delimiter from the header row', async () => {
    const semi = (line: string) => line.replaceAll(', ', ';');
    const { samples, summary } = await readAll(`${semi(CANONICAL_HEADER)}\n${semi(CANONICAL_ROW)}\n`);
    expect(summary?.header.delimiter).toBe(';');
    expect(samples[0].loads).toEqual([12.5, -0.3, 150.2, 0.01, -2.5, 0.03]);
  });

  it('strips a UTF-8 byte order mark', async () => {
    const { samples, summary } = await readAll(`\uFEFF${canonicalFile(CANONICAL_ROW)}`);
    expect(summary?.header.columns[0].name).toBe('time');
    expect(samples).toHaveLength(1);
  });

  it('handles CRLF line endings', async () => {
    const crlf = canonicalFile(CANONICAL_ROW, CANONICAL_ROW).replaceAll('\n', '\r\n');
    const { samples, summary } = await readAll(crlf);
    expect(samples).toHaveLength(2);
    expect(samples[1].loads[5]).toBe(0.03);
    expect(summary?.lineCount).toBe(3);
  });

  it('skips blank and # comment lines and accepts a last line without line ending', async () => {
    const text = `# run: 3\n\n${CANONICAL_HEADER}\n\n# a comment among rows\n${CANONICAL_ROW}\n   \n${CANONICAL_ROW}`;
    const { samples } = await readAll(text);
    expect(samples.map((s) => s.line)).toEqual([6, 8]);
  });

  it('keeps x_ extra columns in the header and ignores their cells', async () => {
    const { samples, summary } = await readAll(`${CANONICAL_HEADER}, x_note\n${CANONICAL_ROW}, Schräge flap gap wider\n`);
    expect(summary?.header.columns[14]).toEqual({ index: 14, name: 'x_note', unit: '', channel: 'extra', siUnit: '' });
    expect(samples).toHaveLength(1);
  });

  it('calls onProgress with the running byte count', async () => {
    const text = canonicalFile(CANONICAL_ROW);
    const progress: number[] = [];
    await readRunFile([Buffer.from(text.slice(0, 10)), Buffer.from(text.slice(10))], {
      fileName: 'run.csv', onSample: () => {}, onProgress: (n) => progress.push(n),
    });
    expect(progress).toEqual([10, Buffer.byteLength(text)]);
  });

  it('reads a Node stream', async () => {
    const { Readable } = await import('node:stream');
    const summary = await readRunFile(Readable.from([Buffer.from(canonicalFile(CANONICAL_ROW))]), { fileName: 'run.csv', onSample: () => {} });
    expect(summary.sampleCount).toBe(1);
  });

  it('rejects with the abort reason when aborted', async () => {
    const controller = new AbortController();
    const rows = Array.from({ length: 10 }, () => Buffer.from(`${CANONICAL_ROW}\n`));
    const reading = readRunFile([Buffer.from(`${CANONICAL_HEADER}\n`), ...rows], {
      fileName: 'run.csv', signal: controller.signal, onSample: () => controller.abort(new Error('stopped by user')),
    });
    await expect(reading).rejects.toThrow('stopped by user');
  });

  it('throws RunFileError whose message says file, line and column', async () => {
    const reading = readRunFileText(canonicalFile(CANONICAL_ROW.replace('850.2', 'abc')), { fileName: 'run-7.csv', onSample: () => {} });
    await expect(reading).rejects.toBeInstanceOf(RunFileError);
    await expect(reading).rejects.toThrow('run-7.csv:2:');
  });

  it('delivers no samples after the first issue but collects up to maxIssues', async () => {
    const bad = CANONICAL_ROW.replace('850.2', 'x');
    const { samples, issues } = await readAll(canonicalFile(CANONICAL_ROW, bad, CANONICAL_ROW, bad, bad, bad), undefined, 3);
    expect(samples.map((s) => s.line)).toEqual([2]);
    expect(issues.map((i) => i.line)).toEqual([3, 5, 6]);
  });
});
