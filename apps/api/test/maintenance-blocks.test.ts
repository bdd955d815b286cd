import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

const hour = 3_600_000;
const day = 24 * hour;

function ahead(days: number, hours = 0): Date {
  return new Date(Math.ceil((Date.now() + days * day) / hour) * hour + hours * hour);
}

describe('/api/maintenance-blocks', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;
  let technician: FixtureUser;
  let customer: FixtureUser;

  const auth = (user: FixtureUser) => `Bearer ${user.token}`;
  const block = (user: FixtureUser, tunnelId: string, start: Date, end: Date, reason = 'Fan bearing inspection') =>
    request(t.app).post('/api/maintenance-blocks').set('Authorization', auth(user)).send({ tunnelId, start: start.toISOString(), end: end.toISOString(), reason });
  const book = (tunnelId: string, start: Date, end: Date) =>
    request(t.app).post('/api/bookings').set('Authorization', auth(customer)).send({ tunnelId, start: start.toISOString(), end: end.toISOString(), articles: [{ name: 'Mast section', referenceAreaKind: 'frontal' }] });

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    manager = await fixtures.user({ role: 'lab_manager' });
    technician = await fixtures.user({ role: 'technician' });
    customer = await fixtures.user({ role: 'customer' });
  });
  afterAll(() => t?.close());

  describe('POST /', () => {
    it('lab manager → 201 with the period and the lab’s zone, audited', async () => {
      const tunnelId = await fixtures.tunnelId();
      const response = await block(manager, tunnelId, ahead(80), ahead(80, 24));
      expect(response.status).toBe(201);
      expect(response.body).toMatchObject({ tunnelId, reason: 'Fan bearing inspection', period: { start: ahead(80).toISOString(), hours: 24 }, timeZone: (await fixtures.lab()).timeZone });
      const audit = await t.knex('audit_entries').where({ entity: 'maintenance_block', entityId: response.body.id }).first();
      expect(audit).toMatchObject({ action: 'maintenance_block.created', actorId: manager.id });
    });

    it('a booking inside a maintenance block → 409; a block over a booking → 409; back-to-back → 201', async () => {
      const tunnelId = await fixtures.tunnelId();
      expect((await block(manager, tunnelId, ahead(81), ahead(81, 8))).status).toBe(201);
      const booking = await book(tunnelId, ahead(81, 4), ahead(81, 10));
      expect(booking.status).toBe(409);
      expect(booking.body.detail).toMatch(/already taken/);
      expect((await book(tunnelId, ahead(81, 8), ahead(81, 12))).status).toBe(201);
      const over = await block(manager, tunnelId, ahead(81, 10), ahead(81, 14));
      expect(over.status).toBe(409);
      expect((await block(manager, tunnelId, ahead(81, 12), ahead(81, 14))).status).toBe(201);
    });

    it('empty reason → 400 on reason; end before start → 400 on end', async () => {
      const tunnelId = await fixtures.tunnelId();
      expect((await block(manager, tunnelId, ahead(82), ahead(82, 2), '')).body.errors[0].field).toBe('reason');
      expect((await block(manager, tunnelId, ahead(82, 2), ahead(82))).body.errors[0].field).toBe('end');
    });

    it('technician → 403; customer → 403', async () => {
      const tunnelId = await fixtures.tunnelId();
      expect((await block(technician, tunnelId, ahead(83), ahead(83, 2))).status).toBe(403);
      expect((await block(customer, tunnelId, ahead(83), ahead(83, 2))).status).toBe(403);
    });
  });

  describe('GET /', () => {
    it('staff → 200 filtered by tunnel; customer → 403', async () => {
      const tunnelId = await fixtures.tunnelId();
      const created = await block(manager, tunnelId, ahead(84), ahead(84, 3));
      const list = await request(t.app).get('/api/maintenance-blocks').query({ tunnelId }).set('Authorization', auth(technician));
      expect(list.status).toBe(200);
      expect(list.body.map((b: { id: string }) => b.id)).toEqual([created.body.id]);
      expect((await request(t.app).get('/api/maintenance-blocks').set('Authorization', auth(customer))).status).toBe(403);
    });
  });

  describe('DELETE /:id', () => {
    it('lab manager → 204 and the period can be booked; again → 404', async () => {
      const tunnelId = await fixtures.tunnelId();
      const created = await block(manager, tunnelId, ahead(85), ahead(85, 6));
      expect((await book(tunnelId, ahead(85, 1), ahead(85, 2))).status).toBe(409);
      expect((await request(t.app).delete(`/api/maintenance-blocks/${created.body.id}`).set('Authorization', auth(manager))).status).toBe(204);
      expect((await book(tunnelId, ahead(85, 1), ahead(85, 2))).status).toBe(201);
      expect((await request(t.app).delete(`/api/maintenance-blocks/${created.body.id}`).set('Authorization', auth(manager))).status).toBe(404);
    });
  });
});
