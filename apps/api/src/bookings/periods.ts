import type { Period } from '@tunnelwright/contracts';
import { DateTime } from 'luxon';

/** A half-open period [start, end) as two instants. */
export interface Instants {
  start: Date;
  end: Date;
}

/** Turns one bound of PostgreSQL's tstzrange text (`2026-10-24 08:00:00+00`) into a Date. */
function parseBound(bound: string): Date {
  const iso = bound.replace(/^"|"$/g, '').replace(' ', 'T').replace(/([+-]\d\d)$/, '$1:00');
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) throw new Error(`parsePeriod cannot read the range bound "${bound}"`);
  return date;
}

/** Reads a bounded tstzrange as PostgreSQL prints it, e.g. `["2026-10-24 08:00:00+00","2026-10-25 09:00:00+00")`. */
export function parsePeriod(range: string): Instants {
  const match = /^[[(](.+),(.+)[\])]$/.exec(range.trim());
  if (!match?.[1] || !match[2]) throw new Error(`parsePeriod cannot read the range "${range}"`);
  return { start: parseBound(match[1]), end: parseBound(match[2]) };
}

/** The '[)' tstzrange literal PostgreSQL stores for a period. */
export function rangeLiteral(period: Instants): string {
  return `[${period.start.toISOString()},${period.end.toISOString()})`;
}

/** Instants from a client's ISO strings. */
export function instantsOf(input: { start: string; end: string }): Instants {
  return { start: new Date(input.start), end: new Date(input.end) };
}

/** The answer shape: UTC instants and the real elapsed length in hours. */
export function toPeriod(period: Instants): Period {
  return { start: period.start.toISOString(), end: period.end.toISOString(), hours: (period.end.getTime() - period.start.getTime()) / 3_600_000 };
}

/** A period as people in the lab read it, e.g. `Sat 24 Oct 2026 09:00 – Sun 25 Oct 2026 09:00 (Europe/London)`. */
export function describePeriod(period: Instants, timeZone: string): string {
  const format = (d: Date) => DateTime.fromJSDate(d, { zone: timeZone }).toFormat('ccc d LLL yyyy HH:mm');
  return `${format(period.start)} – ${format(period.end)} (${timeZone})`;
}
