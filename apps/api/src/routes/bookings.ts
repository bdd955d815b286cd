import { randomUUID } from 'node:crypto';
import {
  assignTechnicianSchema,
  bookingListQuerySchema,
  bookingRequestSchema,
  bookingSettingsSchema,
  cancelBookingSchema,
  counterProposalSchema,
  declineBookingSchema,
  emptyBodySchema,
  provisionalStates,
  quoteInputSchema,
  rescheduleBookingSchema,
  startBookingSchema,
  type BookingSettings,
  type QuoteLineInput,
} from '@tunnelwright/contracts';
import { Booking, expireLapsedHolds, isStaff, Organisation, Plan, Quote, recordAudit, scopeToCaller, Service, TestRecord, Tunnel, User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { bookingGraph, liveQuote, loadBooking, toBooking } from '../bookings/booking-presenter';
import { auditView, mailQuietly, transitionBooking, withClashCheck, type TransitionSpec } from '../bookings/booking-transitions';
import { cancellationPreview } from '../bookings/cancellation-fee';
import { loadLabBookingContext } from '../bookings/lab-booking-settings';
import { instantsOf, rangeLiteral } from '../bookings/periods';
import { HttpError } from '../errors/http-error';
import { sampleBookingId, sampleBookingRequest, samplePeriod, sampleTechnicianBody } from './booking-samples';
import { route, type RouteContext, type RouteDef } from './route';

const hour = 3_600_000;

function holdUntil(rules: BookingSettings): Date {
  return new Date(Date.now() + rules.holdHours * hour);
}

function assertFuture(start: Date, field = 'start'): void {
  if (start.getTime() <= Date.now()) throw HttpError.field(field, 'The start must be in the future');
}

/** Inserts the quote and its lines; totals are integer minor units summed exactly. */
async function insertQuote(trx: Knex.Transaction, bookingId: string, currency: string, lines: QuoteLineInput[], note: string, createdBy: string) {
  const priced = lines.map((line, index) => ({ ...line, position: index + 1, lineTotalMinor: line.quantity * line.unitPriceMinor }));
  const totalMinor = priced.reduce((sum, line) => sum + line.lineTotalMinor, 0);
  if (!Number.isSafeInteger(totalMinor)) throw HttpError.field('lines', 'The quote total is too large');
  return Quote.query(trx).insertGraph({ bookingId, state: 'offered', currency, totalMinor, note, createdBy, lines: priced }, { allowRefs: false });
}

const sampleOf = (state: Parameters<typeof sampleBookingId>[1]) => async (f: Parameters<typeof sampleBookingId>[0]) => ({ id: await sampleBookingId(f, state) });

/** /api/bookings: requests for tunnel time and their life cycle. Customers see their own organisation's only. */

/**
 * Runs one transition of the booking named in the path (`:id`) and answers with the booking as the caller
 * sees it, in the lab's time zone. Every state-changing route below is this plus its own transition spec.
 */
async function answerTransition(
  { caller, params, deps, req, res }: Pick<RouteContext<unknown, unknown>, 'caller' | 'params' | 'deps' | 'req' | 'res'>,
  spec: TransitionSpec,
): Promise<void> {
  const { booking, context } = await transitionBooking(deps, caller, params.id ?? '', spec, req.log);
  res.json(toBooking(booking, context.timeZone));
}

export const bookingRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/settings',
    access: 'authenticated',
    summary: "The lab's booking rules: hold length and late-cancellation rule",
    sample: { expect: 200 },
    handler: async ({ deps, res }) => {
      const context = await loadLabBookingContext(deps.knex);
      res.json({ ...context.rules, timeZone: context.timeZone });
    },
  }),
  route({
    method: 'put',
    path: '/settings',
    access: ['lab_manager'],
    summary: "Change the lab's booking rules",
    body: bookingSettingsSchema,
    sample: { body: () => ({ holdHours: 48, lateCancellationDays: 7, lateCancellationPercent: 50 }), expect: 200 },
    handler: async ({ caller, body, deps, res }) => {
      const context = await deps.knex.transaction(async (trx) => {
        const lab = await Organisation.query(trx).findOne({ kind: 'lab' }).forUpdate();
        if (!lab) throw HttpError.notFound('The lab');
        // The rules in force, defaults included, so the audit row shows what the change replaced.
        const before = (await loadLabBookingContext(trx)).rules;
        await Organisation.query(trx).patchAndFetchById(lab.id, { settings: { ...lab.settings, booking: body } });
        await recordAudit(trx, { actorId: caller.id, action: 'booking_settings.updated', entity: 'organisation', entityId: lab.id, before, after: body });
        return lab;
      });
      res.json({ ...body, timeZone: context.timeZone ?? 'UTC' });
    },
  }),
  route({
    method: 'get',
    path: '/',
    access: 'authenticated',
    summary: 'List bookings (customers: their organisation only), soonest first',
    query: bookingListQuerySchema,
    sample: { expect: 200 },
    handler: async ({ caller, query, deps, res }) => {
      const context = await loadLabBookingContext(deps.knex);
      const builder = scopeToCaller(Booking.query(deps.knex), caller).withGraphFetched(bookingGraph).orderByRaw('lower(period)');
      if (query.tunnelId) builder.where('bookings.tunnelId', query.tunnelId);
      const now = new Date();
      const answer = (await builder).map((b) => toBooking(b, context.timeZone, now));
      res.json(query.state ? answer.filter((b) => b.state === query.state) : answer);
    },
  }),
  route({
    method: 'get',
    path: '/:id',
    access: 'authenticated',
    summary: 'One booking in full (customers: their organisation only)',
    sample: { params: sampleOf('quoted'), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, deps, res }) => {
      const booking = await loadBooking(deps.knex, params.id ?? '');
      if (!booking || (!isStaff(caller) && booking.organisationId !== caller.organisationId)) throw HttpError.notFound('The booking');
      res.json(toBooking(booking, (await loadLabBookingContext(deps.knex)).timeZone));
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: ['customer'],
    summary: 'Request tunnel time; the slot is held provisionally until the lab answers or the hold lapses',
    body: bookingRequestSchema,
    sample: { body: sampleBookingRequest, expect: 201 },
    handler: async ({ caller, body, deps, req, res }) => {
      const period = instantsOf(body);
      assertFuture(period.start);
      const context = await loadLabBookingContext(deps.knex);
      let lapsed: string[] = [];
      const id = await withClashCheck(deps.knex, body.tunnelId, period, context.timeZone, () =>
        deps.knex.transaction(async (trx) => {
          const tunnel = await Tunnel.query(trx).findById(body.tunnelId);
          if (!tunnel || tunnel.archivedAt) throw HttpError.field('tunnelId', 'This tunnel is not available for booking');
          if (body.serviceId) {
            const service = await Service.query(trx).findById(body.serviceId);
            if (!service || service.archivedAt || (service.tunnelId && service.tunnelId !== tunnel.id)) throw HttpError.field('serviceId', 'This service is not available on this tunnel');
          }
          const plan = body.planId ? await Plan.query(trx).findById(body.planId).forUpdate() : undefined;
          if (body.planId && (!plan || plan.organisationId !== caller.organisationId)) throw HttpError.field('planId', 'Choose one of your saved plans');
          // Lapsed holds on this tunnel must not block the new request, even between sweeps.
          lapsed = await expireLapsedHolds(trx, { tunnelId: tunnel.id });
          const booking = await Booking.query(trx).insert({
            organisationId: caller.organisationId,
            tunnelId: tunnel.id,
            serviceId: body.serviceId,
            requestedBy: caller.id,
            period: rangeLiteral(period),
            state: 'requested',
            holdExpiresAt: holdUntil(context.rules),
            testPlan: body.testPlan,
            articles: body.articles,
            customerNote: body.note,
            icsUid: `${randomUUID()}@tunnelwright.invalid`,
            icsSequence: 0,
          });
          // The plan row is locked above, so it is still the caller's when it is linked.
          if (plan) await Plan.query(trx).patch({ bookingId: booking.id }).where('id', plan.id);
          await recordAudit(trx, { actorId: caller.id, action: 'booking.requested', entity: 'booking', entityId: booking.id, after: { ...auditView(booking), planId: plan?.id ?? null } });
          return booking.id;
        }),
      );
      const booking = await loadBooking(deps.knex, id);
      if (!booking) throw HttpError.notFound('The booking');
      await mailQuietly(deps, booking, 'requested', context, false, req.log);
      for (const expiredId of lapsed) {
        const expired = await loadBooking(deps.knex, expiredId);
        if (expired) await mailQuietly(deps, expired, 'expired', context, false, req.log);
      }
      res.status(201).json(toBooking(booking, context.timeZone));
    },
  }),
  route({
    method: 'post',
    path: '/:id/quote',
    access: ['lab_manager'],
    summary: 'Answer a request with a quote; the hold is renewed for the customer to decide',
    body: quoteInputSchema,
    sample: { params: sampleOf('requested'), body: () => ({ lines: [{ kind: 'tunnel_hours', quantity: 8, unitPriceMinor: 15000 }] }), expect: 200 },
    handler: async ({ caller, params, body, deps, req, res }) => {
      await answerTransition({ caller, params, deps, req, res }, {
        action: 'quoted',
        attempt: 'send a quote',
        from: ['requested'],
        event: 'quoted',
        change: async (b, trx, ctx) => {
          const service = b.serviceId ? await Service.query(trx).findById(b.serviceId) : undefined;
          const currency = body.currency ?? service?.currency ?? (typeof ctx.lab.settings.defaultCurrency === 'string' ? ctx.lab.settings.defaultCurrency : 'EUR');
          await insertQuote(trx, b.id, currency, body.lines, body.note, caller.id);
          return { state: 'quoted', holdExpiresAt: holdUntil(ctx.rules) };
        },
      });
    },
  }),
  route({
    method: 'post',
    path: '/:id/decline',
    access: ['lab_manager'],
    summary: 'Decline a request, saying why; the slot is freed',
    body: declineBookingSchema,
    sample: { params: sampleOf('requested'), body: () => ({ reason: 'The tunnel is closed for the fan overhaul that week.' }), expect: 200 },
    handler: async ({ caller, params, body, deps, req, res }) => {
      await answerTransition({ caller, params, deps, req, res }, {
        action: 'declined',
        attempt: 'decline the booking',
        from: ['requested', 'quoted', 'counter_proposed'],
        event: 'declined',
        change: async (b, trx) => {
          await Quote.query(trx).patch({ state: 'withdrawn' }).where({ bookingId: b.id, state: 'offered' });
          return { state: 'declined', declineReason: body.reason, holdExpiresAt: null };
        },
      });
    },
  }),
  route({
    method: 'post',
    path: '/:id/counter-proposal',
    access: ['lab_manager'],
    summary: 'Offer another period instead; the proposed period is held for the customer',
    body: counterProposalSchema,
    sample: { params: sampleOf('requested'), body: () => ({ ...samplePeriod(90), note: 'The week after suits the tunnel better.' }), expect: 200 },
    handler: async ({ caller, params, body, deps, req, res }) => {
      const period = instantsOf(body);
      assertFuture(period.start);
      await answerTransition({ caller, params, deps, req, res }, {
        action: 'counter_proposed',
        attempt: 'propose another period',
        from: ['requested'],
        event: 'counter_proposed',
        requestedPeriod: period,
        change: async (_b, _trx, ctx) => ({ state: 'counter_proposed', counterPeriod: rangeLiteral(period), counterNote: body.note, holdExpiresAt: holdUntil(ctx.rules) }),
      });
    },
  }),
  route({
    method: 'post',
    path: '/:id/accept-counter-proposal',
    access: ['customer'],
    summary: "Accept the lab's proposed period; the request then stands for it and waits for a quote",
    body: emptyBodySchema,
    sample: { params: sampleOf('counter_proposed'), body: () => ({}), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, deps, req, res }) => {
      await answerTransition({ caller, params, deps, req, res }, {
        action: 'counter_accepted',
        attempt: 'accept a proposed period',
        from: ['counter_proposed'],
        event: 'counter_accepted',
        change: async (b, _trx, ctx) => ({ state: 'requested', period: b.counterPeriod ?? b.period, counterPeriod: null, holdExpiresAt: holdUntil(ctx.rules) }),
      });
    },
  }),
  route({
    method: 'post',
    path: '/:id/accept-quote',
    access: ['customer'],
    summary: 'Accept the quote; the booking is confirmed and a calendar invitation goes out',
    body: emptyBodySchema,
    sample: { params: sampleOf('quoted'), body: () => ({}), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, deps, req, res }) => {
      await answerTransition({ caller, params, deps, req, res }, {
        action: 'confirmed',
        attempt: 'accept the quote',
        from: ['quoted'],
        event: 'confirmed',
        change: async (b, trx) => {
          const quote = liveQuote(b);
          if (!quote) throw new HttpError(409, 'No quote', 'This booking has no quote to accept.');
          await Quote.query(trx).patch({ state: 'accepted' }).where('id', quote.id);
          return { state: 'confirmed', holdExpiresAt: null };
        },
      });
    },
  }),
  route({
    method: 'post',
    path: '/:id/reject-quote',
    access: ['customer'],
    summary: 'Reject the quote; the slot is freed',
    body: emptyBodySchema,
    sample: { params: sampleOf('quoted'), body: () => ({}), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, deps, req, res }) => {
      await answerTransition({ caller, params, deps, req, res }, {
        action: 'rejected',
        attempt: 'reject the quote',
        from: ['quoted'],
        event: 'rejected',
        change: async (b, trx) => {
          await Quote.query(trx).patch({ state: 'rejected' }).where({ bookingId: b.id, state: 'offered' });
          return { state: 'rejected', holdExpiresAt: null };
        },
      });
    },
  }),
  route({
    method: 'post',
    path: '/:id/reschedule',
    access: ['lab_manager'],
    summary: 'Move a confirmed booking; the customer gets an updated calendar entry (same UID, next SEQUENCE)',
    body: rescheduleBookingSchema,
    sample: { params: sampleOf('confirmed'), body: () => samplePeriod(75), expect: 200 },
    handler: async ({ caller, params, body, deps, req, res }) => {
      const period = instantsOf(body);
      assertFuture(period.start);
      await answerTransition({ caller, params, deps, req, res }, {
        action: 'rescheduled',
        attempt: 'move the booking',
        from: ['confirmed'],
        event: 'rescheduled',
        requestedPeriod: period,
        change: async (b) => ({ period: rangeLiteral(period), icsSequence: b.icsSequence + 1 }),
      });
    },
  }),
  route({
    method: 'post',
    path: '/:id/technician',
    access: ['lab_manager'],
    summary: 'Assign (or with null, unassign) the technician who runs the test',
    body: assignTechnicianSchema,
    sample: { params: sampleOf('confirmed'), body: sampleTechnicianBody, expect: 200 },
    handler: async ({ caller, params, body, deps, req, res }) => {
      if (body.technicianId) {
        const technician = await User.query(deps.knex).findById(body.technicianId);
        if (!technician || technician.role !== 'technician' || !technician.active) throw HttpError.field('technicianId', 'Choose an active technician of the lab');
      }
      await answerTransition({ caller, params, deps, req, res }, {
        action: 'technician_assigned',
        attempt: 'assign a technician',
        from: ['requested', 'quoted', 'counter_proposed', 'confirmed', 'in_test'],
        event: 'technician_assigned',
        change: async () => ({ technicianId: body.technicianId }),
      });
    },
  }),
  route({
    method: 'post',
    path: '/:id/start',
    access: ['lab_manager'],
    summary: 'Mark a confirmed booking as in test, optionally linking the test record that holds its runs',
    body: startBookingSchema,
    sample: { params: sampleOf('confirmed'), body: () => ({}), expect: 200 },
    handler: async ({ caller, params, body, deps, req, res }) => {
      await answerTransition({ caller, params, deps, req, res }, {
        action: 'in_test',
        attempt: 'start the test',
        from: ['confirmed'],
        event: 'in_test',
        change: async (b, trx) => {
          if (!body.testId) return { state: 'in_test' };
          const test = await TestRecord.query(trx).findById(body.testId);
          if (!test || test.organisationId !== b.organisationId || test.tunnelId !== b.tunnelId) throw HttpError.field('testId', "Choose a test of this customer's in this tunnel");
          await TestRecord.query(trx).patch({ bookingId: b.id }).where('id', test.id);
          return { state: 'in_test', testId: test.id };
        },
      });
    },
  }),
  route({
    method: 'post',
    path: '/:id/complete',
    access: ['lab_manager'],
    summary: 'Mark a booking in test as completed',
    body: emptyBodySchema,
    sample: { params: sampleOf('in_test'), body: () => ({}), expect: 200 },
    handler: async ({ caller, params, deps, req, res }) => {
      await answerTransition({ caller, params, deps, req, res }, { action: 'completed', attempt: 'complete the booking', from: ['in_test'], event: 'completed', change: async () => ({ state: 'completed' }) });
    },
  }),
  route({
    method: 'get',
    path: '/:id/cancellation-preview',
    access: ['customer', 'lab_manager'],
    summary: 'What cancelling now would cost under the late-cancellation rule',
    sample: { params: sampleOf('confirmed'), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, deps, res }) => {
      const booking = await loadBooking(deps.knex, params.id ?? '');
      if (!booking || (!isStaff(caller) && booking.organisationId !== caller.organisationId)) throw HttpError.notFound('The booking');
      const context = await loadLabBookingContext(deps.knex);
      res.json(cancellationPreview(booking, context.rules, context.timeZone, isStaff(caller)));
    },
  }),
  route({
    method: 'post',
    path: '/:id/cancel',
    access: ['customer', 'lab_manager'],
    summary: 'Cancel before the test starts; the late-cancellation rule applies to customers; the slot is freed',
    body: cancelBookingSchema,
    sample: { params: sampleOf('confirmed'), body: () => ({ reason: 'The model is not ready in time.' }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, body, deps, req, res }) => {
      await answerTransition({ caller, params, deps, req, res }, {
        action: 'cancelled',
        attempt: 'cancel the booking',
        from: ['requested', 'quoted', 'counter_proposed', 'confirmed'],
        event: 'cancelled',
        change: async (b, trx, ctx) => {
          const preview = cancellationPreview(b, ctx.rules, ctx.timeZone, isStaff(caller));
          if (body.expectedFeeMinor !== undefined && body.expectedFeeMinor !== preview.feeMinor) {
            throw new HttpError(409, 'Fee changed', `The cancellation fee is now ${preview.feeMinor} minor units, not ${body.expectedFeeMinor}. Check the preview again before cancelling.`);
          }
          await Quote.query(trx).patch({ state: 'withdrawn' }).where('bookingId', b.id).whereIn('state', ['offered', 'accepted']);
          const wasConfirmed = b.state === 'confirmed';
          return {
            state: 'cancelled',
            holdExpiresAt: provisionalStates.includes(b.state) ? null : b.holdExpiresAt,
            cancelledAt: new Date(),
            cancelledBy: caller.id,
            cancellationReason: body.reason,
            cancellationFeeMinor: preview.feeMinor,
            icsSequence: wasConfirmed ? b.icsSequence + 1 : b.icsSequence,
          };
        },
      });
    },
  }),
];
