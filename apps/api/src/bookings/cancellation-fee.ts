import type { BookingSettings, CancellationPreview } from '@tunnelwright/contracts';
import type { Booking } from '@tunnelwright/db';
import { DateTime } from 'luxon';
import { liveQuote } from './booking-presenter';
import { parsePeriod } from './periods';

/** `percent` % of `totalMinor`, rounded half up, in whole minor units (integer arithmetic only). */
export function percentOfMinor(totalMinor: number, percent: number): number {
  return Math.floor((totalMinor * percent + 50) / 100);
}

/**
 * What cancelling `booking` at `now` costs. The late-cancellation rule: a customer who cancels a confirmed
 * booking within `lateCancellationDays` days of its start pays `lateCancellationPercent` % of the accepted
 * quote. Requests that were never confirmed, and cancellations by the lab, cost nothing.
 * `booking.quotes` must be loaded.
 */
export function cancellationPreview(booking: Booking, rules: BookingSettings, timeZone: string, cancelledByLab: boolean, now = new Date()): CancellationPreview {
  const start = parsePeriod(booking.period).start;
  const quote = liveQuote(booking);
  const quoteTotalMinor = quote?.state === 'accepted' ? quote.totalMinor : 0;
  const rule = { withinDays: rules.lateCancellationDays, percent: rules.lateCancellationPercent };
  const lateFrom = DateTime.fromJSDate(start, { zone: timeZone }).minus({ days: rules.lateCancellationDays });
  const late = !cancelledByLab && booking.state === 'confirmed' && DateTime.fromJSDate(now) >= lateFrom;
  const feeMinor = late ? percentOfMinor(quoteTotalMinor, rules.lateCancellationPercent) : 0;
  const lateFromText = lateFrom.toFormat('ccc d LLL yyyy HH:mm');
  let explanation: string;
  if (cancelledByLab) explanation = 'A cancellation by the lab costs the customer nothing.';
  else if (booking.state !== 'confirmed') explanation = 'The booking is not confirmed yet, so cancelling costs nothing.';
  else if (late) explanation = `Cancelling from ${lateFromText} (${timeZone}), ${rules.lateCancellationDays} days before the start, costs ${rules.lateCancellationPercent} % of the accepted quote.`;
  else explanation = `Cancelling before ${lateFromText} (${timeZone}) costs nothing; after that it costs ${rules.lateCancellationPercent} % of the accepted quote.`;
  return { bookingId: booking.id, late, feeMinor, currency: quote?.currency ?? null, quoteTotalMinor, rule, explanation, timeZone };
}
