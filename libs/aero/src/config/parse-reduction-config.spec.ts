import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseReductionConfig } from './parse-reduction-config';
import { ReductionConfigError } from './reduction-config-error';

const MINIMAL = { tunnel: { kind: 'closed', sectionArea: 4 }, article: { referenceArea: 0.2, referenceAreaKind: 'frontal', referenceLength: 1 } };

function issues(json: unknown): string[] {
  try {
    parseReductionConfig(json);
  } catch (error) {
    if (error instanceof ReductionConfigError) return error.issues.map((i) => i.path);
    throw error;
  }
  return [];
}

describe('parseReductionConfig', () => {
  it('fills defaults: CIPM-2007 density, no corrections, 30 samples per point', () => {
    const config = parseReductionConfig(MINIMAL);
    expect(config.densityModel).toBe('cipm-2007');
    expect(config.corrections.solidBlockage).toBe('none');
    expect(config.minimumSamplesPerPoint).toBe(30);
    expect(config.zeros.loads).toEqual([0, 0, 0, 0, 0, 0]);
  });
  it('SAE J1252 defaults 55 mph and 7 mph in m/s (NIST SP 811: 1 mph = 0.44704 m/s)', () => {
    const config = parseReductionConfig({ ...MINIMAL, windAveraging: {} });
    expect(config.windAveraging?.vehicleSpeed).toBeCloseTo(55 * 0.44704, 12);
    expect(config.windAveraging?.windSpeed).toBeCloseTo(7 * 0.44704, 12);
  });
  it('names the path of each bad field', () => {
    expect(issues({ ...MINIMAL, tunnel: { kind: 'closed', sectionArea: -1 } })).toEqual(['tunnel.sectionArea']);
    expect(issues({ ...MINIMAL, corrections: { solidBlockage: 'thom' } })).toEqual(['tunnel.tunnelShapeFactor', 'article.modelVolume']);
    expect(issues({ ...MINIMAL, balance: { calibration: { linear: [[1, 2]] } } })[0]).toMatch(/^balance\.calibration\.linear/);
    expect(issues({ ...MINIMAL, surprise: 1 })).toEqual(['']);
  });
  it('refuses a tare table whose rows do not match its breakpoints', () => {
    const tare = { yaw: [0, 10], pitch: [0], loads: [[[0, 0, 0, 0, 0, 0]]] };
    expect(issues({ ...MINIMAL, zeros: { tare } })).toEqual(['zeros.tare.loads']);
  });
  it('reports invalid JSON as such', () => {
    expect(() => parseReductionConfig('{ nope', 'c.json')).toThrow(/c\.json: \(root\): is not valid JSON/);
  });
  it('accepts both example configurations', () => {
    for (const name of ['closed-car-yaw-sweep', 'open-jet-bridges']) {
      const text = readFileSync(new URL(`../../examples/${name}.config.json`, import.meta.url), 'utf8');
      expect(parseReductionConfig(text).article.referenceAreaKind).toBe('frontal');
    }
  });
});
