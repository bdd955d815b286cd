import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, fixturePassword, type FixtureUser } from './support/fixtures';
import { tokenFromLink, waitForMail } from './support/mailbox';
import { createTestApp, type TestApp } from './support/test-app';

const strongPassword = 'Windward-Copper-Thistle-58';

describe('/api/invitations and the public invitation and reset links', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;
  let customerOrganisationId: string;
  let labId: string;

  const invite = (body: object) => request(t.app).post('/api/invitations').set('Authorization', `Bearer ${manager.token}`).send(body);

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    manager = await fixtures.user({ role: 'lab_manager', name: 'Ottilie Brandreth' });
    customerOrganisationId = await fixtures.customerOrganisationId();
    labId = (await fixtures.lab()).id;
  });
  afterAll(() => t?.close());

  describe('POST /api/invitations', () => {
    it('full flow: mail arrives in the SMTP fake, the link previews, accepting sets the password and signs in', async () => {
      const email = `new-customer-${fixtures.unique()}@example.com`;
      const created = await invite({ email, name: 'Perpetua Linford', role: 'customer', organisationId: customerOrganisationId });
      expect(created.status).toBe(201);
      expect(created.body).toMatchObject({ email, role: 'customer', active: true, activated: false });

      const mail = await waitForMail(t.config.mailDir, email, { subject: /account/ });
      expect(mail.text).toContain('Ottilie Brandreth');
      const link = mail.links.find((l) => l.startsWith(`${t.config.publicUrl}/accept-invitation?token=`));
      expect(link).toBeDefined();
      const token = tokenFromLink(link ?? '');

      const preview = await request(t.app).get(`/api/auth/invitations/${token}`);
      expect(preview.status).toBe(200);
      expect(preview.body).toMatchObject({ email, name: 'Perpetua Linford', role: 'customer' });

      const accepted = await request(t.app).post('/api/auth/accept-invitation').send({ token, password: strongPassword });
      expect(accepted.status).toBe(200);
      expect(accepted.body.user.email).toBe(email);
      expect(accepted.headers['set-cookie']?.toString()).toMatch(/tw_refresh=/);

      const login = await request(t.app).post('/api/auth/login').send({ email, password: strongPassword });
      expect(login.status).toBe(200);

      const audit = await t.knex('audit_entries').where({ entity: 'user', entityId: created.body.id }).orderBy('createdAt');
      expect(audit.map((a: { action: string }) => a.action)).toEqual(['user.invited', 'user.activated']);
      expect(audit[0].actorId).toBe(manager.id);

      // Same link again → 410 with a clear message.
      const reused = await request(t.app).post('/api/auth/accept-invitation').send({ token, password: strongPassword });
      expect(reused.status).toBe(410);
      expect(reused.body.detail).toMatch(/already been used/);
      expect((await request(t.app).get(`/api/auth/invitations/${token}`)).status).toBe(410);
    });

    it('expired link → 410 saying it expired', async () => {
      const { user, token } = await fixtures.invitation();
      await t.knex('user_tokens').where({ userId: user.id }).update({ expiresAt: new Date(Date.now() - 1000) });
      const response = await request(t.app).post('/api/auth/accept-invitation').send({ token, password: strongPassword });
      expect(response.status).toBe(410);
      expect(response.body.detail).toMatch(/expired/);
    });

    it('unknown link → 404', async () => {
      expect((await request(t.app).get(`/api/auth/invitations/${'x'.repeat(43)}`)).status).toBe(404);
    });

    it('weak password → 400 on password with the reason', async () => {
      const { token } = await fixtures.invitation();
      const response = await request(t.app).post('/api/auth/accept-invitation').send({ token, password: 'password1234' });
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('password');
      expect(response.body.errors[0].message).toMatch(/too easy to guess/);
    });

    it('password built from the person’s own name → 400', async () => {
      const { token } = await fixtures.invitation('customer', 'Marigold Featherstonehaugh');
      const response = await request(t.app).post('/api/auth/accept-invitation').send({ token, password: 'MarigoldFeatherstonehaugh' });
      expect(response.status).toBe(400);
      expect(response.body.errors[0]).toMatchObject({ field: 'password' });
      expect(response.body.errors[0].message).toMatch(/personal/);
    });

    it('short password → 400 from the schema', async () => {
      const { token } = await fixtures.invitation();
      const response = await request(t.app).post('/api/auth/accept-invitation').send({ token, password: 'short' });
      expect(response.status).toBe(400);
      expect(response.body.errors).toContainEqual({ field: 'password', message: 'Use at least 12 characters' });
    });

    it('staff role in a customer organisation → 400 on role', async () => {
      const response = await invite({ email: `x-${fixtures.unique()}@example.com`, name: 'Wrong Place', role: 'analyst', organisationId: customerOrganisationId });
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('role');
    });

    it('customer role in the lab → 400 on role', async () => {
      const response = await invite({ email: `x-${fixtures.unique()}@example.com`, name: 'Wrong Place', role: 'customer', organisationId: labId });
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('role');
    });

    it('unknown organisation → 400 on organisationId', async () => {
      const response = await invite({ email: `x-${fixtures.unique()}@example.com`, name: 'Nowhere', role: 'customer', organisationId: '00000000-0000-4000-8000-000000000000' });
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('organisationId');
    });

    it('e-mail of an existing account → 409 on email', async () => {
      const response = await invite({ email: manager.email, name: 'Again', role: 'analyst', organisationId: labId });
      expect(response.status).toBe(409);
      expect(response.body.errors[0].field).toBe('email');
    });

    it('inviting again before acceptance → 201 and only the newest link works', async () => {
      const email = `twice-${fixtures.unique()}@example.com`;
      await invite({ email, name: 'Twice Invited', role: 'technician', organisationId: labId });
      const firstToken = tokenFromLink((await waitForMail(t.config.mailDir, email)).links[0] ?? '');
      const again = await invite({ email, name: 'Twice Invited', role: 'analyst', organisationId: labId });
      expect(again.status).toBe(201);
      expect(again.body.role).toBe('analyst');
      expect((await request(t.app).get(`/api/auth/invitations/${firstToken}`)).status).toBe(410);
    });

    it('mail server unreachable → 503, and neither the account nor its audit row is kept', async () => {
      const offline = await createTestApp({ smtpUrl: 'smtp://127.0.0.1:9' }, { knex: t.knex });
      try {
        const offlineManager = await new FixtureBuilder(offline.knex, offline.config.jwtSecret).user({ role: 'lab_manager' });
        const email = `unsent-${fixtures.unique()}@example.com`;
        const response = await request(offline.app)
          .post('/api/invitations')
          .set('Authorization', `Bearer ${offlineManager.token}`)
          .send({ email, name: 'Never Mailed', role: 'customer', organisationId: customerOrganisationId });
        expect(response.status).toBe(503);
        expect(response.body.detail).toMatch(/Nothing was saved/);
        expect(await t.knex('users').where({ email }).first()).toBeUndefined();
        expect(await t.knex('audit_entries').where({ actorId: offlineManager.id }).first()).toBeUndefined();
      } finally {
        await offline.close();
      }
    });

    it('invalid body → 400 listing every field', async () => {
      const response = await invite({ email: 'nope', name: '', role: 'boss' });
      expect(response.status).toBe(400);
      expect(response.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['email', 'name', 'organisationId', 'role']);
    });
  });

  describe('POST /api/auth/forgot-password and /reset-password', () => {
    it('known address → 202, mail with a reset link; the link sets a new password once and ends old sessions', async () => {
      const user = await fixtures.user({ role: 'customer' });
      const login = await request(t.app).post('/api/auth/login').send({ email: user.email, password: fixturePassword });
      const cookie = ([] as string[]).concat(login.headers['set-cookie'] ?? [])[0]?.split(';')[0] ?? '';

      expect((await request(t.app).post('/api/auth/forgot-password').send({ email: user.email })).status).toBe(202);
      const mail = await waitForMail(t.config.mailDir, user.email, { subject: /new Tunnelwright password/ });
      const link = mail.links.find((l) => l.startsWith(`${t.config.publicUrl}/reset-password?token=`)) ?? '';
      const token = tokenFromLink(link);

      expect((await request(t.app).post('/api/auth/reset-password').send({ token, password: strongPassword })).status).toBe(204);
      expect((await request(t.app).post('/api/auth/login').send({ email: user.email, password: strongPassword })).status).toBe(200);
      expect((await request(t.app).post('/api/auth/login').send({ email: user.email, password: fixturePassword })).status).toBe(401);
      expect((await request(t.app).post('/api/auth/refresh').set('Cookie', cookie)).status).toBe(401);

      const reused = await request(t.app).post('/api/auth/reset-password').send({ token, password: strongPassword });
      expect(reused.status).toBe(410);
      expect(reused.body.detail).toMatch(/already been used/);
    });

    it('unknown address → the same 202', async () => {
      const response = await request(t.app).post('/api/auth/forgot-password').send({ email: `ghost-${fixtures.unique()}@example.com` });
      expect(response.status).toBe(202);
    });

    it('repeated requests for one address → 429 after five', async () => {
      const email = `flood-${fixtures.unique()}@example.com`;
      const statuses: number[] = [];
      for (let i = 0; i < 6; i += 1) statuses.push((await request(t.app).post('/api/auth/forgot-password').send({ email })).status);
      expect(statuses).toEqual([202, 202, 202, 202, 202, 429]);
    });

    it('expired reset link → 410', async () => {
      const token = await fixtures.passwordResetToken();
      await t.knex('user_tokens').where({ purpose: 'password_reset' }).whereNull('usedAt').update({ expiresAt: new Date(Date.now() - 1000) });
      const response = await request(t.app).post('/api/auth/reset-password').send({ token, password: strongPassword });
      expect(response.status).toBe(410);
      expect(response.body.detail).toMatch(/expired/);
    });
  });
});
