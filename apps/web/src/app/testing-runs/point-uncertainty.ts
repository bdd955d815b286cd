import type { ReducedPoint } from './ingest-api';

/**
 * Expanded uncertainty U (k = 2) of a corrected coefficient of a point, from the engine's full result;
 * null when the result does not carry it.
 */
export function expandedUncertainty(point: ReducedPoint, coefficient: 'dragCoefficient' | 'liftCoefficient' | 'sideForceCoefficient'): number | null {
  const corrected = point.result['corrected'];
  if (!corrected || typeof corrected !== 'object') return null;
  const value = (corrected as Record<string, { uncertainty?: { expandedUncertainty?: unknown } } | undefined>)[coefficient];
  const expanded = value?.uncertainty?.expandedUncertainty;
  return typeof expanded === 'number' && Number.isFinite(expanded) ? expanded : null;
}
