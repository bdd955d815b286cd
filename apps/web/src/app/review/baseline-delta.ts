import type { ReviewRun } from '@tunnelwright/contracts';
import { runLabel } from './chart-series';

/** One drag count is 0.0001 in C_D (common practice in road-vehicle and aircraft aerodynamics). */
export const DRAG_COUNT = 1e-4;

/** Yaws closer than this are taken as the same setting, deg: turntable means scatter by a few hundredths. */
export const YAW_MATCH_TOLERANCE = 0.25;

/** One compared point: a run's C_D against the baseline's at the same yaw. */
export interface DeltaRow {
  readonly runId: string;
  readonly runLabel: string;
  readonly pointNumber: number;
  readonly yaw: number;
  readonly dragCoefficient: number;
  /** Mean baseline C_D at this yaw; null when the baseline has no kept point there. */
  readonly baselineDragCoefficient: number | null;
  /** (C_D − C_D,baseline) / 0.0001; null without a baseline point. */
  readonly deltaCounts: number | null;
}

/** Kept (not excluded) points of a run that have a corrected C_D, as yaw and C_D. */
function keptDrag(run: ReviewRun): { pointNumber: number; yaw: number; cd: number }[] {
  return (run.selected?.points ?? []).flatMap((p) => (p.exclusion === null && p.dragCoefficient !== null ? [{ pointNumber: p.pointNumber, yaw: p.yaw, cd: p.dragCoefficient.value }] : []));
}

/**
 * ΔC_D of every other run against a baseline run, in drag counts, at matching yaw: a point is compared with the mean
 * of the baseline's kept points within {@link YAW_MATCH_TOLERANCE} of its yaw (repeats at one yaw are averaged).
 * Excluded points take no part on either side. Rows come in run order, then yaw order.
 *
 * @param baseline - the run others are compared with
 * @param runs - the runs to compare (the baseline itself is skipped)
 */
export function baselineDeltas(baseline: ReviewRun, runs: readonly ReviewRun[]): DeltaRow[] {
  const reference = keptDrag(baseline);
  const rows: DeltaRow[] = [];
  for (const run of runs) {
    if (run.id === baseline.id || run.selected === null) continue;
    const label = runLabel(run);
    for (const point of keptDrag(run).sort((a, b) => a.yaw - b.yaw)) {
      const matches = reference.filter((r) => Math.abs(r.yaw - point.yaw) <= YAW_MATCH_TOLERANCE);
      const base = matches.length === 0 ? null : matches.reduce((sum, r) => sum + r.cd, 0) / matches.length;
      rows.push({
        runId: run.id,
        runLabel: label,
        pointNumber: point.pointNumber,
        yaw: point.yaw,
        dragCoefficient: point.cd,
        baselineDragCoefficient: base,
        deltaCounts: base === null ? null : (point.cd - base) / DRAG_COUNT,
      });
    }
  }
  return rows;
}
