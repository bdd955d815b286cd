import { readFileSync } from 'node:fs';
import { Readable } from 'node:stream';
import { fileURLToPath } from 'node:url';
import { parseReductionConfig, reduceRun } from '@tunnelwright/aero';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { neutraliseCell, pointsCsv } from './points-csv';

const examples = new URL('../../../../libs/aero/examples/', import.meta.url);

// The trigger characters are those of the OWASP "CSV Injection" page: =, +, -, @, tab (0x09) and carriage return (0x0D).
describe('neutraliseCell', () => {
  it.each([['=HYPERLINK("http://x.example","y")'], ['+cmd|calc!A0'], ['-2+3'], ['@SUM(1+1)'], ['\tleading tab'], ['\rleading carriage return']])(
    'prefixes an apostrophe to %j so a spreadsheet reads it as text',
    (cell) => {
      expect(neutraliseCell(cell)).toBe(`'${cell}`);
    },
  );

  it('leaves other text, an empty cell and a trigger character later in the cell alone', () => {
    expect(neutraliseCell('Mirrors off')).toBe('Mirrors off');
    expect(neutraliseCell('')).toBe('');
    expect(neutraliseCell('a=b, c-d, @e')).toBe('a=b, c-d, @e');
  });
});

describe('pointsCsv', () => {
  it('neutralises every text cell that could start a formula and keeps numbers as signed numbers', async () => {
    const config = parseReductionConfig(JSON.parse(readFileSync(fileURLToPath(new URL('closed-car-yaw-sweep.config.json', examples)), 'utf8')));
    const reduced = await reduceRun(Readable.from([readFileSync(fileURLToPath(new URL('closed-car-yaw-sweep.csv', examples)))]), config, { fileName: 'closed-car-yaw-sweep.csv' });
    const points = reduced.points.map((result, index) => ({ index, result }));
    const reasons = ['-1 count offset seen', '\tstarts with a tab', '\rstarts with a carriage return'];
    const csv = pointsCsv('Run 1, reduction version 1', [{ runNumber: 1, configurationLabel: '-mirrors', version: 1, points, exclusions: new Map(reasons.map((r, i) => [i, r])) }]);
    const rows = parse(csv, { relax_column_count: true }) as string[][];
    expect(rows[0]).toEqual(['# Run 1, reduction version 1']);
    const header = rows[2]!;
    const body = rows.slice(3);
    const col = (name: string) => header.indexOf(name);
    expect(body).toHaveLength(points.length);
    expect(body.slice(0, 3).map((r) => r[col('exclusion_reason')])).toEqual(reasons.map((r) => `'${r}`));
    expect(body.every((r) => r[col('configuration')] === "'-mirrors")).toBe(true);
    expect(body.some((r) => Number(r[col('yaw_deg')]) < 0)).toBe(true);
  });
});
