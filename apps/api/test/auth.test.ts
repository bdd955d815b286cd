import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, fixturePassword, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

function refreshCookieOf(response: request.Response): string {
  const cookies = ([] as string[]).concat(response.headers['set-cookie'] ?? []);
  const cookie = cookies.find((c) => c.startsWith('tw_refresh='));
  if (!cookie) throw new Error('no refresh cookie');
  return cookie.split(';')[0] ?? '';
}

describe('/api/auth', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let analyst: FixtureUser;

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    analyst = await fixtures.user({ role: 'analyst' });
  });
  afterAll(() => t?.close());

  describe('POST /login', () => {
    it('right password → 200 with an access token and an httpOnly, SameSite=Strict refresh cookie on /api/auth', async () => {
      const response = await request(t.app).post('/api/auth/login').send({ email: analyst.email.toUpperCase(), password: fixturePassword });
      expect(response.status).toBe(200);
      expect(response.body.user).toMatchObject({ id: analyst.id, role: 'analyst' });
      expect(response.body.expiresIn).toBe(900);
      const decoded = jwt.verify(response.body.accessToken, t.config.jwtSecret) as jwt.JwtPayload;
      expect(decoded).toMatchObject({ sub: analyst.id, role: 'analyst', org: analyst.organisationId });
      const cookie = ([] as string[]).concat(response.headers['set-cookie'] ?? []).find((c) => c.startsWith('tw_refresh='));
      expect(cookie).toMatch(/HttpOnly/);
      expect(cookie).toMatch(/SameSite=Strict/);
      expect(cookie).toMatch(/Path=\/api\/auth/);
    });

    it('wrong password and unknown e-mail → the same 401 answer', async () => {
      const wrongPassword = await request(t.app).post('/api/auth/login').send({ email: analyst.email, password: 'not-the-password' });
      const unknownEmail = await request(t.app).post('/api/auth/login').send({ email: `nobody-${fixtures.unique()}@example.com`, password: 'not-the-password' });
      expect(wrongPassword.status).toBe(401);
      expect(unknownEmail.status).toBe(401);
      expect({ ...wrongPassword.body, instance: undefined }).toEqual({ ...unknownEmail.body, instance: undefined });
    });

    it('invitation not yet accepted → 401', async () => {
      const { user } = await fixtures.invitation();
      const response = await request(t.app).post('/api/auth/login').send({ email: user.email, password: fixturePassword });
      expect(response.status).toBe(401);
    });

    it('deactivated user → 401', async () => {
      const user = await fixtures.user({ role: 'technician', active: false });
      const response = await request(t.app).post('/api/auth/login').send({ email: user.email, password: fixturePassword });
      expect(response.status).toBe(401);
    });

    it('invalid e-mail → 400 naming the field', async () => {
      const response = await request(t.app).post('/api/auth/login').send({ email: 'not-an-address', password: 'x' });
      expect(response.status).toBe(400);
      expect(response.body.errors).toContainEqual({ field: 'email', message: 'Enter a valid e-mail address' });
    });

    it('repeated failures → 429 with RateLimit headers, while another e-mail still gets through', async () => {
      const target = await fixtures.user({ role: 'customer' });
      const statuses: number[] = [];
      for (let attempt = 0; attempt < 11; attempt += 1) {
        statuses.push((await request(t.app).post('/api/auth/login').send({ email: target.email, password: 'wrong-password' })).status);
      }
      expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
      const blocked = await request(t.app).post('/api/auth/login').send({ email: target.email, password: fixturePassword });
      expect(blocked.status).toBe(429);
      expect(blocked.headers['content-type']).toMatch(/problem\+json/);
      expect(blocked.headers['ratelimit-policy']).toBeDefined();
      expect(blocked.headers['ratelimit']).toMatch(/r=0/);
      expect(blocked.body.detail).toMatch(/Too many failed sign-in attempts/);
      const other = await request(t.app).post('/api/auth/login').send({ email: analyst.email, password: fixturePassword });
      expect(other.status).toBe(200);
    });
  });

  describe('access tokens', () => {
    const me = (token: string) => request(t.app).get('/api/me').set('Authorization', `Bearer ${token}`);

    it('valid → 200', async () => {
      expect((await me(analyst.token)).status).toBe(200);
    });

    it('expired → 401', async () => {
      const expired = jwt.sign({ sub: analyst.id, role: 'analyst', org: analyst.organisationId, exp: Math.floor(Date.now() / 1000) - 60 }, t.config.jwtSecret, { algorithm: 'HS256' });
      const response = await me(expired);
      expect(response.status).toBe(401);
      expect(response.headers['content-type']).toMatch(/problem\+json/);
    });

    it('signed with another secret → 401', async () => {
      const forged = jwt.sign({ sub: analyst.id, role: 'lab_manager', org: analyst.organisationId }, 'some-other-secret-of-enough-length-000', { algorithm: 'HS256', expiresIn: 900 });
      expect((await me(forged)).status).toBe(401);
    });

    it('alg "none" → 401', async () => {
      const header = Buffer.from(JSON.stringify({ alg: 'none', typ: 'JWT' })).toString('base64url');
      const payload = Buffer.from(JSON.stringify({ sub: analyst.id, role: 'lab_manager', org: analyst.organisationId, exp: Math.floor(Date.now() / 1000) + 900 })).toString('base64url');
      expect((await me(`${header}.${payload}.`)).status).toBe(401);
    });

    it('garbage → 401', async () => {
      expect((await me('not.a.jwt')).status).toBe(401);
    });

    it('user deactivated after sign-in → 401', async () => {
      const user = await fixtures.user({ role: 'customer' });
      expect((await me(user.token)).status).toBe(200);
      await t.knex('users').where({ id: user.id }).update({ active: false });
      expect((await me(user.token)).status).toBe(401);
    });

    it('role claim is not trusted: a customer token edited to lab_manager is rejected by the signature', async () => {
      const customer = await fixtures.user({ role: 'customer' });
      const [h, p, s] = customer.token.split('.');
      const claims = JSON.parse(Buffer.from(p ?? '', 'base64url').toString()) as Record<string, unknown>;
      const edited = Buffer.from(JSON.stringify({ ...claims, role: 'lab_manager' })).toString('base64url');
      expect((await request(t.app).get('/api/users').set('Authorization', `Bearer ${h}.${edited}.${s}`)).status).toBe(401);
    });
  });

  describe('POST /refresh', () => {
    it('rotates: the new cookie works, and reusing the old one → 401 and revokes the whole family', async () => {
      const login = await request(t.app).post('/api/auth/login').send({ email: analyst.email, password: fixturePassword });
      const first = refreshCookieOf(login);
      const rotated = await request(t.app).post('/api/auth/refresh').set('Cookie', first);
      expect(rotated.status).toBe(200);
      expect(rotated.body.user.id).toBe(analyst.id);
      const second = refreshCookieOf(rotated);
      expect(second).not.toBe(first);

      const reuse = await request(t.app).post('/api/auth/refresh').set('Cookie', first);
      expect(reuse.status).toBe(401);
      // The thief's reuse ends the legitimate session too.
      expect((await request(t.app).post('/api/auth/refresh').set('Cookie', second)).status).toBe(401);
    });

    it('no cookie → 401', async () => {
      expect((await request(t.app).post('/api/auth/refresh')).status).toBe(401);
    });

    it('unknown cookie → 401', async () => {
      expect((await request(t.app).post('/api/auth/refresh').set('Cookie', 'tw_refresh=made-up-value')).status).toBe(401);
    });

    it('expired → 401', async () => {
      const login = await request(t.app).post('/api/auth/login').send({ email: analyst.email, password: fixturePassword });
      await t.knex('refresh_tokens').where({ userId: analyst.id }).whereNull('rotatedAt').update({ expiresAt: new Date(Date.now() - 1000) });
      expect((await request(t.app).post('/api/auth/refresh').set('Cookie', refreshCookieOf(login))).status).toBe(401);
    });

    it('user deactivated → 401', async () => {
      const user = await fixtures.user({ role: 'technician' });
      const login = await request(t.app).post('/api/auth/login').send({ email: user.email, password: fixturePassword });
      await t.knex('users').where({ id: user.id }).update({ active: false });
      expect((await request(t.app).post('/api/auth/refresh').set('Cookie', refreshCookieOf(login))).status).toBe(401);
    });
  });

  describe('POST /logout', () => {
    it('revokes the refresh token → later refresh 401', async () => {
      const login = await request(t.app).post('/api/auth/login').send({ email: analyst.email, password: fixturePassword });
      const cookie = refreshCookieOf(login);
      expect((await request(t.app).post('/api/auth/logout').set('Cookie', cookie)).status).toBe(204);
      expect((await request(t.app).post('/api/auth/refresh').set('Cookie', cookie)).status).toBe(401);
    });

    it('without a cookie → 204', async () => {
      expect((await request(t.app).post('/api/auth/logout')).status).toBe(204);
    });
  });

  describe('stored secrets', () => {
    it('refresh tokens and passwords are never stored in the clear', async () => {
      const login = await request(t.app).post('/api/auth/login').send({ email: analyst.email, password: fixturePassword });
      const raw = decodeURIComponent(refreshCookieOf(login).slice('tw_refresh='.length));
      expect(await t.knex('refresh_tokens').where({ tokenHash: raw }).first()).toBeUndefined();
      const user = await t.knex('users').where({ id: analyst.id }).first();
      expect(user.passwordHash).toMatch(/^\$argon2id\$/);
    });
  });
});
