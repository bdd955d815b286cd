import { describe, expect, it } from 'vitest';
import { applyImportProfile, parseImportProfile, type ImportProfileInput } from './import-profile';
import { readRunFile } from './read-run-file';
import { RunFileError } from './run-file-error';
import { chunksOf, copySample, type SampleCopy } from './run-file-fixture';

/** An invented legacy layout: a title line, names and units rows, semicolons and decimal commas. */
const LEGACY = [
  'Hall B logger export (invented)',
  'Zeit;Punkt;Gier;Nick;Staudruck;Luftdruck;Temp;Feuchte;Kx;Ky;Kz;Lx;Ly;Lz;Kommentar',
  's;-;deg;deg;Pa;hPa;degC;%;N;N;N;N m;N m;N m;-',
  '0,000;1;0,0;2,5;850,2;1013,25;20,5;45;12,5;-0,3;150,2;0,01;-2,5;0,03;ok',
  '0,002;1;0,0;2,5;851,0;1013,25;20,5;45;12,6;-0,3;150,4;0,01;-2,5;0,03;ok',
].join('\r\n') + '\r\n';

const LEGACY_PROFILE: ImportProfileInput = {
  name: 'hall-b-logger',
  delimiter: ';',
  decimalComma: true,
  skipLines: 1,
  unitsRow: true,
  columns: [
    { source: 'Zeit', channel: 'time' },
    { source: 'Punkt', channel: 'point' },
    { source: 'Gier', channel: 'yaw' },
    { source: 'Nick', channel: 'pitch' },
    { source: 'Staudruck', channel: 'q' },
    { source: 'Luftdruck', channel: 'p_baro' },
    { source: 'Temp', channel: 'T_air' },
    { source: 'Feuchte', channel: 'RH' },
    { source: 'Kx', channel: 'Fx' },
    // The logger's side force is positive to port; our balance axes want starboard: flip the sign.
    { source: 'Ky', channel: 'Fy', scale: -1 },
    { source: 'Kz', channel: 'Fz' },
    { source: 'Lx', channel: 'Mx' },
    { source: 'Ly', channel: 'My' },
    { source: 'Lz', channel: 'Mz' },
    { source: 'Kommentar', drop: true },
  ],
};

async function readThrough(text: string, profile: ImportProfileInput, chunkSize?: number) {
  const samples: SampleCopy[] = [];
  const bytes = Buffer.from(text);
  const summary = await readRunFile(applyImportProfile(chunksOf(bytes, chunkSize ?? bytes.length), profile, 'legacy.txt'), {
    fileName: 'legacy.txt',
    onSample: (s) => samples.push(copySample(s)),
  });
  return { samples, summary };
}

async function collect(stream: AsyncIterable<string>): Promise<string> {
  let text = '';
  for await (const piece of stream) text += piece;
  return text;
}

