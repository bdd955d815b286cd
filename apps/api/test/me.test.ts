import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, fixturePassword } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

describe('/api/me', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
  });
  afterAll(() => t?.close());

  describe('GET /', () => {
    it('→ the session user with the organisation name', async () => {
      const customer = await fixtures.user({ role: 'customer' });
      const response = await request(t.app).get('/api/me').set('Authorization', `Bearer ${customer.token}`);
      expect(response.status).toBe(200);
      expect(response.body).toMatchObject({ id: customer.id, role: 'customer', organisationId: customer.organisationId });
      expect(response.body.organisationName).toMatch(/^Test customer/);
    });
  });

  describe('PATCH /', () => {
    it('new name → 200 and an audit row', async () => {
      const analyst = await fixtures.user({ role: 'analyst' });
      const response = await request(t.app).patch('/api/me').set('Authorization', `Bearer ${analyst.token}`).send({ name: '  Wilhelmina Caird  ' });
      expect(response.status).toBe(200);
      expect(response.body.name).toBe('Wilhelmina Caird');
      expect(await t.knex('audit_entries').where({ entityId: analyst.id, action: 'user.profile_updated' }).first()).toBeDefined();
    });

    it('empty name → 400 on name', async () => {
      const analyst = await fixtures.user({ role: 'analyst' });
      const response = await request(t.app).patch('/api/me').set('Authorization', `Bearer ${analyst.token}`).send({ name: ' ' });
      expect(response.status).toBe(400);
      expect(response.body.errors).toEqual([{ field: 'name', message: 'Enter a name' }]);
    });
  });

  describe('POST /password', () => {
    it('right current password, strong new one → 204, the new password signs in, other sessions end, this one goes on', async () => {
      const user = await fixtures.user({ role: 'technician' });
      const elsewhere = await request(t.app).post('/api/auth/login').send({ email: user.email, password: fixturePassword });
      const otherCookie = ([] as string[]).concat(elsewhere.headers['set-cookie'] ?? [])[0]?.split(';')[0] ?? '';
      const response = await request(t.app)
        .post('/api/me/password')
        .set('Authorization', `Bearer ${user.token}`)
        .send({ currentPassword: fixturePassword, newPassword: 'Halyard-Quince-Bellows-91' });
      expect(response.status).toBe(204);
      expect((await request(t.app).post('/api/auth/refresh').set('Cookie', otherCookie)).status).toBe(401);
      const ownCookie = ([] as string[]).concat(response.headers['set-cookie'] ?? [])[0] ?? '';
      expect(ownCookie).toMatch(/tw_refresh=.+Path=\/api\/auth/);
      expect((await request(t.app).post('/api/auth/refresh').set('Cookie', ownCookie.split(';')[0] ?? '')).status).toBe(200);
      expect((await request(t.app).post('/api/auth/login').send({ email: user.email, password: 'Halyard-Quince-Bellows-91' })).status).toBe(200);
    });

    it('wrong current password → 400 on currentPassword', async () => {
      const user = await fixtures.user({ role: 'technician' });
      const response = await request(t.app)
        .post('/api/me/password')
        .set('Authorization', `Bearer ${user.token}`)
        .send({ currentPassword: 'not-my-password', newPassword: 'Halyard-Quince-Bellows-91' });
      expect(response.status).toBe(400);
      expect(response.body.errors).toEqual([{ field: 'currentPassword', message: 'That is not your current password' }]);
    });

    it('weak new password → 400 on newPassword with a suggestion', async () => {
      const user = await fixtures.user({ role: 'technician' });
      const response = await request(t.app).post('/api/me/password').set('Authorization', `Bearer ${user.token}`).send({ currentPassword: fixturePassword, newPassword: 'qwertyuiop12' });
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('newPassword');
      expect(response.body.errors[0].message).toMatch(/too easy to guess\. .+/);
    });
  });
});
