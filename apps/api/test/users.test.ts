import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, fixturePassword, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

describe('/api/users', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;

  const as = (user: FixtureUser) => ({
    get: (path: string) => request(t.app).get(path).set('Authorization', `Bearer ${user.token}`),
    patch: (path: string, body: object) => request(t.app).patch(path).set('Authorization', `Bearer ${user.token}`).send(body),
  });

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    manager = await fixtures.user({ role: 'lab_manager' });
  });
  afterAll(() => t?.close());

  describe('GET /', () => {
    it('q finds by name, sort and order apply, pages count from 1 with a total', async () => {
      const tag = fixtures.unique().replace('-', '');
      for (const name of ['Alder', 'Birch', 'Cedar']) await fixtures.user({ role: 'customer', name: `${name} ${tag}` });
      const page1 = await as(manager).get(`/api/users?q=${tag}&sort=name&order=desc&page=1&pageSize=2`);
      expect(page1.status).toBe(200);
      expect(page1.body.total).toBe(3);
      expect(page1.body.items.map((u: { name: string }) => u.name)).toEqual([`Cedar ${tag}`, `Birch ${tag}`]);
      const page2 = await as(manager).get(`/api/users?q=${tag}&sort=name&order=desc&page=2&pageSize=2`);
      expect(page2.body.items.map((u: { name: string }) => u.name)).toEqual([`Alder ${tag}`]);
      expect(page2.body.items[0]).not.toHaveProperty('passwordHash');
    });

    it('q with LIKE wildcards is taken literally', async () => {
      const response = await as(manager).get('/api/users?q=%25%25%25_');
      expect(response.status).toBe(200);
      expect(response.body.total).toBe(0);
    });

    it('role=technician lists technicians only; active=true leaves out deactivated ones', async () => {
      const tag = fixtures.unique().replace('-', '');
      const working = await fixtures.user({ role: 'technician', name: `Rowan ${tag}` });
      const away = await fixtures.user({ role: 'technician', name: `Sorrel ${tag}`, active: false });
      await fixtures.user({ role: 'analyst', name: `Tamsin ${tag}` });
      await fixtures.user({ role: 'customer', name: `Umber ${tag}` });
      const technicians = await as(manager).get(`/api/users?q=${tag}&role=technician`);
      expect(technicians.status).toBe(200);
      expect(technicians.body.total).toBe(2);
      expect(technicians.body.items.map((u: { id: string }) => u.id).sort()).toEqual([working.id, away.id].sort());
      const active = await as(manager).get(`/api/users?q=${tag}&role=technician&active=true`);
      expect(active.body.total).toBe(1);
      expect(active.body.items.map((u: { id: string; role: string; active: boolean }) => [u.id, u.role, u.active])).toEqual([[working.id, 'technician', true]]);
      const deactivated = await as(manager).get(`/api/users?q=${tag}&active=false`);
      expect(deactivated.body.items.map((u: { id: string }) => u.id)).toEqual([away.id]);
    });

    it('an unknown role or an active flag that is not true/false → 400 naming the field', async () => {
      const role = await as(manager).get('/api/users?role=pilot');
      expect(role.status).toBe(400);
      expect(role.body.errors.map((e: { field: string }) => e.field)).toEqual(['role']);
      expect(role.body.errors[0].message).toMatch(/customer, technician, analyst, lab_manager/);
      const active = await as(manager).get('/api/users?active=yes');
      expect(active.status).toBe(400);
      expect(active.body.errors.map((e: { field: string }) => e.field)).toEqual(['active']);
    });

    it('bad sort and page size → 400 naming the fields', async () => {
      const response = await as(manager).get('/api/users?sort=password&pageSize=1000');
      expect(response.status).toBe(400);
      expect(response.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['pageSize', 'sort']);
    });
  });

  describe('PATCH /:id', () => {
    it('role change → 200, audit row with before and after', async () => {
      const technician = await fixtures.user({ role: 'technician' });
      const response = await as(manager).patch(`/api/users/${technician.id}`, { role: 'analyst' });
      expect(response.status).toBe(200);
      expect(response.body.role).toBe('analyst');
      const audit = await t.knex('audit_entries').where({ entity: 'user', entityId: technician.id, action: 'user.role_changed' }).first();
      expect(audit.actorId).toBe(manager.id);
      expect(audit.before.role).toBe('technician');
      expect(audit.after.role).toBe('analyst');
    });

    it('customer made staff → 400 on role', async () => {
      const customer = await fixtures.user({ role: 'customer' });
      const response = await as(manager).patch(`/api/users/${customer.id}`, { role: 'lab_manager' });
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('role');
    });

    it('deactivate → the user can no longer sign in or use tokens; reactivate → sign-in works again', async () => {
      const analyst = await fixtures.user({ role: 'analyst' });
      expect((await as(manager).patch(`/api/users/${analyst.id}`, { active: false })).body.active).toBe(false);
      expect((await request(t.app).get('/api/me').set('Authorization', `Bearer ${analyst.token}`)).status).toBe(401);
      expect((await request(t.app).post('/api/auth/login').send({ email: analyst.email, password: fixturePassword })).status).toBe(401);
      expect((await as(manager).patch(`/api/users/${analyst.id}`, { active: true })).status).toBe(200);
      expect((await request(t.app).post('/api/auth/login').send({ email: analyst.email, password: fixturePassword })).status).toBe(200);
      const actions = (await t.knex('audit_entries').where({ entityId: analyst.id }).orderBy('createdAt')).map((a: { action: string }) => a.action);
      expect(actions).toEqual(['user.deactivated', 'user.reactivated']);
    });

    it('the last active lab manager cannot demote or deactivate themself → 409', async () => {
      // Make this manager the only active one for the duration of the test.
      const others = await t.knex('users').where({ role: 'lab_manager', active: true }).whereNot({ id: manager.id }).select('id');
      await t.knex('users').whereIn('id', others.map((o: { id: string }) => o.id)).update({ active: false });
      try {
        const demote = await as(manager).patch(`/api/users/${manager.id}`, { role: 'analyst' });
        expect(demote.status).toBe(409);
        expect(demote.body.detail).toMatch(/only active lab manager/);
        expect((await as(manager).patch(`/api/users/${manager.id}`, { active: false })).status).toBe(409);
        const second = await fixtures.user({ role: 'lab_manager' });
        expect((await as(manager).patch(`/api/users/${manager.id}`, { role: 'analyst' })).status).toBe(200);
        expect((await as(second).patch(`/api/users/${manager.id}`, { role: 'lab_manager' })).status).toBe(200);
      } finally {
        await t.knex('users').whereIn('id', others.map((o: { id: string }) => o.id)).update({ active: true });
      }
    });

    it('empty body → 400 "Nothing to change"', async () => {
      const response = await as(manager).patch(`/api/users/${manager.id}`, {});
      expect(response.status).toBe(400);
      expect(response.body.errors[0].message).toBe('Nothing to change');
    });

    it('unknown id → 404; malformed id → 404', async () => {
      expect((await as(manager).patch('/api/users/00000000-0000-4000-8000-000000000000', { name: 'X' })).status).toBe(404);
      expect((await as(manager).patch('/api/users/not-a-uuid', { name: 'X' })).status).toBe(404);
    });
  });
});
