import { provisionalStates, type BookingState } from '@tunnelwright/contracts';
import { Booking, isStaff, recordAudit, type User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import type { PartialModelObject } from 'objection';
import type { AppDeps } from '../deps';
import { HttpError } from '../errors/http-error';
import { loadBooking } from './booking-presenter';
import { sendBookingMail, type BookingEvent } from './booking-mail';
import { loadLabBookingContext, type LabBookingContext } from './lab-booking-settings';
import { describePeriod, parsePeriod, rangeLiteral, type Instants } from './periods';

/** Whether `error` is PostgreSQL's exclusion violation (SQLSTATE 23P01), raw or wrapped by Objection. */
export function isExclusionViolation(error: unknown): boolean {
  const codeOf = (e: unknown) => (typeof e === 'object' && e !== null && 'code' in e ? (e as { code: unknown }).code : undefined);
  const native = typeof error === 'object' && error !== null && 'nativeError' in error ? (error as { nativeError: unknown }).nativeError : undefined;
  return codeOf(error) === '23P01' || codeOf(native) === '23P01';
}

/**
 * The 409 for a period that clashes on `tunnelId`, naming the taken period in the lab's zone and never
 * whose it is.
 */
export async function clashError(knex: Knex, tunnelId: string, period: Instants, timeZone: string): Promise<HttpError> {
  const taken = (await knex('tunnel_occupancy')
    .select('period')
    .where('tunnel_id', tunnelId)
    .whereRaw('period && ?::tstzrange', [rangeLiteral(period)])
    .orderByRaw('lower(period)')
    .first()) as { period: string } | undefined;
  const when = taken ? describePeriod(parsePeriod(taken.period), timeZone) : describePeriod(period, timeZone);
  return new HttpError(409, 'Period not available', `The tunnel is already taken ${when}. Choose a period that does not overlap it.`, [
    { field: 'start', message: `Overlaps ${when}` },
  ]);
}

/** Runs `work`, turning an overlap refused by PostgreSQL into the clash 409 for `period`. */
export async function withClashCheck<T>(knex: Knex, tunnelId: string, period: Instants, timeZone: string, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (isExclusionViolation(error)) throw await clashError(knex, tunnelId, period, timeZone);
    throw error;
  }
}

const stateWords: Record<BookingState, string> = {
  requested: 'requested',
  quoted: 'quoted',
  counter_proposed: 'waiting on a counter-proposal',
  confirmed: 'confirmed',
  in_test: 'in test',
  completed: 'completed',
  declined: 'declined',
  rejected: 'rejected',
  cancelled: 'cancelled',
  expired: 'expired',
};

/** The snapshot an audit row keeps of a booking. */
export function auditView(booking: Booking) {
  return { state: booking.state, period: booking.period, counterPeriod: booking.counterPeriod, technicianId: booking.technicianId, holdExpiresAt: booking.holdExpiresAt, icsSequence: booking.icsSequence };
}

/** One step of the life cycle. */
export interface TransitionSpec {
  /** Audit action suffix: `booking.<action>`. */
  action: string;
  /** What the caller tries, for the 409: "accept the quote". */
  attempt: string;
  /** States the step may start from. */
  from: readonly BookingState[];
  event: BookingEvent;
  /** The change to make, inside the transaction with the booking row locked. `booking.quotes` is loaded. */
  change: (booking: Booking, trx: Knex.Transaction, context: LabBookingContext) => Promise<PartialModelObject<Booking>>;
  /** Period the change asks the tunnel for, so a clash can be named. */
  requestedPeriod?: Instants;
}

/**
 * Applies one life-cycle step to booking `id` for `caller`: locks the row, checks that the caller may see
 * it (customers: their own organisation only, otherwise 404) and that the step is legal from its state
 * (otherwise 409 saying why), makes the change and writes the audit row in one transaction, then mails
 * both sides. A provisional hold found lapsed is expired (and committed) and the step refused with 409.
 */
export async function transitionBooking(deps: AppDeps, caller: User, id: string, spec: TransitionSpec, log?: { error: (obj: object, msg: string) => void }): Promise<{ booking: Booking; context: LabBookingContext }> {
  const context = await loadLabBookingContext(deps.knex);
  let wasConfirmed = false;
  let tunnelId = '';
  const run = () =>
    deps.knex.transaction(async (trx): Promise<'lapsed' | 'done'> => {
      const booking = await Booking.query(trx).findById(id).forUpdate();
      if (!booking || (!isStaff(caller) && booking.organisationId !== caller.organisationId)) throw HttpError.notFound('The booking');
      tunnelId = booking.tunnelId;
      if (provisionalStates.includes(booking.state) && booking.holdExpiresAt && booking.holdExpiresAt <= new Date()) {
        const expired = await Booking.query(trx).patchAndFetchById(booking.id, { state: 'expired' });
        await recordAudit(trx, { actorId: null, action: 'booking.expired', entity: 'booking', entityId: booking.id, before: auditView(booking), after: auditView(expired) });
        return 'lapsed';
      }
      if (!spec.from.includes(booking.state)) {
        const allowed = spec.from.map((s) => stateWords[s]).join(' or ');
        throw new HttpError(409, 'Not possible in this state', `Cannot ${spec.attempt}: the booking is ${stateWords[booking.state]}, and only a booking that is ${allowed} allows it.`);
      }
      wasConfirmed = booking.state === 'confirmed';
      booking.quotes = await booking.$relatedQuery('quotes', trx);
      const patch = await spec.change(booking, trx, context);
      const updated = await Booking.query(trx).patchAndFetchById(booking.id, patch);
      await recordAudit(trx, { actorId: caller.id, action: `booking.${spec.action}`, entity: 'booking', entityId: booking.id, before: auditView(booking), after: auditView(updated) });
      return 'done';
    });
  const outcome = spec.requestedPeriod ? await withClashCheck(deps.knex, tunnelId || (await tunnelOf(deps.knex, id)), spec.requestedPeriod, context.timeZone, run) : await run();
  if (outcome === 'lapsed') {
    const expired = await loadBooking(deps.knex, id);
    if (expired) await mailQuietly(deps, expired, 'expired', context, false, log);
    throw new HttpError(409, 'Hold expired', 'The provisional hold on this booking lapsed before anybody answered, so the booking has expired and its slot is free. Make a new request.');
  }
  const booking = await loadBooking(deps.knex, id);
  if (!booking) throw HttpError.notFound('The booking');
  await mailQuietly(deps, booking, spec.event, context, wasConfirmed, log);
  return { booking, context };
}

async function tunnelOf(knex: Knex, id: string): Promise<string> {
  const row = (await knex('bookings').select('tunnel_id').where('id', id).first()) as { tunnelId: string } | undefined;
  return row?.tunnelId ?? '';
}

/** Sends the booking mails; the step is already committed, so a mail failure is logged, not answered. */
export async function mailQuietly(deps: AppDeps, booking: Booking, event: BookingEvent, context: LabBookingContext, wasConfirmed: boolean, log?: { error: (obj: object, msg: string) => void }): Promise<void> {
  try {
    await sendBookingMail(deps.knex, deps.mailer, { booking, event, timeZone: context.timeZone, labName: context.lab.name, mailFrom: deps.config.mailFrom, wasConfirmed });
  } catch (error) {
    log?.error({ err: error, bookingId: booking.id, event }, 'booking mail could not be sent');
  }
}
