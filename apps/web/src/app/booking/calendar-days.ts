import { DateTime } from 'luxon';

/** A calendar day in the lab's zone: ISO date plus its start and end instants. */
export interface CalendarDay {
  readonly date: string;
  readonly label: string;
  readonly start: number;
  readonly end: number;
}

function dayOf(at: DateTime): CalendarDay {
  return { date: at.toISODate() ?? '', label: at.toFormat('ccc d LLL'), start: at.toMillis(), end: at.plus({ days: 1 }).toMillis() };
}

/** The seven days (Monday first) of the week holding `anchor`, in `zone`; days across a clock change keep their 23 or 25 hours. */
export function weekDays(anchor: DateTime, zone: string): CalendarDay[] {
  const monday = anchor.setZone(zone).startOf('week');
  return Array.from({ length: 7 }, (_, i) => dayOf(monday.plus({ days: i })));
}

/** Every day of the month holding `anchor`, in `zone`. */
export function monthDays(anchor: DateTime, zone: string): CalendarDay[] {
  const first = anchor.setZone(zone).startOf('month');
  return Array.from({ length: first.daysInMonth ?? 30 }, (_, i) => dayOf(first.plus({ days: i })));
}

/** Whether the half-open period [start, end) touches the day. */
export function overlapsDay(period: { start: string; end: string }, day: CalendarDay): boolean {
  return Date.parse(period.start) < day.end && Date.parse(period.end) > day.start;
}

/** "09:00–17:00" of a period as seen on one day in the lab's zone; "…" marks a part that runs over midnight. */
export function timesOnDay(period: { start: string; end: string }, day: CalendarDay, zone: string): string {
  const start = Math.max(Date.parse(period.start), day.start);
  const end = Math.min(Date.parse(period.end), day.end);
  const from = start > day.start ? DateTime.fromMillis(start, { zone }).toFormat('HH:mm') : '…';
  const to = end < day.end ? DateTime.fromMillis(end, { zone }).toFormat('HH:mm') : '…';
  return `${from}–${to}`;
}

/** A stretch of time as instants (ms), half-open. */
export interface Stretch {
  readonly start: number;
  readonly end: number;
}

/** The first whole hour of the lab's wall clock at or after `now`, so a chosen slot never starts in the past. */
export function nextWholeHour(now: number, zone: string): number {
  const at = DateTime.fromMillis(now, { zone });
  const hour = at.startOf('hour');
  return hour.toMillis() === at.toMillis() ? at.toMillis() : hour.plus({ hours: 1 }).toMillis();
}

/**
 * The parts of `day` that no busy period covers and that start no earlier than `notBefore`, earliest first. Busy
 * periods are half-open and may overlap each other or run past the day.
 */
export function freeStretches(busy: readonly { start: string; end: string }[], day: CalendarDay, notBefore: number): Stretch[] {
  const from = Math.max(day.start, notBefore);
  if (from >= day.end) return [];
  const taken = busy
    .map((period) => ({ start: Date.parse(period.start), end: Date.parse(period.end) }))
    .filter((period) => period.start < day.end && period.end > from)
    .sort((a, b) => a.start - b.start);
  const free: Stretch[] = [];
  let cursor = from;
  for (const period of taken) {
    if (period.start > cursor) free.push({ start: cursor, end: period.start });
    cursor = Math.max(cursor, period.end);
  }
  if (cursor < day.end) free.push({ start: cursor, end: day.end });
  return free;
}

/** "13:00–24:00" of a stretch within one day on the lab's clock; "all day" when it is the whole day. */
export function stretchTimes(stretch: Stretch, day: CalendarDay, zone: string): string {
  if (stretch.start <= day.start && stretch.end >= day.end) return 'all day';
  const clock = (at: number) => DateTime.fromMillis(at, { zone }).toFormat('HH:mm');
  return `${clock(Math.max(stretch.start, day.start))}–${stretch.end >= day.end ? '24:00' : clock(stretch.end)}`;
}
