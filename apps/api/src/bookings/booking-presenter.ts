import { provisionalStates, type Booking as BookingDto, type BookingState, type Quote as QuoteDto } from '@tunnelwright/contracts';
import { Booking, type Quote } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { parsePeriod, toPeriod } from './periods';

/** Relations a booking answer shows. */
export const bookingGraph = '[organisation, tunnel, requester, technician, quotes.lines, attachments]';

/** Loads one booking with everything its answer shows. */
export async function loadBooking(knex: Knex, id: string): Promise<Booking | undefined> {
  return Booking.query(knex).findById(id).withGraphFetched(bookingGraph);
}

/** The state as of `now`: a provisional hold past its time reads as expired even before the sweep runs. */
export function effectiveState(booking: Pick<Booking, 'state' | 'holdExpiresAt'>, now = new Date()): BookingState {
  if (provisionalStates.includes(booking.state) && booking.holdExpiresAt && booking.holdExpiresAt <= now) return 'expired';
  return booking.state;
}

/** The offered or accepted quote of a booking, if any. */
export function liveQuote(booking: Booking): Quote | undefined {
  return booking.quotes?.find((q) => q.state === 'offered' || q.state === 'accepted');
}

export function toQuote(quote: Quote): QuoteDto {
  return {
    id: quote.id,
    state: quote.state,
    currency: quote.currency,
    totalMinor: quote.totalMinor,
    note: quote.note,
    lines: [...(quote.lines ?? [])]
      .sort((a, b) => a.position - b.position)
      .map((l) => ({ position: l.position, kind: l.kind, description: l.description, quantity: l.quantity, unitPriceMinor: l.unitPriceMinor, lineTotalMinor: l.lineTotalMinor })),
    createdAt: quote.createdAt.toISOString(),
  };
}

/** A booking as its customer and the staff see it; `booking` must carry `bookingGraph`. */
export function toBooking(booking: Booking, timeZone: string, now = new Date()): BookingDto {
  const quote = liveQuote(booking);
  const cancelledQuote = booking.quotes?.find((q) => q.state === 'accepted' || q.state === 'withdrawn');
  return {
    id: booking.id,
    organisationId: booking.organisationId,
    organisationName: booking.organisation?.name ?? '',
    tunnelId: booking.tunnelId,
    tunnelName: booking.tunnel?.name ?? '',
    serviceId: booking.serviceId,
    requestedBy: { id: booking.requestedBy, name: booking.requester?.name ?? '' },
    period: toPeriod(parsePeriod(booking.period)),
    state: effectiveState(booking, now),
    holdExpiresAt: provisionalStates.includes(booking.state) && booking.holdExpiresAt ? booking.holdExpiresAt.toISOString() : null,
    technician: booking.technician ? { id: booking.technician.id, name: booking.technician.name } : null,
    testPlan: booking.testPlan,
    articles: booking.articles,
    note: booking.customerNote,
    declineReason: booking.declineReason,
    counterProposal: booking.counterPeriod ? { period: toPeriod(parsePeriod(booking.counterPeriod)), note: booking.counterNote ?? '' } : null,
    cancellation: booking.cancelledAt
      ? {
          at: booking.cancelledAt.toISOString(),
          byId: booking.cancelledBy,
          reason: booking.cancellationReason ?? '',
          feeMinor: booking.cancellationFeeMinor ?? 0,
          currency: cancelledQuote?.currency ?? null,
        }
      : null,
    quote: quote ? toQuote(quote) : null,
    attachments: (booking.attachments ?? []).map((a) => ({ id: a.id, filename: a.filename, contentType: a.contentType, sizeBytes: a.sizeBytes, sha256: a.sha256, createdAt: a.createdAt.toISOString() })),
    testId: booking.testId,
    timeZone,
    createdAt: booking.createdAt.toISOString(),
    updatedAt: booking.updatedAt.toISOString(),
  };
}
