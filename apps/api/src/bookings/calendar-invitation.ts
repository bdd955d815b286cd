import { getVtimezoneComponent } from '@touch4it/ical-timezones';
import ical, { ICalCalendarMethod, ICalEventStatus } from 'ical-generator';
import { DateTime } from 'luxon';
import type { Instants } from './periods';

/** What goes into one booking's calendar entry. */
export interface CalendarInvitationInput {
  /** Stable per booking, so calendars update the same entry. */
  uid: string;
  /** Goes up with every change sent out. */
  sequence: number;
  method: 'request' | 'cancel';
  period: Instants;
  timeZone: string;
  summary: string;
  description: string;
  location: string;
  organizer: { name: string; email: string };
  attendee: { name: string; email: string };
  /** DTSTAMP: when this version of the entry was made. */
  stamp?: Date;
}

/** `20261024T080000Z`: a UTC date-time as RFC 5545 writes it. */
function utcStamp(date: Date): string {
  return date.toISOString().replace(/[-:]/g, '').replace(/\.\d{3}/, '');
}

/**
 * Builds the iCalendar text of a booking invitation (METHOD REQUEST) or its withdrawal (METHOD CANCEL),
 * with a VTIMEZONE for the lab's zone and start and end written in that zone.
 */
export function calendarInvitation(input: CalendarInvitationInput): string {
  const calendar = ical({
    prodId: { company: 'Tunnelwright', product: 'Bookings', language: 'EN' },
    method: input.method === 'request' ? ICalCalendarMethod.REQUEST : ICalCalendarMethod.CANCEL,
    timezone: { name: input.timeZone, generator: getVtimezoneComponent },
  });
  const stamp = input.stamp ?? new Date();
  calendar.createEvent({
    id: input.uid,
    sequence: input.sequence,
    // Luxon values set to the zone: a plain Date would be written as the server's wall time.
    start: DateTime.fromJSDate(input.period.start, { zone: input.timeZone }),
    end: DateTime.fromJSDate(input.period.end, { zone: input.timeZone }),
    timezone: input.timeZone,
    stamp: DateTime.fromJSDate(stamp, { zone: 'utc' }),
    summary: input.summary,
    description: input.description,
    location: input.location,
    status: input.method === 'request' ? ICalEventStatus.CONFIRMED : ICalEventStatus.CANCELLED,
    organizer: { name: input.organizer.name, email: input.organizer.email },
    attendees: [{ name: input.attendee.name, email: input.attendee.email }],
  });
  // With a calendar zone set, the generator writes DTSTAMP as zoned wall time; RFC 5545 requires UTC.
  return calendar.toString().replace(/^DTSTAMP[^\r\n]*/m, `DTSTAMP:${utcStamp(stamp)}`);
}
