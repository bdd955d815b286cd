import { BalanceCalibration, TestArticle, TestRecord, Tunnel, Balance } from '@tunnelwright/db';
import { describe, expect, it } from 'vitest';
import { HttpError } from '../errors/http-error';
import { buildReductionConfig } from './build-reduction-config';

const identity = [0, 1, 2, 3, 4, 5].map((i) => [0, 1, 2, 3, 4, 5].map((j) => (i === j ? 1 : 0)));

function testRecord(settings: TestRecord['reductionSettings'] = {}): TestRecord {
  const tunnel = Tunnel.fromJson({ name: 'Hall', kind: 'open_jet', description: '', width: 2.8, height: 2.15, area: 6, length: 5, minSpeed: 0, maxSpeed: 60, pressureGradient: -0.9, shapeFactor: 0.86, openJetConstants: { jetExpansion: -0.01, nozzleBlockage: 0.004 }, capabilities: {} }, { skipValidation: true });
  const article = TestArticle.fromJson({ name: 'Van', referenceArea: 0.35, referenceAreaKind: 'frontal', referenceLength: 1.2, volume: 0.46, frontalArea: null, momentCentreX: 0.1, momentCentreY: 0, momentCentreZ: -0.2, scale: 2.5 }, { skipValidation: true });
  const balance = Balance.fromJson({ identifier: 'B1', capacities: [600, 600, 2500, 250, 400, 250] }, { skipValidation: true });
  return Object.assign(TestRecord.fromJson({ reductionSettings: settings }, { skipValidation: true }), { tunnel, article, balance });
}

const calibration = BalanceCalibration.fromJson({ matrices: { linear: identity }, version: 1, dueOn: '2099-01-01' }, { skipValidation: true });

describe('buildReductionConfig', () => {
  it('takes the section from the tunnel, S, L, volume and centre from the article, capacities and matrix from the balance', () => {
    const config = buildReductionConfig(testRecord(), calibration, {});
    expect(config.tunnel).toMatchObject({ kind: 'open_jet', sectionArea: 6, pressureGradient: -0.9, openJet: { jetExpansion: -0.01, nozzleBlockage: 0.004, collectorBlockage: 0 } });
    expect(config.article).toMatchObject({ referenceArea: 0.35, referenceAreaKind: 'frontal', referenceLength: 1.2, modelVolume: 0.46, momentReferenceCentre: [0.1, 0, -0.2], scale: 2.5 });
    expect(config.balance.capacities).toEqual([600, 600, 2500, 250, 400, 250]);
    expect(config.balance.calibration?.linear).toEqual(identity);
    expect(config.densityModel).toBe('cipm-2007');
  });

  it('lets the request override corrections, density model and reference area over the test settings', () => {
    const config = buildReductionConfig(testRecord({ corrections: { solidBlockage: 'frontal-area', horizontalBuoyancy: true }, densityModel: 'cipm-2007' }), calibration, {
      corrections: { solidBlockage: 'none' },
      densityModel: 'ideal-gas-buck',
      referenceArea: 0.4,
      referenceAreaKind: 'other',
    });
    expect(config.corrections).toMatchObject({ solidBlockage: 'none', horizontalBuoyancy: true });
    expect(config.densityModel).toBe('ideal-gas-buck');
    expect(config.article).toMatchObject({ referenceArea: 0.4, referenceAreaKind: 'other' });
  });

  it('answers 400 naming config.<path> when the engine refuses the combination', () => {
    try {
      buildReductionConfig(testRecord(), calibration, { corrections: { solidBlockage: 'frontal-area' }, referenceAreaKind: 'planform' });
      expect.unreachable('should throw');
    } catch (error) {
      expect(error).toBeInstanceOf(HttpError);
      expect((error as HttpError).status).toBe(400);
      expect((error as HttpError).errors).toEqual([{ field: 'config.article.frontalArea', message: expect.stringContaining('frontal-area blockage') }]);
    }
  });
});
