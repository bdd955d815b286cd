import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

const hour = 3_600_000;
const day = 24 * hour;

function ahead(days: number, hours = 0): Date {
  return new Date(Math.ceil((Date.now() + days * day) / hour) * hour + hours * hour);
}

interface Slot {
  status: 'busy' | 'free';
  period: { start: string; end: string; hours: number };
  kind?: string;
  bookingId?: string;
  organisationName?: string;
  state?: string;
  reason?: string;
}

describe('/api/tunnels/:id/occupancy', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;
  let analyst: FixtureUser;
  let customer: FixtureUser;
  let rival: FixtureUser;
  let rivalOrganisationName: string;
  let tunnelId: string;
  let ownId: string;
  let rivalId: string;
  const base = ahead(70);
  const at = (hours: number) => new Date(base.getTime() + hours * hour);

  const auth = (user: FixtureUser) => `Bearer ${user.token}`;
  const occupancy = (user: FixtureUser, from = at(0), to = at(24)) =>
    request(t.app).get(`/api/tunnels/${tunnelId}/occupancy`).query({ from: from.toISOString(), to: to.toISOString() }).set('Authorization', auth(user));
  const book = async (user: FixtureUser, start: Date, end: Date) => {
    const response = await request(t.app)
      .post('/api/bookings')
      .set('Authorization', auth(user))
      .send({ tunnelId, start: start.toISOString(), end: end.toISOString(), articles: [{ name: 'Solar frame section', referenceAreaKind: 'planform' }] });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    return response.body.id as string;
  };

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    manager = await fixtures.user({ role: 'lab_manager' });
    analyst = await fixtures.user({ role: 'analyst' });
    customer = await fixtures.user({ role: 'customer' });
    const rivalOrganisation = await fixtures.customerOrganisation();
    rivalOrganisationName = rivalOrganisation.name;
    rival = await fixtures.user({ role: 'customer', organisationId: rivalOrganisation.id });
    tunnelId = await fixtures.tunnelId();
    ownId = await book(customer, at(2), at(6));
    rivalId = await book(rival, at(8), at(12));
    const block = await request(t.app)
      .post('/api/maintenance-blocks')
      .set('Authorization', auth(manager))
      .send({ tunnelId, start: at(14).toISOString(), end: at(16).toISOString(), reason: 'Screen cleaning' });
    expect(block.status).toBe(201);
  });
  afterAll(() => t?.close());

  describe('GET /:id/occupancy', () => {
    it('customer → 200: free and busy stretches covering the window, the lab’s zone, their own booking in full', async () => {
      const response = await occupancy(customer);
      expect(response.status).toBe(200);
      expect(response.body.timeZone).toBe((await fixtures.lab()).timeZone);
      const slots = response.body.slots as Slot[];
      expect(slots.map((s) => [s.status, s.period.hours])).toEqual([
        ['free', 2],
        ['busy', 4],
        ['free', 2],
        ['busy', 4],
        ['free', 2],
        ['busy', 2],
        ['free', 8],
      ]);
      expect(slots[1]).toMatchObject({ kind: 'booking', bookingId: ownId, state: 'requested' });
      expect(slots[5]).toMatchObject({ kind: 'maintenance' });
      expect(slots[5]?.reason).toBeUndefined();
    });

    it('customer → another organisation’s booking shows only as busy, with nothing about it', async () => {
      const response = await occupancy(customer);
      const theirs = (response.body.slots as Slot[])[3];
      expect(theirs).toEqual({ status: 'busy', period: { start: at(8).toISOString(), end: at(12).toISOString(), hours: 4 } });
      expect(JSON.stringify(response.body)).not.toContain(rivalId);
      expect(JSON.stringify(response.body)).not.toContain(rivalOrganisationName);
    });

    it('staff → every booking with its organisation, and the maintenance reason', async () => {
      const slots = (await occupancy(analyst)).body.slots as Slot[];
      expect(slots[3]).toMatchObject({ kind: 'booking', bookingId: rivalId, organisationName: rivalOrganisationName });
      expect(slots[5]).toMatchObject({ kind: 'maintenance', reason: 'Screen cleaning' });
    });

    it('a window starting inside a booking → the busy stretch is clipped to the window', async () => {
      const slots = (await occupancy(customer, at(4), at(7))).body.slots as Slot[];
      expect(slots.map((s) => [s.status, s.period.hours])).toEqual([
        ['busy', 2],
        ['free', 1],
      ]);
    });

    it('a lapsed hold shows as free at once, before any sweep', async () => {
      const lapsing = await book(rival, at(18), at(20));
      expect(((await occupancy(customer)).body.slots as Slot[]).filter((s) => s.status === 'busy')).toHaveLength(4);
      await t.knex('bookings').where({ id: lapsing }).update({ hold_expires_at: new Date(Date.now() - 1000) });
      expect(((await occupancy(customer)).body.slots as Slot[]).filter((s) => s.status === 'busy')).toHaveLength(3);
    });

    it('a cancelled booking shows as free', async () => {
      const cancelling = await book(customer, at(20), at(22));
      const cancelled = await request(t.app).post(`/api/bookings/${cancelling}/cancel`).set('Authorization', auth(customer)).send({ reason: 'Plans changed' });
      expect(cancelled.status).toBe(200);
      const slots = (await occupancy(customer, at(20), at(22))).body.slots as Slot[];
      expect(slots).toEqual([{ status: 'free', period: { start: at(20).toISOString(), end: at(22).toISOString(), hours: 2 } }]);
    });

    it('window the wrong way round → 400 on to; a window over 400 days → 400; missing from → 400', async () => {
      expect((await occupancy(customer, at(5), at(1))).body.errors[0].field).toBe('to');
      const long = await occupancy(customer, at(0), new Date(base.getTime() + 401 * day));
      expect(long.status).toBe(400);
      expect(long.body.errors[0].message).toMatch(/400 days/);
      const missing = await request(t.app).get(`/api/tunnels/${tunnelId}/occupancy`).query({ to: at(1).toISOString() }).set('Authorization', auth(customer));
      expect(missing.status).toBe(400);
    });

    it('unknown tunnel → 404; anonymous → 401', async () => {
      expect((await request(t.app).get('/api/tunnels/00000000-0000-4000-8000-000000000000/occupancy').query({ from: at(0).toISOString(), to: at(1).toISOString() }).set('Authorization', auth(customer))).status).toBe(404);
      expect((await request(t.app).get(`/api/tunnels/${tunnelId}/occupancy`).query({ from: at(0).toISOString(), to: at(1).toISOString() })).status).toBe(401);
    });
  });
});
