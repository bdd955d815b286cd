import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

describe('/api/organisations', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    manager = await fixtures.user({ role: 'lab_manager' });
  });
  afterAll(() => t?.close());

  describe('GET /', () => {
    it('lab manager → the lab first, then customers by name', async () => {
      const response = await request(t.app).get('/api/organisations').set('Authorization', `Bearer ${manager.token}`);
      expect(response.status).toBe(200);
      expect(response.body[0].kind).toBe('lab');
      expect(response.body.slice(1).every((o: { kind: string }) => o.kind === 'customer')).toBe(true);
    });

    it('technician → 200, since staff open tests for a customer; customer → 403', async () => {
      const technician = await fixtures.user({ role: 'technician' });
      const customer = await fixtures.user({ role: 'customer' });
      const asTechnician = await request(t.app).get('/api/organisations').set('Authorization', `Bearer ${technician.token}`);
      expect(asTechnician.status).toBe(200);
      expect(asTechnician.body.some((o: { id: string }) => o.id === customer.organisationId)).toBe(true);
      expect((await request(t.app).get('/api/organisations').set('Authorization', `Bearer ${customer.token}`)).status).toBe(403);
    });
  });

  describe('GET /:id', () => {
    it('customer → own organisation 200, another organisation 404, the lab 404', async () => {
      const customer = await fixtures.user({ role: 'customer' });
      const other = await fixtures.customerOrganisation();
      const get = (id: string) => request(t.app).get(`/api/organisations/${id}`).set('Authorization', `Bearer ${customer.token}`);
      expect((await get(customer.organisationId)).status).toBe(200);
      expect((await get(other.id)).status).toBe(404);
      expect((await get((await fixtures.lab()).id)).status).toBe(404);
    });
  });

  describe('POST /', () => {
    it('new name → 201 customer organisation with an audit row; same name again → 409 on name', async () => {
      const name = `Fernhollow Masts ${fixtures.unique()}`;
      const created = await request(t.app).post('/api/organisations').set('Authorization', `Bearer ${manager.token}`).send({ name });
      expect(created.status).toBe(201);
      expect(created.body).toMatchObject({ name, kind: 'customer' });
      expect(await t.knex('audit_entries').where({ entityId: created.body.id, action: 'organisation.created' }).first()).toBeDefined();
      const again = await request(t.app).post('/api/organisations').set('Authorization', `Bearer ${manager.token}`).send({ name });
      expect(again.status).toBe(409);
      expect(again.body.errors[0]).toEqual({ field: 'name', message: 'This name is already in use' });
    });
  });
});
