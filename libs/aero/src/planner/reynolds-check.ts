import { requirePositive } from '../errors/require-number';
import type { FitCheck } from './fit-check';
import { SHARP_EDGE_REYNOLDS } from './fit-thresholds';

/** Inputs of {@link reynoldsCheck}. */
export interface ReynoldsCheckInput {
  /** Part index in the build-up (for the id). */
  index: number;
  label: string;
  edges: 'sharp' | 'rounded' | null;
  /** Reynolds number reached on the model at the highest planned speed; null when the part has no length. */
  modelReynolds: number | null;
  /** Reynolds number of the full-scale part; null when the part has no length. */
  fullScaleReynolds: number | null;
}

/**
 * Reynolds-number check for one part. Rounded parts pass when the model reaches at least the full-scale Reynolds
 * number (ratio ≥ 1) and warn otherwise: their separation, transition and drag crisis move with Re.
 * Sharp-edged parts pass when the model reaches Re ≥ 1e4 and warn below: separation is fixed at the edges, so C_D is
 * largely Re-independent above about 1e4 (from memory). Parts without a length warn that Re could not be checked.
 *
 * Source: guidance from memory, as stated; the ratio is a definition.
 *
 * @param input part label, edge type, model and full-scale Reynolds numbers (dimensionless)
 * @returns check `reynolds-<index>`, value = model / full-scale Re when both are known
 * @throws {AeroInputError} `NOT_FINITE` or `OUT_OF_RANGE` when a given Reynolds number is not finite and positive
 * @example reynoldsCheck({ index: 0, label: 'plate', edges: 'sharp', modelReynolds: 5e4, fullScaleReynolds: 1e6 }).status // 'pass'
 */
export function reynoldsCheck(input: ReynoldsCheckInput): FitCheck {
  const { index, label, edges, modelReynolds, fullScaleReynolds } = input;
  const id = `reynolds-${index}`;
  if (modelReynolds === null || fullScaleReynolds === null || edges === null) {
    return {
      id,
      status: 'warn',
      reason: `${label}: no characteristic length, so Reynolds-number similarity was not checked.`,
    };
  }
  requirePositive('reynoldsCheck', 'model Reynolds number', modelReynolds, '');
  requirePositive('reynoldsCheck', 'full-scale Reynolds number', fullScaleReynolds, '');
  const ratio = modelReynolds / fullScaleReynolds;
  const numbers = `${label}: model Re ${modelReynolds.toExponential(2)} vs full scale ${fullScaleReynolds.toExponential(2)} (ratio ${ratio.toPrecision(3)})`;
  if (edges === 'sharp') {
    return modelReynolds >= SHARP_EDGE_REYNOLDS
      ? {
          id,
          status: 'pass',
          value: ratio,
          reason: `${numbers}. Sharp-edged: separation is fixed at the edges, so C_D is largely Re-independent above about 1e4.`,
        }
      : {
          id,
          status: 'warn',
          value: ratio,
          reason: `${numbers}. Sharp-edged, but model Re is below 1e4, where even fixed-separation C_D starts to vary.`,
        };
  }
  return ratio >= 1
    ? { id, status: 'pass', value: ratio, reason: `${numbers}. Rounded: full-scale Re is reached.` }
    : {
        id,
        status: 'warn',
        value: ratio,
        reason: `${numbers}. Rounded: transition and the drag crisis depend on Re, so model C_D may not carry over to full scale; consider fixing transition or testing nearer full-scale Re.`,
      };
}
