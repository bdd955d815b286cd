import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { waitForMail } from './support/mailbox';
import { createTestApp, type TestApp } from './support/test-app';

describe('app-wide behaviour', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    manager = await fixtures.user({ role: 'lab_manager' });
  });
  afterAll(() => t?.close());

  describe('GET /api/health', () => {
    it('→ 200 ok with the demo flag', async () => {
      const response = await request(t.app).get('/api/health');
      expect(response.status).toBe(200);
      expect(response.body).toEqual({ status: 'ok', demoMode: true });
    });
  });

  describe('unknown /api path', () => {
    it('→ JSON 404 problem', async () => {
      const response = await request(t.app).get('/api/no-such-thing');
      expect(response.status).toBe(404);
      expect(response.headers['content-type']).toMatch(/application\/problem\+json/);
      expect(response.body).toMatchObject({ status: 404, title: 'Not found' });
    });
  });

  describe('client routes', () => {
    it('non-API paths → the built client’s index.html; /api paths never do', async () => {
      const dir = mkdtempSync(join(tmpdir(), 'tw-web-'));
      writeFileSync(join(dir, 'index.html'), '<!doctype html><title>client shell</title>');
      const web = await createTestApp({ webDist: dir }, { knex: t.knex });
      try {
        const page = await request(web.app).get('/catalogue/tunnels');
        expect(page.status).toBe(200);
        expect(page.text).toContain('client shell');
        expect((await request(web.app).get('/api/catalogue')).headers['content-type']).toMatch(/problem\+json/);
      } finally {
        await web.close();
      }
    });
  });

  describe('request bodies', () => {
    it('over 1 MB → 413 problem', async () => {
      const response = await request(t.app)
        .post('/api/auth/login')
        .set('Content-Type', 'application/json')
        .send(JSON.stringify({ email: 'a@example.com', password: 'x'.repeat(1_100_000) }));
      expect(response.status).toBe(413);
      expect(response.headers['content-type']).toMatch(/problem\+json/);
      expect(response.body.title).toBe('Request too large');
    });

    it('malformed JSON → 400 problem without parser internals', async () => {
      const response = await request(t.app).post('/api/auth/login').set('Content-Type', 'application/json').send('{"email":');
      expect(response.status).toBe(400);
      expect(response.body.detail).toBe('The request body is not valid JSON.');
      expect(JSON.stringify(response.body)).not.toMatch(/at JSON\.parse|SyntaxError|node_modules/);
    });
  });

  describe('errors never carry SQL or stacks', () => {
    it('a value the database rejects → plain problem', async () => {
      const response = await request(t.app)
        .post('/api/tunnels')
        .set('Authorization', `Bearer ${manager.token}`)
        .send({ name: `Huge ${fixtures.unique()}`, kind: 'closed', width: 1e308, height: 1, area: 1, length: 1, maxSpeed: 1e309 });
      expect(response.status).toBeGreaterThanOrEqual(400);
      expect(response.status).toBeLessThan(500);
      expect(JSON.stringify(response.body)).not.toMatch(/select|insert|update|constraint|relation|\bat\s\S+\(/i);
    });
  });

  describe('GET /api/dev/mailbox', () => {
    it('demo mode → lab manager sees mail newest first with its links', async () => {
      const email = `mailbox-${fixtures.unique()}@example.com`;
      const organisationId = await fixtures.customerOrganisationId();
      await request(t.app).post('/api/invitations').set('Authorization', `Bearer ${manager.token}`).send({ email, name: 'Mailbox Reader', role: 'customer', organisationId });
      await waitForMail(t.config.mailDir, email);
      const response = await request(t.app).get('/api/dev/mailbox').set('Authorization', `Bearer ${manager.token}`);
      expect(response.status).toBe(200);
      const mail = response.body.find((m: { to: string[] }) => m.to.includes(email));
      expect(mail.subject).toMatch(/account/);
      expect(mail.links[0]).toMatch(/\/accept-invitation\?token=/);
    });

    it('demo mode off → 404 even for a lab manager', async () => {
      const plain = await createTestApp({ demoMode: false }, { knex: t.knex });
      try {
        const user = await new FixtureBuilder(plain.knex, plain.config.jwtSecret).user({ role: 'lab_manager' });
        const response = await request(plain.app).get('/api/dev/mailbox').set('Authorization', `Bearer ${user.token}`);
        expect(response.status).toBe(404);
        expect((await request(plain.app).get('/api/health')).body.demoMode).toBe(false);
      } finally {
        await plain.close();
      }
    });
  });

  describe('security headers', () => {
    it('the CSP allows only the stylesheet onload handler of the built client', async () => {
      const csp = String((await request(t.app).get('/api/health')).headers['content-security-policy']);
      expect(csp).toContain("script-src 'self'");
      expect(csp).toContain("script-src-attr 'unsafe-hashes' 'sha256-MhtPZXr7+LpJUY5qtMutB+qWfQtMaPccfe7QXtCcEYc='");
      expect(csp).not.toContain('upgrade-insecure-requests');
    });

    it('helmet headers are set and Express is not announced', async () => {
      const response = await request(t.app).get('/api/health');
      expect(response.headers['x-content-type-options']).toBe('nosniff');
      expect(response.headers['x-powered-by']).toBeUndefined();
    });
  });
});
