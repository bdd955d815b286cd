import { DateTime } from 'luxon';
import ical from 'node-ical';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { waitForBookingMail } from './support/booking-mail';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

const hour = 3_600_000;
const day = 24 * hour;

/** A whole-hour instant `days` days (plus `hours` hours) from now. */
function ahead(days: number, hours = 0): Date {
  return new Date(Math.ceil((Date.now() + days * day) / hour) * hour + hours * hour);
}

const articles = [{ name: 'Pedestrian bridge deck, 1:40', referenceAreaKind: 'frontal' }];

/** The first VEVENT of an iCalendar text, read with node-ical. */
function firstEvent(ics: string): ical.VEvent {
  const event = Object.values(ical.sync.parseICS(ics)).find((c): c is ical.VEvent => c?.type === 'VEVENT');
  if (!event) throw new Error('no VEVENT in the calendar');
  return event;
}

describe('/api/bookings', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;
  let technician: FixtureUser;
  let customer: FixtureUser;
  let rival: FixtureUser;
  let timeZone: string;

  const auth = (user: FixtureUser) => `Bearer ${user.token}`;
  const ask = (user: FixtureUser, body: object) => request(t.app).post('/api/bookings').set('Authorization', auth(user)).send(body);
  const act = (user: FixtureUser, id: string, step: string, body: object = {}) => request(t.app).post(`/api/bookings/${id}/${step}`).set('Authorization', auth(user)).send(body);
  const requestBody = (tunnelId: string, start: Date, end: Date) => ({ tunnelId, start: start.toISOString(), end: end.toISOString(), articles, testPlan: { speeds: [15, 25], yawRange: { from: -20, to: 20, step: 5 } } });

  /** A booking of `customer` on a fresh tunnel, taken through `steps` (quote, accept). */
  async function bookingIn(state: 'requested' | 'quoted' | 'confirmed' | 'in_test', start = ahead(40), hours = 8): Promise<{ id: string; tunnelId: string }> {
    const tunnelId = await fixtures.tunnelId();
    const created = await ask(customer, requestBody(tunnelId, start, new Date(start.getTime() + hours * hour)));
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const id = created.body.id as string;
    if (state === 'requested') return { id, tunnelId };
    expect((await act(manager, id, 'quote', { lines: [{ kind: 'tunnel_hours', quantity: hours, unitPriceMinor: 15000 }] })).status).toBe(200);
    if (state === 'quoted') return { id, tunnelId };
    expect((await act(customer, id, 'accept-quote')).status).toBe(200);
    if (state === 'confirmed') return { id, tunnelId };
    expect((await act(manager, id, 'start')).status).toBe(200);
    return { id, tunnelId };
  }

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    timeZone = (await fixtures.lab()).timeZone ?? 'UTC';
    manager = await fixtures.user({ role: 'lab_manager' });
    technician = await fixtures.user({ role: 'technician' });
    customer = await fixtures.user({ role: 'customer', name: 'Wilhelmina Crane' });
    rival = await fixtures.user({ role: 'customer', organisationId: (await fixtures.customerOrganisation()).id });
  });
  afterAll(() => t?.close());

  describe('POST /', () => {
    it('valid request → 201 requested, held for the lab’s hold length, audited, both sides mailed', async () => {
      const tunnelId = await fixtures.tunnelId();
      const start = ahead(30);
      const response = await ask(customer, requestBody(tunnelId, start, new Date(start.getTime() + 6 * hour)));
      expect(response.status).toBe(201);
      expect(response.body).toMatchObject({ state: 'requested', tunnelId, organisationId: customer.organisationId, period: { start: start.toISOString(), hours: 6 }, timeZone });
      const holdHours = (Date.parse(response.body.holdExpiresAt) - Date.now()) / hour;
      const settings = await request(t.app).get('/api/bookings/settings').set('Authorization', auth(customer));
      expect(holdHours).toBeGreaterThan(settings.body.holdHours - 0.1);
      expect(holdHours).toBeLessThanOrEqual(settings.body.holdHours);
      const audit = await t.knex('audit_entries').where({ entity: 'booking', entityId: response.body.id });
      expect(audit.map((a: { action: string }) => a.action)).toEqual(['booking.requested']);
      const mail = await waitForBookingMail(t.config.mailDir, customer.email, /Booking request received/);
      expect(mail.text).toContain('Hello Wilhelmina Crane');
      expect(mail.text).toContain(`(${timeZone})`);
      expect(mail.text).toMatch(/Next: /);
      expect(mail.ics).toBeUndefined();
      await waitForBookingMail(t.config.mailDir, manager.email, /Booking request received/);
    });

    it('start in the past → 400 on start; end before start → 400 on end', async () => {
      const tunnelId = await fixtures.tunnelId();
      const past = await ask(customer, requestBody(tunnelId, new Date(Date.now() - day), new Date(Date.now() + hour)));
      expect(past.status).toBe(400);
      expect(past.body.errors).toEqual([{ field: 'start', message: 'The start must be in the future' }]);
      const backwards = await ask(customer, requestBody(tunnelId, ahead(10, 5), ahead(10)));
      expect(backwards.status).toBe(400);
      expect(backwards.body.errors[0].field).toBe('end');
    });

    it('no articles → 400 on articles; an unknown tunnel → 400 on tunnelId', async () => {
      const tunnelId = await fixtures.tunnelId();
      const noArticles = await ask(customer, { ...requestBody(tunnelId, ahead(10), ahead(10, 2)), articles: [] });
      expect(noArticles.status).toBe(400);
      expect(noArticles.body.errors[0]).toEqual({ field: 'articles', message: 'Name at least one article' });
      const unknown = await ask(customer, requestBody('00000000-0000-4000-8000-000000000000', ahead(10), ahead(10, 2)));
      expect(unknown.status).toBe(400);
      expect(unknown.body.errors[0].field).toBe('tunnelId');
    });

    it('overlapping period on the same tunnel → 409 naming the taken period in the lab’s zone, and nothing of its owner', async () => {
      const tunnelId = await fixtures.tunnelId();
      const start = ahead(20);
      expect((await ask(rival, requestBody(tunnelId, start, new Date(start.getTime() + 4 * hour)))).status).toBe(201);
      const clash = await ask(customer, requestBody(tunnelId, new Date(start.getTime() + 2 * hour), new Date(start.getTime() + 6 * hour)));
      expect(clash.status).toBe(409);
      const local = DateTime.fromJSDate(start, { zone: timeZone }).toFormat('ccc d LLL yyyy HH:mm');
      expect(clash.body.detail).toContain(local);
      expect(clash.body.detail).toContain(timeZone);
      expect(JSON.stringify(clash.body)).not.toMatch(/Test customer|23P01|exclusion|tunnel_occupancy/);
    });

    it('back-to-back periods → both 201', async () => {
      const tunnelId = await fixtures.tunnelId();
      const start = ahead(21);
      const middle = new Date(start.getTime() + 4 * hour);
      expect((await ask(customer, requestBody(tunnelId, start, middle))).status).toBe(201);
      expect((await ask(rival, requestBody(tunnelId, middle, new Date(middle.getTime() + 4 * hour)))).status).toBe(201);
    });

    it('race: 50 parallel overlapping requests → exactly one holds the slot, 49 get 409', async () => {
      const tunnelId = await fixtures.tunnelId();
      const start = ahead(22);
      const responses = await Promise.all(
        Array.from({ length: 50 }, (_v, i) => ask(i % 2 === 0 ? customer : rival, requestBody(tunnelId, new Date(start.getTime() + (i % 5) * hour), new Date(start.getTime() + (i % 5) * hour + 6 * hour)))),
      );
      const statuses = responses.map((r) => r.status);
      expect(statuses.filter((s) => s === 201)).toHaveLength(1);
      expect(statuses.filter((s) => s === 409)).toHaveLength(49);
      const holding = await t.knex('tunnel_occupancy').where({ tunnel_id: tunnelId });
      expect(holding).toHaveLength(1);
    });

    it('across the autumn clock change: 09:00 Saturday to 09:00 Sunday in Europe/London is 25 h', async () => {
      expect(timeZone).toBe('Europe/London');
      const tunnelId = await fixtures.tunnelId();
      // The clocks go back on the last Sunday of October: 31 October 2027.
      const start = DateTime.fromObject({ year: 2027, month: 10, day: 30, hour: 9 }, { zone: timeZone });
      const end = start.plus({ days: 1 });
      const response = await ask(customer, { ...requestBody(tunnelId, start.toJSDate(), end.toJSDate()), start: start.toISO(), end: end.toISO() });
      expect(response.status).toBe(201);
      expect(response.body.period).toEqual({ start: '2027-10-30T08:00:00.000Z', end: '2027-10-31T09:00:00.000Z', hours: 25 });
    });

    it('an expired hold frees its slot: a new request on it → 201, and the old one is swept to expired with an audit row', async () => {
      const tunnelId = await fixtures.tunnelId();
      const start = ahead(23);
      const end = new Date(start.getTime() + 4 * hour);
      const first = await ask(rival, requestBody(tunnelId, start, end));
      await t.knex('bookings').where({ id: first.body.id }).update({ hold_expires_at: new Date(Date.now() - 1000) });
      const rivalView = await request(t.app).get(`/api/bookings/${first.body.id}`).set('Authorization', auth(rival));
      expect(rivalView.body.state).toBe('expired');
      const second = await ask(customer, requestBody(tunnelId, start, end));
      expect(second.status).toBe(201);
      expect((await t.knex('bookings').where({ id: first.body.id }).first()).state).toBe('expired');
      const audit = await t.knex('audit_entries').where({ entity: 'booking', entityId: first.body.id }).orderBy('createdAt');
      expect(audit.map((a: { action: string }) => a.action)).toEqual(['booking.requested', 'booking.expired']);
      const mail = await waitForBookingMail(t.config.mailDir, rival.email, /Booking hold expired/, { textIncludes: first.body.id });
      expect(mail.text).toMatch(/the provisional hold lapsed/);
    });

    it('with a plan of the caller’s organisation → 201 and the plan names the booking; another organisation’s plan → 400 on planId', async () => {
      const [own] = await t.knex('plans').insert({ organisation_id: customer.organisationId, name: `Deck plan ${fixtures.unique()}`, current_version: 1, created_by: customer.id }).returning('id');
      const [theirs] = await t.knex('plans').insert({ organisation_id: rival.organisationId, name: `Frame plan ${fixtures.unique()}`, current_version: 1, created_by: rival.id }).returning('id');
      const tunnelId = await fixtures.tunnelId();
      const refused = await ask(customer, { ...requestBody(tunnelId, ahead(24), ahead(24, 2)), planId: theirs.id });
      expect(refused.status).toBe(400);
      expect(refused.body.errors[0].field).toBe('planId');
      const created = await ask(customer, { ...requestBody(tunnelId, ahead(24), ahead(24, 2)), planId: own.id });
      expect(created.status).toBe(201);
      expect((await t.knex('plans').where({ id: own.id }).first()).bookingId).toBe(created.body.id);
    });

    it('lab manager → 403 (customers request for themselves)', async () => {
      expect((await ask(manager, requestBody(await fixtures.tunnelId(), ahead(10), ahead(10, 2)))).status).toBe(403);
    });
  });

  describe('GET / and GET /:id', () => {
    it('a customer sees only their organisation’s bookings; another organisation’s → 404; staff see all', async () => {
      const own = await bookingIn('requested', ahead(41));
      const theirs = await ask(rival, requestBody(await fixtures.tunnelId(), ahead(41), ahead(41, 3)));
      const list = await request(t.app).get('/api/bookings').set('Authorization', auth(customer));
      expect(list.status).toBe(200);
      const ids = list.body.map((b: { id: string }) => b.id);
      expect(ids).toContain(own.id);
      expect(ids).not.toContain(theirs.body.id);
      expect(list.body.every((b: { organisationId: string }) => b.organisationId === customer.organisationId)).toBe(true);
      expect((await request(t.app).get(`/api/bookings/${theirs.body.id}`).set('Authorization', auth(customer))).status).toBe(404);
      expect((await act(customer, theirs.body.id, 'cancel', { reason: 'Not mine' })).status).toBe(404);
      const staff = await request(t.app).get('/api/bookings').query({ state: 'requested' }).set('Authorization', auth(technician));
      expect(staff.body.map((b: { id: string }) => b.id)).toEqual(expect.arrayContaining([own.id, theirs.body.id]));
    });
  });

  describe('life cycle', () => {
    it('request → quote (totals in minor units) → accept (REQUEST, SEQUENCE 0) → move (REQUEST, SEQUENCE 1) → cancel (CANCEL, SEQUENCE 2), one UID', async () => {
      const { id } = await bookingIn('requested', ahead(45));
      const quoted = await act(manager, id, 'quote', {
        lines: [
          { kind: 'tunnel_hours', description: 'Tunnel time', quantity: 8, unitPriceMinor: 15000 },
          { kind: 'setup', description: 'Model set-up', quantity: 1, unitPriceMinor: 60000 },
          { kind: 'staff', description: 'Second technician', quantity: 3, unitPriceMinor: 4550 },
        ],
        currency: 'GBP',
      });
      expect(quoted.status).toBe(200);
      expect(quoted.body.state).toBe('quoted');
      expect(quoted.body.quote).toMatchObject({ state: 'offered', currency: 'GBP', totalMinor: 193650 });
      expect(quoted.body.quote.lines.map((l: { lineTotalMinor: number }) => l.lineTotalMinor)).toEqual([120000, 60000, 13650]);
      const quoteMail = await waitForBookingMail(t.config.mailDir, customer.email, /Quote for your booking/, { textIncludes: id });
      expect(quoteMail.text).toContain('GBP 1,936.50');

      const confirmed = await act(customer, id, 'accept-quote');
      expect(confirmed.status).toBe(200);
      expect(confirmed.body).toMatchObject({ state: 'confirmed', holdExpiresAt: null, quote: { state: 'accepted' } });
      const confirmation = await waitForBookingMail(t.config.mailDir, customer.email, /Booking confirmed/, { textIncludes: id });
      expect(confirmation.text).toMatch(/Bring each article/);
      expect(confirmation.ics).toBeDefined();
      const ics0 = confirmation.ics ?? '';
      expect(ics0).toMatch(/^METHOD:REQUEST\r?$/m);
      expect(ics0).toContain(`BEGIN:VTIMEZONE`);
      expect(ics0).toContain(`TZID:${timeZone}`);
      expect(ics0).toMatch(/^DTSTAMP:\d{8}T\d{6}Z\r?$/m);
      const event0 = firstEvent(ics0);
      const uid = event0.uid;
      expect(uid).toMatch(/@tunnelwright\.invalid$/);
      expect(Number(event0.sequence)).toBe(0);
      expect(event0.start.toISOString()).toBe(confirmed.body.period.start);
      expect(event0.end?.toISOString()).toBe(confirmed.body.period.end);

      const newStart = ahead(46);
      const moved = await act(manager, id, 'reschedule', { start: newStart.toISOString(), end: new Date(newStart.getTime() + 8 * hour).toISOString() });
      expect(moved.status).toBe(200);
      expect(moved.body).toMatchObject({ state: 'confirmed', period: { start: newStart.toISOString(), hours: 8 } });
      const change = await waitForBookingMail(t.config.mailDir, customer.email, /Booking moved/, { textIncludes: id });
      const ics1 = change.ics ?? '';
      expect(ics1).toMatch(/^METHOD:REQUEST\r?$/m);
      expect(ics1).toMatch(/^DTSTAMP:\d{8}T\d{6}Z\r?$/m);
      const event1 = firstEvent(ics1);
      expect(event1.uid).toBe(uid);
      expect(Number(event1.sequence)).toBe(1);
      expect(event1.start.toISOString()).toBe(newStart.toISOString());

      const preview = await request(t.app).get(`/api/bookings/${id}/cancellation-preview`).set('Authorization', auth(customer));
      expect(preview.status).toBe(200);
      expect(preview.body).toMatchObject({ late: false, feeMinor: 0, quoteTotalMinor: 193650, currency: 'GBP' });
      const cancelled = await act(customer, id, 'cancel', { reason: 'The model is not finished.', expectedFeeMinor: 0 });
      expect(cancelled.status).toBe(200);
      expect(cancelled.body).toMatchObject({ state: 'cancelled', cancellation: { reason: 'The model is not finished.', feeMinor: 0, byId: customer.id } });
      const cancel = await waitForBookingMail(t.config.mailDir, customer.email, /Booking cancelled/, { textIncludes: 'The model is not finished.' });
      const ics2 = cancel.ics ?? '';
      expect(ics2).toMatch(/^METHOD:CANCEL\r?$/m);
      expect(ics2).toMatch(/^STATUS:CANCELLED\r?$/m);
      expect(ics2).toMatch(/^DTSTAMP:\d{8}T\d{6}Z\r?$/m);
      const event2 = firstEvent(ics2);
      expect(event2.uid).toBe(uid);
      expect(Number(event2.sequence)).toBe(2);

      const audit = await t.knex('audit_entries').where({ entity: 'booking', entityId: id }).orderBy('createdAt');
      expect(audit.map((a: { action: string }) => a.action)).toEqual(['booking.requested', 'booking.quoted', 'booking.confirmed', 'booking.rescheduled', 'booking.cancelled']);
    });

    it('confirmed → assign technician → in test (linking no test) → completed', async () => {
      const { id } = await bookingIn('confirmed', ahead(47));
      const assigned = await act(manager, id, 'technician', { technicianId: technician.id });
      expect(assigned.status).toBe(200);
      expect(assigned.body.technician).toEqual({ id: technician.id, name: technician.name });
      expect((await act(manager, id, 'technician', { technicianId: manager.id })).status).toBe(400);
      const started = await act(manager, id, 'start');
      expect(started.body.state).toBe('in_test');
      const completed = await act(manager, id, 'complete');
      expect(completed.status).toBe(200);
      expect(completed.body.state).toBe('completed');
      await waitForBookingMail(t.config.mailDir, customer.email, /Test completed/, { textIncludes: id });
    });

    it('in test linking the test record: both point at each other; a test of another customer or tunnel is 400 on testId', async () => {
      const { id, tunnelId } = await bookingIn('confirmed', ahead(52));
      const { TestArticle, TestRecord } = await import('@tunnelwright/db');
      const testOf = async (organisationId: string, tunnel: string) => {
        const article = await TestArticle.query().insert({ organisationId, name: `Booked model ${fixtures.unique()}`, description: '', kind: 'other', conditionOnReceipt: '', referenceArea: 0.1, referenceAreaKind: 'frontal', referenceLength: 0.5, volume: 0, frontalArea: null, momentCentreX: 0, momentCentreY: 0, momentCentreZ: 0, scale: 1 });
        return TestRecord.query().insert({ organisationId, articleId: article.id, tunnelId: tunnel, balanceId: null, bookingId: null, title: `Booked test ${fixtures.unique()}`, state: 'planned', configurations: [], reductionSettings: {}, createdBy: manager.id });
      };
      const rivalTest = await testOf(rival.organisationId, tunnelId);
      const elsewhere = await testOf(customer.organisationId, await fixtures.tunnelId());
      for (const wrong of [rivalTest, elsewhere]) {
        const refused = await act(manager, id, 'start', { testId: wrong.id });
        expect(refused.status).toBe(400);
        expect(refused.body.errors).toEqual([{ field: 'testId', message: "Choose a test of this customer's in this tunnel" }]);
      }
      const own = await testOf(customer.organisationId, tunnelId);
      const started = await act(manager, id, 'start', { testId: own.id });
      expect(started.status, JSON.stringify(started.body)).toBe(200);
      expect(started.body).toMatchObject({ state: 'in_test', testId: own.id });
      expect((await TestRecord.query().findById(own.id))?.bookingId).toBe(id);
    });

    it('decline with a reason → declined and the slot is free again', async () => {
      const start = ahead(48);
      const { id, tunnelId } = await bookingIn('requested', start);
      expect((await act(manager, id, 'decline', { reason: '' })).status).toBe(400);
      const declined = await act(manager, id, 'decline', { reason: 'The balance is away for calibration that week.' });
      expect(declined.body).toMatchObject({ state: 'declined', declineReason: 'The balance is away for calibration that week.' });
      const mail = await waitForBookingMail(t.config.mailDir, customer.email, /declined/, { textIncludes: 'calibration that week' });
      expect(mail.text).toContain('The balance is away for calibration that week.');
      expect((await ask(rival, requestBody(tunnelId, start, new Date(start.getTime() + 8 * hour)))).status).toBe(201);
    });

    it('counter-proposal holds the proposed period; accepting it makes it the requested period and frees the first', async () => {
      const start = ahead(49);
      const { id, tunnelId } = await bookingIn('requested', start);
      const other = ahead(50);
      const proposed = await act(manager, id, 'counter-proposal', { start: other.toISOString(), end: new Date(other.getTime() + 8 * hour).toISOString(), note: 'The next day is free.' });
      expect(proposed.status).toBe(200);
      expect(proposed.body).toMatchObject({ state: 'counter_proposed', counterProposal: { period: { start: other.toISOString() }, note: 'The next day is free.' } });
      expect((await ask(rival, requestBody(tunnelId, other, new Date(other.getTime() + 2 * hour)))).status).toBe(409);
      const accepted = await act(customer, id, 'accept-counter-proposal');
      expect(accepted.body).toMatchObject({ state: 'requested', period: { start: other.toISOString() }, counterProposal: null });
      expect((await ask(rival, requestBody(tunnelId, start, new Date(start.getTime() + 8 * hour)))).status).toBe(201);
    });

    it('reject the quote → rejected and the slot is free again', async () => {
      const start = ahead(51);
      const { id, tunnelId } = await bookingIn('quoted', start);
      const rejected = await act(customer, id, 'reject-quote');
      expect(rejected.body.state).toBe('rejected');
      expect(rejected.body.quote).toBeNull();
      expect((await ask(rival, requestBody(tunnelId, start, new Date(start.getTime() + 8 * hour)))).status).toBe(201);
    });

    it('a quote whose hold lapsed cannot be accepted → 409, the booking is expired', async () => {
      const { id } = await bookingIn('quoted', ahead(52));
      await t.knex('bookings').where({ id }).update({ hold_expires_at: new Date(Date.now() - 1000) });
      const late = await act(customer, id, 'accept-quote');
      expect(late.status).toBe(409);
      expect(late.body.detail).toMatch(/hold on this booking lapsed/);
      expect((await t.knex('bookings').where({ id }).first()).state).toBe('expired');
    });
  });

  describe('illegal transitions → 409 with a clear message', () => {
    it('accept a quote that was never sent', async () => {
      const { id } = await bookingIn('requested', ahead(53));
      const response = await act(customer, id, 'accept-quote');
      expect(response.status).toBe(409);
      expect(response.body.detail).toBe('Cannot accept the quote: the booking is requested, and only a booking that is quoted allows it.');
    });

    it('quote, decline or counter-propose a confirmed booking; complete one not in test; start one twice', async () => {
      const { id } = await bookingIn('confirmed', ahead(54));
      const quote = await act(manager, id, 'quote', { lines: [{ kind: 'extra', quantity: 1, unitPriceMinor: 1 }] });
      expect(quote.status).toBe(409);
      expect(quote.body.detail).toMatch(/^Cannot send a quote: the booking is confirmed/);
      expect((await act(manager, id, 'decline', { reason: 'x' })).status).toBe(409);
      expect((await act(manager, id, 'counter-proposal', { start: ahead(60).toISOString(), end: ahead(60, 2).toISOString() })).status).toBe(409);
      const complete = await act(manager, id, 'complete');
      expect(complete.status).toBe(409);
      expect(complete.body.detail).toMatch(/only a booking that is in test allows it/);
      expect((await act(manager, id, 'start')).status).toBe(200);
      expect((await act(manager, id, 'start')).status).toBe(409);
      const cancel = await act(customer, id, 'cancel', { reason: 'Too late' });
      expect(cancel.status).toBe(409);
      expect(cancel.body.detail).toMatch(/^Cannot cancel the booking: the booking is in test/);
    });

    it('anything on a cancelled booking; accepting a counter-proposal that was never made', async () => {
      const { id } = await bookingIn('quoted', ahead(55));
      expect((await act(customer, id, 'accept-counter-proposal')).status).toBe(409);
      expect((await act(manager, id, 'cancel', { reason: 'Tunnel fault' })).status).toBe(200);
      for (const [user, step] of [
        [customer, 'accept-quote'],
        [customer, 'reject-quote'],
        [manager, 'start'],
        [manager, 'cancel'],
      ] as const) {
        const response = await act(user, id, step, step === 'cancel' ? { reason: 'again' } : {});
        expect(response.status, step).toBe(409);
        expect(response.body.detail).toMatch(/the booking is cancelled/);
      }
    });
  });

  describe('GET /:id/cancellation-preview and POST /:id/cancel', () => {
    it('customer within the late window → late fee of the rule’s share of the accepted quote, applied on cancel', async () => {
      const start = ahead(3);
      const { id, tunnelId } = await bookingIn('confirmed', start, 10);
      const preview = await request(t.app).get(`/api/bookings/${id}/cancellation-preview`).set('Authorization', auth(customer));
      const rules = (await request(t.app).get('/api/bookings/settings').set('Authorization', auth(customer))).body;
      const expected = Math.floor((150000 * rules.lateCancellationPercent + 50) / 100);
      expect(preview.body).toMatchObject({ late: rules.lateCancellationDays >= 3, quoteTotalMinor: 150000, currency: expect.any(String) });
      expect(preview.body.feeMinor).toBe(rules.lateCancellationDays >= 3 ? expected : 0);
      const staffPreview = await request(t.app).get(`/api/bookings/${id}/cancellation-preview`).set('Authorization', auth(manager));
      expect(staffPreview.body).toMatchObject({ late: false, feeMinor: 0 });

      const stale = await act(customer, id, 'cancel', { reason: 'Budget cut', expectedFeeMinor: preview.body.feeMinor + 1 });
      expect(stale.status).toBe(409);
      expect(stale.body.detail).toMatch(/Check the preview again/);
      const cancelled = await act(customer, id, 'cancel', { reason: 'Budget cut', expectedFeeMinor: preview.body.feeMinor });
      expect(cancelled.status).toBe(200);
      expect(cancelled.body.cancellation).toMatchObject({ feeMinor: preview.body.feeMinor });
      // A cancelled booking frees its slot.
      expect((await ask(rival, requestBody(tunnelId, start, new Date(start.getTime() + 10 * hour)))).status).toBe(201);
    });

    it('cancelling before confirmation costs nothing and sends no calendar entry', async () => {
      const { id } = await bookingIn('quoted', ahead(56));
      const preview = await request(t.app).get(`/api/bookings/${id}/cancellation-preview`).set('Authorization', auth(customer));
      expect(preview.body).toMatchObject({ late: false, feeMinor: 0, quoteTotalMinor: 0 });
      expect((await act(customer, id, 'cancel', { reason: 'Found another date' })).status).toBe(200);
      const mail = await waitForBookingMail(t.config.mailDir, customer.email, /Booking cancelled/, { textIncludes: 'Found another date' });
      expect(mail.text).toContain('No fee applies.');
      expect(mail.ics).toBeUndefined();
    });

    it('technician → 403 on preview and cancel', async () => {
      const { id } = await bookingIn('requested', ahead(57));
      expect((await request(t.app).get(`/api/bookings/${id}/cancellation-preview`).set('Authorization', auth(technician))).status).toBe(403);
      expect((await act(technician, id, 'cancel', { reason: 'x' })).status).toBe(403);
    });
  });

  describe('PUT /settings', () => {
    it('lab manager → 200 and the rules apply; invalid percent → 400; customer → 403', async () => {
      const current = (await request(t.app).get('/api/bookings/settings').set('Authorization', auth(manager))).body;
      const bad = await request(t.app).put('/api/bookings/settings').set('Authorization', auth(manager)).send({ holdHours: 48, lateCancellationDays: 7, lateCancellationPercent: 150 });
      expect(bad.status).toBe(400);
      expect(bad.body.errors[0].field).toBe('lateCancellationPercent');
      expect((await request(t.app).put('/api/bookings/settings').set('Authorization', auth(customer)).send({ holdHours: 1, lateCancellationDays: 1, lateCancellationPercent: 1 })).status).toBe(403);
      const changed = await request(t.app).put('/api/bookings/settings').set('Authorization', auth(manager)).send({ holdHours: 24, lateCancellationDays: current.lateCancellationDays, lateCancellationPercent: current.lateCancellationPercent });
      expect(changed.status).toBe(200);
      const { id } = await bookingIn('requested', ahead(58));
      const booking = await request(t.app).get(`/api/bookings/${id}`).set('Authorization', auth(customer));
      expect((Date.parse(booking.body.holdExpiresAt) - Date.now()) / hour).toBeLessThanOrEqual(24);
      await request(t.app).put('/api/bookings/settings').set('Authorization', auth(manager)).send({ holdHours: current.holdHours, lateCancellationDays: current.lateCancellationDays, lateCancellationPercent: current.lateCancellationPercent });
    });

    it('each change leaves an audit row naming the manager with the rules before and after; a refused change leaves none and changes nothing', async () => {
      const current = (await request(t.app).get('/api/bookings/settings').set('Authorization', auth(manager))).body;
      const rules = { holdHours: current.holdHours, lateCancellationDays: current.lateCancellationDays, lateCancellationPercent: current.lateCancellationPercent };
      const auditRows = () => t.knex('audit_entries').where({ action: 'booking_settings.updated', actorId: manager.id }).orderBy('createdAt', 'desc');
      const rowsBefore = (await auditRows()).length;
      const refused = await request(t.app).put('/api/bookings/settings').set('Authorization', auth(manager)).send({ ...rules, holdHours: 2.5 });
      expect(refused.status).toBe(400);
      expect(refused.body.errors.map((e: { field: string }) => e.field)).toEqual(['holdHours']);
      expect(await auditRows()).toHaveLength(rowsBefore);
      expect((await request(t.app).get('/api/bookings/settings').set('Authorization', auth(manager))).body.holdHours).toBe(rules.holdHours);

      const changed = { holdHours: 36, lateCancellationDays: 10, lateCancellationPercent: 30 };
      expect((await request(t.app).put('/api/bookings/settings').set('Authorization', auth(manager)).send(changed)).status).toBe(200);
      const rows = await auditRows();
      expect(rows).toHaveLength(rowsBefore + 1);
      expect(rows[0].entity).toBe('organisation');
      expect(rows[0].before).toEqual(rules);
      expect(rows[0].after).toEqual(changed);
      await request(t.app).put('/api/bookings/settings').set('Authorization', auth(manager)).send(rules);
    });
  });
});
