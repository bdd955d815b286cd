import type { Booking } from '@tunnelwright/db';
import { User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import type { Mailer, OutgoingMail } from '../mail/mailer';
import { liveQuote } from './booking-presenter';
import { calendarInvitation } from './calendar-invitation';
import { describePeriod, parsePeriod, toPeriod } from './periods';

/** Which step of the life cycle a booking mail reports. */
export type BookingEvent =
  | 'requested'
  | 'quoted'
  | 'declined'
  | 'counter_proposed'
  | 'counter_accepted'
  | 'confirmed'
  | 'rejected'
  | 'rescheduled'
  | 'technician_assigned'
  | 'in_test'
  | 'completed'
  | 'cancelled'
  | 'expired';

/** The words of one event: a subject, what happened, and what to do next, for each side. */
interface EventWording {
  subject: string;
  happened: string;
  customerNext: string;
  labNext: string;
  /** Whether a calendar entry goes along, and of which kind. */
  calendar?: 'request' | 'cancel';
}

export function formatMinor(minor: number, currency: string): string {
  const whole = Math.floor(minor / 100);
  const cents = String(minor % 100).padStart(2, '0');
  return `${currency} ${whole.toLocaleString('en-GB')}.${cents}`;
}

function wording(event: BookingEvent, booking: Booking, timeZone: string, wasConfirmed: boolean): EventWording {
  const hold = booking.holdExpiresAt ? describeInstant(booking.holdExpiresAt, timeZone) : 'the end of the hold';
  const quote = liveQuote(booking);
  switch (event) {
    case 'requested':
      return {
        subject: 'Booking request received',
        happened: 'A booking request was made. The slot is held provisionally until the lab answers.',
        customerNext: `The lab will answer with a quote, another period, or a reason it cannot take the booking. The hold lasts until ${hold}.`,
        labNext: `Answer with a quote, a counter-proposal or a decline before ${hold}, when the hold lapses.`,
      };
    case 'quoted':
      return {
        subject: 'Quote for your booking',
        happened: `The lab has quoted ${quote ? formatMinor(quote.totalMinor, quote.currency) : 'a price'} for this booking.`,
        customerNext: `Accept or reject the quote in Tunnelwright before ${hold}; after that the hold lapses and the slot is freed.`,
        labNext: 'Wait for the customer to accept or reject the quote.',
      };
    case 'declined':
      return {
        subject: 'Booking request declined',
        happened: `The lab cannot take this booking: ${booking.declineReason ?? ''}`,
        customerNext: 'The slot is free again. You are welcome to request another period.',
        labNext: 'Nothing more to do.',
      };
    case 'counter_proposed':
      return {
        subject: 'The lab proposes another period',
        happened: `The lab cannot offer the period asked for and proposes ${booking.counterPeriod ? describePeriod(parsePeriod(booking.counterPeriod), timeZone) : 'another period'}.${booking.counterNote ? ` ${booking.counterNote}` : ''}`,
        customerNext: `Accept the proposed period in Tunnelwright before ${hold}, or let it lapse.`,
        labNext: 'Wait for the customer to accept the proposed period.',
      };
    case 'counter_accepted':
      return {
        subject: 'Proposed period accepted',
        happened: 'The customer accepted the period the lab proposed; the request now stands for that period.',
        customerNext: `The lab will send a quote. The hold lasts until ${hold}.`,
        labNext: `Send a quote before ${hold}.`,
      };
    case 'confirmed':
      return {
        subject: 'Booking confirmed',
        happened: 'The quote was accepted and the booking is confirmed. A calendar entry is attached.',
        customerNext:
          'Bring each article with its mounting interface, drawings that give the reference area and length, and your run list. Arrive 30 minutes before the start for the safety briefing.',
        labNext: 'Assign a technician and prepare the tunnel.',
        calendar: 'request',
      };
    case 'rejected':
      return {
        subject: 'Quote rejected',
        happened: 'The customer rejected the quote. The slot is free again.',
        customerNext: 'You are welcome to request another booking.',
        labNext: 'Nothing more to do.',
      };
    case 'rescheduled':
      return {
        subject: 'Booking moved',
        happened: 'The lab moved this booking to the period below. The attached calendar entry replaces the earlier one.',
        customerNext: 'Check that the new period suits you; if it does not, contact the lab or cancel the booking.',
        labNext: 'Check the technician is free for the new period.',
        calendar: 'request',
      };
    case 'technician_assigned':
      return {
        subject: 'Technician assigned',
        happened: booking.technician ? `${booking.technician.name} will run this test.` : 'The technician assignment was removed.',
        customerNext: 'Nothing to do.',
        labNext: 'Nothing more to do.',
      };
    case 'in_test':
      return {
        subject: 'Test started',
        happened: 'Testing has started in the tunnel.',
        customerNext: 'Follow the runs in Tunnelwright as they are uploaded.',
        labNext: 'Upload the raw balance files as each run finishes.',
      };
    case 'completed':
      return {
        subject: 'Test completed',
        happened: 'Testing is complete.',
        customerNext: 'Certified result sheets appear in Tunnelwright once an analyst approves them. Collect your articles from the lab.',
        labNext: 'Reduce and approve the runs.',
      };
    case 'expired':
      return {
        subject: 'Booking hold expired',
        happened: 'Nobody answered in time, so the provisional hold lapsed and the slot is free again.',
        customerNext: 'Make a new request if you still need tunnel time.',
        labNext: 'Nothing more to do.',
      };
    case 'cancelled': {
      const fee = booking.cancellationFeeMinor ?? 0;
      const currency = booking.quotes?.find((q) => q.state === 'withdrawn' || q.state === 'accepted')?.currency ?? '';
      return {
        subject: 'Booking cancelled',
        happened: `The booking was cancelled: ${booking.cancellationReason ?? ''}${fee > 0 ? ` A late-cancellation fee of ${formatMinor(fee, currency)} applies.` : ' No fee applies.'}`,
        customerNext: wasConfirmed ? 'The attached calendar entry removes the booking from your calendar.' : 'Nothing more to do.',
        labNext: 'The slot is free again.',
        calendar: wasConfirmed ? 'cancel' : undefined,
      };
    }
  }
}

function describeInstant(date: Date, timeZone: string): string {
  return describePeriod({ start: date, end: date }, timeZone).replace(/ – .*\(/, ' (');
}

/** The mail address part of `Name <address>`. */
function addressOf(from: string): string {
  return /<([^>]+)>/.exec(from)?.[1] ?? from;
}

/**
 * Mails the customer who made the booking and the lab's active managers about `event`, in our own
 * plain words: what, when (in the lab's zone), where, and what to do next. Confirmations and changes
 * carry a calendar REQUEST, cancellations of confirmed bookings a CANCEL, with the booking's stable UID
 * and current SEQUENCE. `booking` must carry the booking graph.
 */
export async function sendBookingMail(
  knex: Knex,
  mailer: Mailer,
  input: { booking: Booking; event: BookingEvent; timeZone: string; labName: string; mailFrom: string; wasConfirmed?: boolean },
): Promise<void> {
  const { booking, timeZone } = input;
  const words = wording(input.event, booking, timeZone, input.wasConfirmed ?? false);
  const period = parsePeriod(booking.period);
  const tunnel = booking.tunnel?.name ?? 'the tunnel';
  const customer = booking.requester;
  const details = [
    `What: ${booking.articles.map((a) => a.name).join(', ') || 'tunnel time'} for ${booking.organisation?.name ?? 'the customer'}`,
    `When: ${describePeriod(period, timeZone)}, ${toPeriod(period).hours} h`,
    `Where: ${tunnel}, ${input.labName}`,
    `Booking: ${booking.id}`,
  ];
  const calendar = words.calendar
    ? calendarInvitation({
        uid: booking.icsUid,
        sequence: booking.icsSequence,
        method: words.calendar,
        period,
        timeZone,
        summary: `Wind-tunnel test: ${tunnel}`,
        description: words.happened,
        location: `${tunnel}, ${input.labName}`,
        organizer: { name: input.labName, email: addressOf(input.mailFrom) },
        attendee: { name: customer?.name ?? '', email: customer?.email ?? '' },
      })
    : undefined;
  const attachments = calendar
    ? [{ filename: words.calendar === 'cancel' ? 'booking-cancelled.ics' : 'booking.ics', content: calendar, contentType: `text/calendar; method=${words.calendar === 'cancel' ? 'CANCEL' : 'REQUEST'}; charset=utf-8` }]
    : undefined;

  const mails: OutgoingMail[] = [];
  if (customer) {
    mails.push({
      to: customer.email,
      subject: `${words.subject}: ${tunnel}`,
      text: [`Hello ${customer.name},`, '', words.happened, '', ...details, '', `Next: ${words.customerNext}`].join('\n'),
      attachments,
    });
  }
  const managers = await User.query(knex).where({ role: 'lab_manager', active: true }).whereNotNull('passwordHash').select('email');
  if (managers.length > 0) {
    mails.push({
      to: managers.map((m) => m.email).join(', '),
      subject: `${words.subject}: ${tunnel}, ${booking.organisation?.name ?? ''}`,
      text: [words.happened, '', ...details, '', `Next: ${words.labNext}`].join('\n'),
      attachments,
    });
  }
  for (const mail of mails) await mailer.send(mail);
}
