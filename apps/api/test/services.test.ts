import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

describe('/api/services', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;
  let customer: FixtureUser;

  const post = (body: object) => request(t.app).post('/api/services').set('Authorization', `Bearer ${manager.token}`).send(body);

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    manager = await fixtures.user({ role: 'lab_manager' });
    customer = await fixtures.user({ role: 'customer' });
  });
  afterAll(() => t?.close());

  describe('POST /', () => {
    it('valid → 201, rate kept as integer minor units, audit row', async () => {
      const tunnel = await fixtures.tunnel();
      const response = await post({ name: `Half day ${fixtures.unique()}`, unit: 'half_day', rate: 145000, currency: 'GBP', tunnelId: tunnel.id });
      expect(response.status).toBe(201);
      expect(response.body).toMatchObject({ rate: 145000, currency: 'GBP', tunnelId: tunnel.id, archived: false, description: '' });
      expect(await t.knex('audit_entries').where({ entityId: response.body.id, action: 'service.created' }).first()).toBeDefined();
    });

    it('fractional or negative rate, bad currency → 400 naming the fields', async () => {
      const response = await post({ name: `Bad ${fixtures.unique()}`, unit: 'hour', rate: 12.5, currency: 'pounds' });
      expect(response.status).toBe(400);
      expect(response.body.errors).toEqual(
        expect.arrayContaining([
          { field: 'rate', message: 'Rate must be whole minor units' },
          { field: 'currency', message: 'Use a three-letter currency code' },
        ]),
      );
      expect((await post({ name: `Neg ${fixtures.unique()}`, unit: 'hour', rate: -1 })).body.errors[0]).toEqual({ field: 'rate', message: 'Rate cannot be negative' });
    });

    it('unknown tunnel → 400 on tunnelId', async () => {
      const response = await post({ name: `Orphan ${fixtures.unique()}`, unit: 'item', rate: 100, tunnelId: '00000000-0000-4000-8000-000000000000' });
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('tunnelId');
    });

    it('customer → 403', async () => {
      const response = await request(t.app).post('/api/services').set('Authorization', `Bearer ${customer.token}`).send({ name: 'X', unit: 'item', rate: 1 });
      expect(response.status).toBe(403);
    });
  });

  describe('PUT /:id', () => {
    it('valid → 200 with before and after in the audit', async () => {
      const service = await fixtures.service();
      const response = await request(t.app)
        .put(`/api/services/${service.id}`)
        .set('Authorization', `Bearer ${manager.token}`)
        .send({ name: service.name, unit: 'day', rate: 265000, currency: 'GBP' });
      expect(response.status).toBe(200);
      expect(response.body).toMatchObject({ unit: 'day', rate: 265000 });
      const audit = await t.knex('audit_entries').where({ entityId: service.id, action: 'service.updated' }).first();
      expect(audit.before.rate).toBe(10000);
      expect(audit.after.rate).toBe(265000);
    });
  });

  describe('archive and restore', () => {
    it('customers see live services only; staff can list archived ones', async () => {
      const service = await fixtures.service();
      expect((await request(t.app).post(`/api/services/${service.id}/archive`).set('Authorization', `Bearer ${manager.token}`)).body.archived).toBe(true);
      const forCustomer = await request(t.app).get('/api/services?includeArchived=true').set('Authorization', `Bearer ${customer.token}`);
      expect(forCustomer.body.map((s: { id: string }) => s.id)).not.toContain(service.id);
      expect((await request(t.app).get(`/api/services/${service.id}`).set('Authorization', `Bearer ${customer.token}`)).status).toBe(404);
      const forManager = await request(t.app).get('/api/services?includeArchived=true').set('Authorization', `Bearer ${manager.token}`);
      expect(forManager.body.map((s: { id: string }) => s.id)).toContain(service.id);
      expect((await request(t.app).post(`/api/services/${service.id}/restore`).set('Authorization', `Bearer ${manager.token}`)).body.archived).toBe(false);
    });
  });
});
