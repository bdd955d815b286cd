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
