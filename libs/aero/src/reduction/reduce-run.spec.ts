import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { parseReductionConfig, type ReductionConfigInput } from '../config';
import { DESIGN_CAUTION } from './design-caution';
import { formatResultCsv } from './format-result-csv';
import { reduceRun } from './reduce-run';
import { ReductionError } from './reduction-error';
import { CHANNEL_INDEX, SAMPLE_CHANNELS } from './sample-channels';

const HEADER = 'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]';
const BASE: ReductionConfigInput = {
  tunnel: { kind: 'closed', sectionArea: 4 },
  article: { referenceArea: 0.2, referenceAreaKind: 'frontal', referenceLength: 1 },
  minimumSamplesPerPoint: 1,
};

function file(rows: string[]): Buffer {
  return Buffer.from(`${HEADER}\n${rows.join('\n')}\n`);
}

async function reduce(rows: string[], overrides: Partial<ReductionConfigInput> = {}) {
  return reduceRun([file(rows)], parseReductionConfig({ ...BASE, ...overrides }), { fileName: 'run.csv' });
}

const ROW = (point: number, q: number, fx = 60) => `0.0, ${point}, 0, 0, ${q}, 1013.25, 20, 50, ${fx}, 0, 10, 0, 0, 0`;

describe('reduceRun', () => {
  it('C_D = D/(q·S) at zero yaw and pitch: 60 N on 0.2 m² at 600 Pa gives 0.5 (definition)', async () => {
    const result = await reduce([ROW(1, 600), ROW(1, 600)]);
    const point = result.points[0];
    expect(point.corrected.dragCoefficient.value).toBeCloseTo(0.5, 12);
    expect(point.dragArea).toBeCloseTo(0.1, 12);
    expect(point.dragCounts).toBeCloseTo(5000, 8);
    // L/D = (10/120)/(60/120) = 1/6.
    expect(point.liftToDragRatio).toBeCloseTo(1 / 6, 12);
    // CIPM-2007 at 20 °C, 1013.25 hPa, 50 % RH: 1.199314 kg/m³ ±2e-6 (Picard et al. 2008, Metrologia 45:149).
    expect(Math.abs(point.density - 1.199314)).toBeLessThan(2e-6);
    expect(point.uncorrectedSpeed).toBeCloseTo(Math.sqrt(1200 / point.density), 10);
  });

  it('zero wind is a clear error at the line of the sample, not Infinity', async () => {
    const error = await reduce([ROW(1, 600), ROW(2, 0)]).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ReductionError);
    expect((error as ReductionError).code).toBe('ZERO_WIND');
    expect((error as ReductionError).line).toBe(3);
    expect((error as Error).message).toMatch(/^run\.csv:3:1: ZERO_WIND .*positive dynamic pressure/);
  });

  it('records the engine version, the SHA-256 of the input (FIPS 180-4 via node:crypto), the config and the caution', async () => {
    const bytes = file([ROW(1, 600)]);
    const result = await reduceRun([bytes], parseReductionConfig(BASE), { fileName: 'run.csv' });
    expect(result.inputSha256).toBe(createHash('sha256').update(bytes).digest('hex'));
    expect(result.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    expect(result.config.densityModel).toBe('cipm-2007');
    expect(result.caution).toBe(DESIGN_CAUTION);
    expect(DESIGN_CAUTION).toMatch(/not design loads/);
  });

  it('warns with codes: blockage over 7.5 % (BRP rule of thumb, attribution from memory), Mach over 0.3 (common practice), few samples, over capacity, CIPM range (Picard 2008)', async () => {
    const result = await reduce(['0.0, 1, 0, 0, 70000, 1013.25, 30, 50, 600, 0, 10, 0, 0, 0'], {
      article: { referenceArea: 0.32, referenceAreaKind: 'frontal', referenceLength: 1 },
      balance: { capacities: [500, 500, 500, 50, 50, 50] },
      minimumSamplesPerPoint: 10,
    });
    const codes = result.warnings.map((w) => w.code).sort();
    // 0.32/4 = 8 % > 7.5 %; q = 70 kPa at ρ ≈ 1.16 gives V ≈ 347 m/s, Mach ≈ 1.0; 30 °C is outside 15–27 °C.
    expect(codes).toEqual(['BLOCKAGE_OVER_7_5', 'CIPM_OUT_OF_VALIDITY', 'FEW_SAMPLES', 'LOAD_OVER_CAPACITY', 'MACH_OVER_0_3']);
  });

  it('warns BLOCKAGE_OVER_10 above 10 % (classical corrections doubtful; common practice, from memory) and BLOCKAGE_UNKNOWN without a frontal area', async () => {
    const big = await reduce([ROW(1, 600)], { article: { referenceArea: 0.5, referenceAreaKind: 'frontal', referenceLength: 1 } });
    expect(big.warnings.map((w) => w.code)).toEqual(['BLOCKAGE_OVER_10']);
    const unknown = await reduce([ROW(1, 600)], { article: { referenceArea: 0.5, referenceAreaKind: 'planform', referenceLength: 1 } });
    expect(unknown.warnings.map((w) => w.code)).toEqual(['BLOCKAGE_UNKNOWN']);
  });

  it('frontal-area blockage: A 3.06 ft², C 64.5 ft² gives ε 0.011860 and q factor 1.02386 (BRP/Pope; published 1.024)', async () => {
    const ft2 = 0.09290304; // NIST SP 811: 1 ft² = 0.09290304 m² exactly
    const result = await reduce([ROW(1, 600)], {
      tunnel: { kind: 'closed', sectionArea: 64.5 * ft2 },
      article: { referenceArea: 3.06 * ft2, referenceAreaKind: 'frontal', referenceLength: 1 },
      corrections: { solidBlockage: 'frontal-area' },
    });
    const c = result.points[0].corrections;
    expect(Math.abs(c.solidBlockage - 0.01186)).toBeLessThan(1e-6);
    expect(Math.abs(c.dynamicPressureRatio - 1.02386)).toBeLessThan(1e-5);
  });

  it('Maskell: θ 2.5, C_Du 1.2, S/C 0.05 gives q_c/q_u 1.15 and C_Dc 1.043478 (Maskell 1963)', async () => {
    // 0.2 m² in 4 m² is S/C = 0.05; C_Du = 1.2 needs D = 1.2·600·0.2 = 144 N.
    const result = await reduce([ROW(1, 600, 144)], { corrections: { wakeBlockage: 'maskell' } });
    const point = result.points[0];
    expect(point.corrections.dynamicPressureRatio).toBeCloseTo(1.15, 12);
    expect(Math.abs(point.corrected.dragCoefficient.value - 1.043478)).toBeLessThan(1e-6);
    expect(point.corrections.wakeBlockageMethod).toBe('maskell');
  });

  it('stops with MISSING_Q_FACTOR when the file gives dp_ref without a factor', async () => {
    const text = `${HEADER.replace('q [Pa]', 'dp_ref [Pa]')}\n${ROW(1, 600)}\n`;
    const error = await reduceRun([Buffer.from(text)], parseReductionConfig(BASE), { fileName: 'run.csv' }).catch((e: unknown) => e);
    expect((error as ReductionError).code).toBe('MISSING_Q_FACTOR');
  });

  it('stops with MISSING_CALIBRATION when the file gives bridges without a calibration', async () => {
    const header = HEADER.replace(/F([xyz]) \[N\]/g, 'R$1 [mV/V]').replace('Rx', 'R1').replace('Ry', 'R2').replace('Rz', 'R3').replace('Mx [N m]', 'R4 [mV/V]').replace('My [N m]', 'R5 [mV/V]').replace('Mz [N m]', 'R6 [mV/V]');
    const error = await reduceRun([Buffer.from(`${header}\n${ROW(1, 600)}\n`)], parseReductionConfig(BASE), { fileName: 'run.csv' }).catch((e: unknown) => e);
    expect((error as ReductionError).code).toBe('MISSING_CALIBRATION');
  });

  it('formats CSV with the caution, the reference area kind and one row per point', async () => {
    const csv = formatResultCsv(await reduce([ROW(1, 600), ROW(2, 610)]));
    const lines = csv.trimEnd().split('\n');
    expect(lines.some((l) => l.startsWith('# caution: ') && l.includes('not design loads'))).toBe(true);
    expect(lines.some((l) => l.includes('(frontal)'))).toBe(true);
    const header = lines.findIndex((l) => l.startsWith('point,'));
    expect(lines.length - header - 1).toBe(2);
    const columns = lines[header].split(',');
    const cd = columns.indexOf('CD_c');
    expect(Number(lines[header + 1].split(',')[cd])).toBeCloseTo(0.5, 12);
  });

  it('CHANNEL_INDEX matches SAMPLE_CHANNELS', () => {
    SAMPLE_CHANNELS.forEach((name, i) => expect(CHANNEL_INDEX[name]).toBe(i));
  });
});
