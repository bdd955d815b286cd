import type { ReviewPoint, ReviewRun } from '@tunnelwright/contracts';

/** A corrected coefficient the review charts. */
export type ReviewCoefficient = 'dragCoefficient' | 'liftCoefficient' | 'sideForceCoefficient';

/** What a chart puts on its x axis. */
export type ReviewAxis = 'yaw' | 'reynoldsNumber' | 'speed';

/** One plotted point with its error bar y ± U (k = 2); no bar when the engine gave no U. */
export interface ErrorBarPoint {
  readonly x: number;
  readonly y: number;
  readonly yMin: number | null;
  readonly yMax: number | null;
}

/** One run's line on a chart. */
export interface RunSeries {
  readonly runId: string;
  readonly label: string;
  readonly points: readonly ErrorBarPoint[];
}

/** Chart legend text of a run: number, configuration and version. */
export function runLabel(run: ReviewRun): string {
  const configuration = run.configurationLabel ? ` ${run.configurationLabel}` : '';
  const version = run.selected ? ` v${run.selected.version}` : '';
  return `Run ${run.runNumber}${configuration}${version}`;
}

/**
 * The kept points of a run as chart points: x from `axis`, y the coefficient, and the error bar y ± U.
 * Excluded points and points missing either value are left out; the rest are sorted by x so lines join in order.
 */
export function coefficientSeries(points: readonly ReviewPoint[], coefficient: ReviewCoefficient, axis: ReviewAxis): ErrorBarPoint[] {
  const plotted: ErrorBarPoint[] = [];
  for (const point of points) {
    const value = point[coefficient];
    const x = point[axis];
    if (point.exclusion !== null || value === null || x === null || !Number.isFinite(x)) continue;
    const u = value.expandedUncertainty;
    plotted.push({ x, y: value.value, yMin: u === null ? null : value.value - u, yMax: u === null ? null : value.value + u });
  }
  return plotted.sort((a, b) => a.x - b.x);
}

/** One series per chosen run that has a shown version. */
export function runSeries(runs: readonly ReviewRun[], coefficient: ReviewCoefficient, axis: ReviewAxis): RunSeries[] {
  return runs
    .filter((run) => run.selected !== null)
    .map((run) => ({ runId: run.id, label: runLabel(run), points: coefficientSeries(run.selected?.points ?? [], coefficient, axis) }));
}
