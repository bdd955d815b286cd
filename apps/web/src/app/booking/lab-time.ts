import type { Period } from '@tunnelwright/contracts';
import { DateTime } from 'luxon';

/** The zone the browser runs in. */
export function userTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone;
}

function range(start: DateTime, end: DateTime): string {
  const sameDay = start.hasSame(end, 'day');
  const from = start.toFormat('ccc d LLL yyyy, HH:mm');
  return `${from}–${end.toFormat(sameDay ? 'HH:mm' : 'ccc d LLL yyyy, HH:mm')}`;
}

/**
 * A period in the lab's zone, e.g. "Mon 5 Oct 2026, 09:00–17:00 (Europe/London)", followed by the
 * viewer's own time when their zone differs.
 */
export function formatPeriod(period: Pick<Period, 'start' | 'end'>, labZone: string, viewerZone = userTimeZone()): string {
  const start = DateTime.fromISO(period.start, { zone: labZone });
  const end = DateTime.fromISO(period.end, { zone: labZone });
  const lab = `${range(start, end)} (${labZone})`;
  if (viewerZone === labZone || !start.isValid) {
    return lab;
  }
  return `${lab}; your time ${range(start.setZone(viewerZone), end.setZone(viewerZone))} (${viewerZone})`;
}

/** Reads a `datetime-local` value ("2026-10-05T09:00") as wall time in the lab's zone; null when invalid. */
export function labInstant(localValue: string, labZone: string): string | null {
  const at = DateTime.fromISO(localValue, { zone: labZone });
  return at.isValid ? at.toISO({ suppressMilliseconds: true }) : null;
}

/** The `datetime-local` value of an instant in the lab's zone. */
export function localValueOf(instant: string, labZone: string): string {
  return DateTime.fromISO(instant, { zone: labZone }).toFormat("yyyy-LL-dd'T'HH:mm");
}

/**
 * The `datetime-local` value `hours` after another, on the wall clock, rounded up to the next whole minute; null when
 * the start is not a valid value.
 */
export function localValueAfterHours(localValue: string, hours: number): string | null {
  // Read as UTC so the sum is plain wall-clock arithmetic, untouched by the browser's own daylight-saving changes.
  const start = DateTime.fromISO(localValue, { zone: 'UTC' });
  return start.isValid && Number.isFinite(hours) && hours > 0 ? start.plus({ minutes: Math.ceil(hours * 60) }).toFormat("yyyy-LL-dd'T'HH:mm") : null;
}
