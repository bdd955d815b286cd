import type { ReviewExclusion, ReviewPoint, ReviewRun } from '@tunnelwright/contracts';

/** Invented review data for the specs of this folder. */

/** An invented point: C_D with U, C_L and C_Y without. */
export function reviewPoint(index: number, yaw: number, cd: number, u: number | null, extra: Partial<ReviewPoint> = {}): ReviewPoint {
  return {
    index,
    pointNumber: index + 1,
    yaw,
    pitch: 0,
    speed: 30 + index,
    reynoldsNumber: 1e6 + index * 1e4,
    dragCoefficient: { value: cd, expandedUncertainty: u },
    liftCoefficient: { value: 0.1, expandedUncertainty: null },
    sideForceCoefficient: null,
    dragCounts: cd * 1e4,
    warnings: [],
    exclusion: null,
    ...extra,
  };
}

/** An invented run showing version 1 with the given points. */
export function reviewRun(runNumber: number, points: ReviewPoint[], configurationLabel = ''): ReviewRun {
  return {
    id: `00000000-0000-4000-8000-00000000000${runNumber}`,
    runNumber,
    kind: 'data',
    configurationLabel,
    versions: [],
    selected: { reductionId: `10000000-0000-4000-8000-00000000000${runNumber}`, version: 1, frozen: false, points, warnings: [], sphere: null },
  };
}

/** An invented exclusion. */
export const sampleExclusion: ReviewExclusion = { reason: 'Probe touched the model', excludedBy: { id: '20000000-0000-4000-8000-000000000001', name: 'Ada Analyst' }, createdAt: '2026-12-02T10:00:00.000Z' };
