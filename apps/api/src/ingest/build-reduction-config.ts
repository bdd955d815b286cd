import { parseReductionConfig, ReductionConfigError, type ReductionConfig } from '@tunnelwright/aero';
import type { ReductionOverrides } from '@tunnelwright/contracts';
import type { BalanceCalibration, TestRecord } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';

/** Drops keys whose value is undefined, so the engine's defaults apply to them. */
function defined<T extends Record<string, unknown>>(value: T): Partial<T> {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as Partial<T>;
}

/**
 * Builds the full reduction configuration of a run from its test (tunnel, article, balance and the
 * test's reduction settings), the balance's current calibration and the request's overrides, and checks
 * it with the engine's own schema. `test.article`, `test.tunnel` and `test.balance` must be loaded.
 *
 * @throws HttpError 400 naming each bad field as `config.<path>` when the combination is not reducible
 */
export function buildReductionConfig(test: TestRecord, calibration: BalanceCalibration | undefined, overrides: ReductionOverrides): ReductionConfig {
  const { article, tunnel, balance } = test;
  if (!article || !tunnel) throw new Error('buildReductionConfig requires the test with its article and tunnel loaded');
  const settings = test.reductionSettings ?? {};
  const openJet = tunnel.openJetConstants ?? {};
  const raw = defined({
    tunnel: defined({
      name: tunnel.name,
      kind: tunnel.kind,
      sectionArea: tunnel.area,
      width: tunnel.width,
      height: tunnel.height,
      tunnelShapeFactor: tunnel.shapeFactor,
      pressureGradient: tunnel.pressureGradient,
      openJet: { jetExpansion: openJet.jetExpansion ?? 0, nozzleBlockage: openJet.nozzleBlockage ?? 0, collectorBlockage: openJet.collectorBlockage ?? 0 },
    }),
    article: defined({
      name: article.name,
      referenceArea: overrides.referenceArea ?? article.referenceArea,
      referenceAreaKind: overrides.referenceAreaKind ?? article.referenceAreaKind,
      referenceLength: article.referenceLength,
      modelVolume: article.volume,
      frontalArea: article.frontalArea ?? undefined,
      momentReferenceCentre: [article.momentCentreX, article.momentCentreY, article.momentCentreZ],
      scale: article.scale,
    }),
    balance: defined({
      capacities: balance?.capacities,
      calibration: calibration ? defined({ linear: calibration.matrices.linear, interaction: calibration.matrices.interaction }) : undefined,
      centreOffset: settings.centreOffset,
    }),
    zeros: settings.zeros,
    corrections: { ...settings.corrections, ...overrides.corrections },
    densityModel: overrides.densityModel ?? settings.densityModel,
    qFactor: overrides.qFactor ?? settings.qFactor,
    fullScale: settings.fullScale,
    windAveraging: settings.windAveraging,
    uncertainty: settings.uncertainty,
    minimumSamplesPerPoint: overrides.minimumSamplesPerPoint ?? settings.minimumSamplesPerPoint,
  });
  try {
    return parseReductionConfig(raw, 'reduction configuration');
  } catch (error) {
    if (error instanceof ReductionConfigError) {
      const errors = error.issues.map((issue) => ({ field: `config.${issue.path}`, message: issue.message }));
      throw new HttpError(400, 'The run cannot be reduced with these settings', errors.map((e) => `${e.field}: ${e.message}`).join('; '), errors);
    }
    throw error;
  }
}