describe('applyImportProfile', () => {
  it('maps a legacy layout onto canonical text, line for line', async () => {
    const text = await collect(applyImportProfile([Buffer.from(LEGACY)], LEGACY_PROFILE));
    const lines = text.split('\n');
    expect(lines[0]).toBe('#');
    expect(lines[1]).toBe('time [s], point [-], yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]');
    expect(lines[2].startsWith('#')).toBe(true);
    expect(lines[3]).toBe('0.000, 1, 0.0, 2.5, 850.2, 1013.25, 20.5, 45, 12.5, 0.3, 150.2, 0.01, -2.5, 0.03');
    expect(lines).toHaveLength(6);
  });

  it('gives samples the reader converts to SI, with source line numbers', async () => {
    const { samples, summary } = await readThrough(LEGACY, LEGACY_PROFILE);
    expect(summary.header.headerLine).toBe(2);
    expect(samples.map((s) => s.line)).toEqual([4, 5]);
    expect(samples[0].dynamicPressure).toBe(850.2);
    expect(samples[0].loads[1]).toBe(0.3);
    expect(samples[1].loads[2]).toBe(150.4);
    // 1013.25 hPa = 101325 Pa (SI prefix h = 1e2)
    expect(samples[0].barometricPressure).toBeCloseTo(101_325, 9);
  });

  it('gives the same result for any chunk size', async () => {
    const whole = await readThrough(LEGACY, LEGACY_PROFILE);
    for (const size of [1, 7, 64]) expect((await readThrough(LEGACY, LEGACY_PROFILE, size)).samples).toEqual(whole.samples);
  });

  it('keeps source line numbers in reader issues', async () => {
    const bad = LEGACY.replace('851,0', 'n.v.');
    const reading = readThrough(bad, LEGACY_PROFILE);
    await expect(reading).rejects.toBeInstanceOf(RunFileError);
    const error = (await reading.catch((e: unknown) => e)) as RunFileError;
    expect(error.issues.map((i) => [i.code, i.line])).toEqual([['NOT_A_NUMBER', 5]]);
  });

  it('keeps unmapped columns whose names are canonical, and bracket units in the names row', async () => {
    const text = 'time [s],point,yaw [deg],pitch [deg],Q [Pa],p_baro [kPa],T_air [K],RH [1],Fx [N],Fy [N],Fz [N],Mx [N m],My [N m],Mz [N m]\n0,2,0,0,800,101.3,293,0.5,1,2,3,4,5,6\n';
    const { samples } = await readThrough(text, { name: 'renamed-q', columns: [{ source: 'Q', channel: 'q', unit: 'kPa' }] });
    // The profile's unit overrides the source bracket: 800 kPa = 800000 Pa.
    expect(samples[0].dynamicPressure).toBe(800_000);
    expect(samples[0].relativeHumidity).toBe(0.5);
  });

  it('keeps a cut-off last line cut off, so the reader reports TRUNCATED', async () => {
    const cut = LEGACY.slice(0, LEGACY.lastIndexOf(';2,5;'));
    await expect(readThrough(cut, LEGACY_PROFILE)).rejects.toThrow('TRUNCATED');
  });

  it('throws PROFILE_MISMATCH for a listed column the file lacks', async () => {
    const text = LEGACY.replace('Staudruck', 'Druck');
    const error = (await readThrough(text, LEGACY_PROFILE).catch((e: unknown) => e)) as RunFileError;
    expect(error.issues.map((i) => [i.code, i.line, i.column])).toEqual([['PROFILE_MISMATCH', 2, 1]]);
    expect(error.issues[0].message).toContain('"Staudruck"');
  });

  it('throws PROFILE_MISMATCH for a units row of another length', async () => {
    const text = LEGACY.replace('s;-;deg;', 's;deg;');
    const error = (await readThrough(text, LEGACY_PROFILE).catch((e: unknown) => e)) as RunFileError;
    expect(error.issues.map((i) => [i.code, i.line])).toEqual([['PROFILE_MISMATCH', 3]]);
  });

  it('throws BINARY_FILE for invalid UTF-8', async () => {
    const bytes = Buffer.concat([Buffer.from('title\nZeit;'), Buffer.from([0xff, 0xfe]), Buffer.from('\n')]);
    const reading = readRunFile(applyImportProfile([bytes], LEGACY_PROFILE, 'bin.txt'), { fileName: 'bin.txt', onSample: () => {} });
    await expect(reading).rejects.toThrow('BINARY_FILE');
  });
});

describe('parseImportProfile', () => {
  it('fills defaults', () => {
    expect(parseImportProfile({ name: 'plain' })).toEqual({
      name: 'plain', delimiter: ',', decimalComma: false, skipLines: 0, unitsRow: false, columns: [], unmappedColumns: 'keep',
    });
  });

  it('rejects a decimal comma with a comma delimiter', () => {
    expect(() => parseImportProfile({ name: 'x', decimalComma: true })).toThrow('delimiter: decimalComma needs a delimiter other than ","');
  });

  it('rejects an unknown target channel and a zero scale, naming the field', () => {
    expect(() => parseImportProfile({ name: 'x', columns: [{ source: 'a', channel: 'lift' }] })).toThrow('columns.0.channel');
    expect(() => parseImportProfile({ name: 'x', columns: [{ source: 'a', scale: 0 }] })).toThrow('columns.0.scale: must not be 0');
  });
});
