import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

describe('/api/audit', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    manager = await fixtures.user({ role: 'lab_manager', name: 'Audit Keeper' });
  });
  afterAll(() => t?.close());

  describe('GET /', () => {
    it('filtered by entity and record → newest first, with actor name and before/after', async () => {
      const tunnel = await fixtures.tunnel();
      const auth = `Bearer ${manager.token}`;
      await request(t.app).post(`/api/tunnels/${tunnel.id}/archive`).set('Authorization', auth);
      await request(t.app).post(`/api/tunnels/${tunnel.id}/restore`).set('Authorization', auth);
      const response = await request(t.app).get(`/api/audit?entity=tunnel&entityId=${tunnel.id}`).set('Authorization', auth);
      expect(response.status).toBe(200);
      expect(response.body.total).toBe(2);
      expect(response.body.items.map((e: { action: string }) => e.action)).toEqual(['tunnel.restored', 'tunnel.archived']);
      expect(response.body.items[0]).toMatchObject({ actorId: manager.id, actorName: 'Audit Keeper', entity: 'tunnel', entityId: tunnel.id });
      expect(response.body.items[1].before.archived).toBe(false);
      expect(response.body.items[1].after.archived).toBe(true);
    });

    it('a failed change leaves no audit row (same transaction)', async () => {
      const name = `Unique ${fixtures.unique()}`;
      const auth = `Bearer ${manager.token}`;
      const body = { name, kind: 'closed', width: 1, height: 1, area: 1, length: 1, maxSpeed: 10 };
      await request(t.app).post('/api/tunnels').set('Authorization', auth).send(body);
      const before = await t.knex('audit_entries').count({ n: '*' }).first();
      expect((await request(t.app).post('/api/tunnels').set('Authorization', auth).send(body)).status).toBe(409);
      expect(await t.knex('audit_entries').count({ n: '*' }).first()).toEqual(before);
    });

    it('page size over the cap → 400 on pageSize', async () => {
      const response = await request(t.app).get('/api/audit?pageSize=5000').set('Authorization', `Bearer ${manager.token}`);
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('pageSize');
    });
  });
});
