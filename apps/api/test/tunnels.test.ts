import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

const input = (name: string) => ({
  name,
  kind: 'closed',
  description: 'Test section with fillets',
  width: 2,
  height: 1.5,
  area: 2.9,
  length: 4.5,
  minSpeed: 5,
  maxSpeed: 55,
  pressureGradient: -0.6,
  shapeFactor: 0.86,
  capabilities: { yawRange: 360 },
});

describe('/api/tunnels', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;
  let customer: FixtureUser;
  let technician: FixtureUser;

  const auth = (user: FixtureUser) => `Bearer ${user.token}`;

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    manager = await fixtures.user({ role: 'lab_manager' });
    customer = await fixtures.user({ role: 'customer' });
    technician = await fixtures.user({ role: 'technician' });
  });
  afterAll(() => t?.close());

  describe('POST /', () => {
    it('valid → 201 with SI fields and defaults, audit row in the same transaction', async () => {
      const name = `Closed ${fixtures.unique()}`;
      const response = await request(t.app).post('/api/tunnels').set('Authorization', auth(manager)).send(input(name));
      expect(response.status).toBe(201);
      expect(response.body).toMatchObject({ name, area: 2.9, maxSpeed: 55, archived: false, openJetConstants: {} });
      const audit = await t.knex('audit_entries').where({ entity: 'tunnel', entityId: response.body.id }).first();
      expect(audit).toMatchObject({ action: 'tunnel.created', actorId: manager.id });
      expect(audit.after.name).toBe(name);
    });

    it('invalid numbers → 400 naming each field', async () => {
      const response = await request(t.app)
        .post('/api/tunnels')
        .set('Authorization', auth(manager))
        .send({ ...input(`Bad ${fixtures.unique()}`), width: -2, area: 'big', kind: 'wind-sock' });
      expect(response.status).toBe(400);
      expect(response.body.errors).toEqual(
        expect.arrayContaining([
          { field: 'width', message: 'Width must be greater than zero' },
          { field: 'area', message: 'Area must be a number' },
          expect.objectContaining({ field: 'kind' }),
        ]),
      );
    });

    it('minimum above maximum speed → 400 on minSpeed', async () => {
      const response = await request(t.app).post('/api/tunnels').set('Authorization', auth(manager)).send({ ...input(`Speeds ${fixtures.unique()}`), minSpeed: 60 });
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('minSpeed');
    });

    it('duplicate name → 409 on name, with no SQL in the answer', async () => {
      const name = `Twin ${fixtures.unique()}`;
      await request(t.app).post('/api/tunnels').set('Authorization', auth(manager)).send(input(name));
      const response = await request(t.app).post('/api/tunnels').set('Authorization', auth(manager)).send(input(name));
      expect(response.status).toBe(409);
      expect(response.body.errors[0].field).toBe('name');
      expect(JSON.stringify(response.body)).not.toMatch(/duplicate key|insert into|tunnels_name|constraint/i);
    });

    it('technician → 403', async () => {
      expect((await request(t.app).post('/api/tunnels').set('Authorization', auth(technician)).send(input('Nope'))).status).toBe(403);
    });
  });

  describe('PUT /:id', () => {
    it('valid → 200, audit row with before and after', async () => {
      const tunnel = await fixtures.tunnel();
      const response = await request(t.app).put(`/api/tunnels/${tunnel.id}`).set('Authorization', auth(manager)).send({ ...input(tunnel.name), maxSpeed: 45 });
      expect(response.status).toBe(200);
      expect(response.body.maxSpeed).toBe(45);
      const audit = await t.knex('audit_entries').where({ entityId: tunnel.id, action: 'tunnel.updated' }).first();
      expect(audit.before.maxSpeed).toBe(50);
      expect(audit.after.maxSpeed).toBe(45);
    });

    it('unknown id → 404 problem', async () => {
      const response = await request(t.app).put('/api/tunnels/00000000-0000-4000-8000-000000000000').set('Authorization', auth(manager)).send(input('Ghost'));
      expect(response.status).toBe(404);
      expect(response.headers['content-type']).toMatch(/problem\+json/);
    });
  });

  describe('archive and restore', () => {
    it('archived tunnels vanish for customers (list and by id), staff see them on request; restore brings them back', async () => {
      const tunnel = await fixtures.tunnel();
      const archived = await request(t.app).post(`/api/tunnels/${tunnel.id}/archive`).set('Authorization', auth(manager));
      expect(archived.status).toBe(200);
      expect(archived.body.archived).toBe(true);

      const customerList = await request(t.app).get('/api/tunnels?includeArchived=true').set('Authorization', auth(customer));
      expect(customerList.body.map((x: { id: string }) => x.id)).not.toContain(tunnel.id);
      expect((await request(t.app).get(`/api/tunnels/${tunnel.id}`).set('Authorization', auth(customer))).status).toBe(404);
      const staffDefault = await request(t.app).get('/api/tunnels').set('Authorization', auth(technician));
      expect(staffDefault.body.map((x: { id: string }) => x.id)).not.toContain(tunnel.id);
      const staffAll = await request(t.app).get('/api/tunnels?includeArchived=true').set('Authorization', auth(technician));
      expect(staffAll.body.map((x: { id: string }) => x.id)).toContain(tunnel.id);

      expect((await request(t.app).post(`/api/tunnels/${tunnel.id}/restore`).set('Authorization', auth(manager))).body.archived).toBe(false);
      expect((await request(t.app).get(`/api/tunnels/${tunnel.id}`).set('Authorization', auth(customer))).status).toBe(200);
      const actions = (await t.knex('audit_entries').where({ entityId: tunnel.id }).orderBy('createdAt')).map((a: { action: string }) => a.action);
      expect(actions).toEqual(['tunnel.archived', 'tunnel.restored']);
    });

    it('archiving twice changes nothing the second time', async () => {
      const tunnel = await fixtures.tunnel();
      await request(t.app).post(`/api/tunnels/${tunnel.id}/archive`).set('Authorization', auth(manager));
      expect((await request(t.app).post(`/api/tunnels/${tunnel.id}/archive`).set('Authorization', auth(manager))).status).toBe(200);
      expect(await t.knex('audit_entries').where({ entityId: tunnel.id }).count({ n: '*' }).first()).toEqual({ n: '1' });
    });

    it('bad includeArchived → 400', async () => {
      expect((await request(t.app).get('/api/tunnels?includeArchived=maybe').set('Authorization', auth(manager))).status).toBe(400);
    });
  });
});
