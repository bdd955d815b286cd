import type { Calibration } from '@tunnelwright/contracts';

/** How a balance's current calibration stands: past due, due within the warning window, current, or never calibrated. */
export type CalibrationDueTone = 'overdue' | 'soon' | 'current' | 'none';

export interface CalibrationDue {
  readonly tone: CalibrationDueTone;
  readonly label: string;
}

/** Days before the due date from which the chip turns to a warning; a month's notice to book the calibration (common practice). */
export const dueSoonDays = 30;

/** Whole days from `from` to `to`, both `YYYY-MM-DD`, counted in UTC. */
export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000);
}

/** Today in UTC as `YYYY-MM-DD`, the day the API counts a calibration overdue from. */
export function todayUtc(now: Date = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/**
 * The state chip of a calibration. The API's `overdue` flag decides "Overdue" (it counts from the server's day);
 * otherwise the days left are counted from `today`.
 */
export function calibrationDue(calibration: Pick<Calibration, 'dueOn' | 'overdue'> | null, today: string = todayUtc()): CalibrationDue {
  if (!calibration) return { tone: 'none', label: 'Not calibrated' };
  if (calibration.overdue) {
    const late = daysBetween(calibration.dueOn, today);
    return { tone: 'overdue', label: late > 0 ? `Overdue by ${late} day${late === 1 ? '' : 's'}` : 'Overdue' };
  }
  const left = Math.max(0, daysBetween(today, calibration.dueOn));
  const label = left === 0 ? 'Due today' : `Due in ${left} day${left === 1 ? '' : 's'}`;
  return { tone: left <= dueSoonDays ? 'soon' : 'current', label };
}
