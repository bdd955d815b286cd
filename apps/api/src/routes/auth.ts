import {
  acceptInvitationSchema,
  forgotPasswordSchema,
  loginRequestSchema,
  resetPasswordSchema,
  type InvitationPreview,
} from '@tunnelwright/contracts';
import { recordAudit, User } from '@tunnelwright/db';
import { findLinkToken, createLinkToken, resetValidMinutes } from '../auth/link-tokens';
import { passwordWeakness } from '../auth/password-policy';
import { hashPassword, verifyPassword } from '../auth/passwords';
import { forgotPasswordRateLimits, loginRateLimits } from '../auth/rate-limits';
import {
  clearRefreshCookie,
  issueRefreshToken,
  refreshCookieName,
  revokeAllRefreshTokens,
  revokeRefreshFamily,
  rotateRefreshToken,
  setRefreshCookie,
} from '../auth/refresh-tokens';
import { tokenResponse } from '../auth/session-user';
import type { AppDeps } from '../deps';
import { HttpError } from '../errors/http-error';
import { passwordResetMail } from '../mail/messages';
import { route, type RouteDef } from './route';

const wrongCredentials = () => new HttpError(401, 'Sign-in failed', 'The e-mail address or password is not right.');

function refreshCookie(cookies: unknown): string | undefined {
  const value: unknown = (cookies as Record<string, unknown> | undefined)?.[refreshCookieName];
  return typeof value === 'string' && value.length > 0 ? value : undefined;
}

/** Throws a 400 on `field` when the password is too easy to guess for this user. */
export function assertStrongPassword(password: string, user: { email: string; name: string }, field: string): void {
  const weakness = passwordWeakness(password, [user.email, user.name]);
  if (weakness) throw HttpError.field(field, weakness);
}

async function sendResetLink(deps: AppDeps, email: string): Promise<void> {
  const user = await User.query().findOne({ email });
  // Only active accounts that already have a password can reset it; invitations are re-sent by the lab.
  if (!user || !user.active || !user.passwordHash) return;
  const { token } = await deps.knex.transaction((trx) => createLinkToken(trx, user.id, 'password_reset'));
  const link = `${deps.config.publicUrl}/reset-password?token=${encodeURIComponent(token)}`;
  await deps.mailer.send(passwordResetMail({ to: user.email, name: user.name, link, validMinutes: resetValidMinutes }));
}

/** /api/auth: sign-in, refresh, sign-out, invitations and password reset. */
export const authRoutes: RouteDef[] = [
  route({
    method: 'post',
    path: '/login',
    access: 'public',
    summary: 'Sign in with e-mail and password',
    middleware: (deps) => loginRateLimits(deps.redis, deps.rateLimitPrefix ?? 'tw:rl:'),
    body: loginRequestSchema,
    sample: { body: async (f) => ({ email: (await f.customerUser()).email, password: f.password }), expect: 200 },
    handler: async ({ body, res, deps }) => {
      const user = await User.query().findOne({ email: body.email }).withGraphFetched('organisation');
      const passwordMatches = await verifyPassword(user?.passwordHash, body.password);
      if (!user || !passwordMatches || !user.active) throw wrongCredentials();
      const refresh = await issueRefreshToken(deps.knex, user.id);
      setRefreshCookie(res, deps.config.publicUrl, refresh);
      res.json(tokenResponse(deps.config.jwtSecret, user));
    },
  }),
  route({
    method: 'post',
    path: '/refresh',
    access: 'public',
    summary: 'Exchange the refresh cookie for a new access token',
    sample: { expect: 401 },
    handler: async ({ req, res, deps }) => {
      try {
        const { user, token } = await rotateRefreshToken(deps.knex, refreshCookie(req.cookies));
        setRefreshCookie(res, deps.config.publicUrl, token);
        res.json(tokenResponse(deps.config.jwtSecret, user));
      } catch (error) {
        clearRefreshCookie(res, deps.config.publicUrl);
        throw error;
      }
    },
  }),
  route({
    method: 'post',
    path: '/logout',
    access: 'public',
    summary: 'Sign out: revoke the refresh token',
    sample: { expect: 204 },
    handler: async ({ req, res, deps }) => {
      await revokeRefreshFamily(deps.knex, refreshCookie(req.cookies));
      clearRefreshCookie(res, deps.config.publicUrl);
      res.status(204).end();
    },
  }),
  route({
    method: 'get',
    path: '/invitations/:token',
    access: 'public',
    summary: 'What an invitation link is for',
    sample: { params: async (f) => ({ token: await f.invitationToken() }), expect: 200 },
    handler: async ({ params, res, deps }) => {
      const { record, user } = await findLinkToken(deps.knex, params.token ?? '', 'invitation');
      const preview: InvitationPreview = {
        email: user.email,
        name: user.name,
        role: user.role,
        organisationName: user.organisation?.name ?? '',
        expiresAt: record.expiresAt.toISOString(),
      };
      res.json(preview);
    },
  }),
  route({
    method: 'post',
    path: '/accept-invitation',
    access: 'public',
    summary: 'Accept an invitation: choose a password and sign in',
    body: acceptInvitationSchema,
    sample: { body: async (f) => ({ token: await f.invitationToken(), password: f.password }), expect: 200 },
    handler: async ({ body, res, deps }) => {
      const preview = await findLinkToken(deps.knex, body.token, 'invitation');
      assertStrongPassword(body.password, preview.user, 'password');
      const passwordHash = await hashPassword(body.password);
      const { user, refresh } = await deps.knex.transaction(async (trx) => {
        // Checked again under a row lock, so two tabs cannot both redeem one link.
        const { record, user } = await findLinkToken(trx, body.token, 'invitation', true);
        await record.$query(trx).patch({ usedAt: new Date() });
        await user.$query(trx).patch({ passwordHash });
        await recordAudit(trx, { actorId: user.id, action: 'user.activated', entity: 'user', entityId: user.id, after: { email: user.email, role: user.role } });
        return { user, refresh: await issueRefreshToken(trx, user.id) };
      });
      setRefreshCookie(res, deps.config.publicUrl, refresh);
      res.json(tokenResponse(deps.config.jwtSecret, user));
    },
  }),
  route({
    method: 'post',
    path: '/forgot-password',
    access: 'public',
    summary: 'Ask for a password-reset link (always 202)',
    middleware: (deps) => forgotPasswordRateLimits(deps.redis, deps.rateLimitPrefix ?? 'tw:rl:'),
    body: forgotPasswordSchema,
    sample: { body: (f) => ({ email: `nobody-${f.unique()}@example.com` }), expect: 202 },
    handler: async ({ body, req, res, deps }) => {
      // The answer never depends on whether the account exists, so the work happens after it is sent.
      res.status(202).json({ status: 'accepted' });
      sendResetLink(deps, body.email).catch((error: unknown) => req.log.error({ err: error }, 'password-reset mail failed'));
    },
  }),
  route({
    method: 'post',
    path: '/reset-password',
    access: 'public',
    summary: 'Choose a new password with a reset link',
    body: resetPasswordSchema,
    sample: { body: async (f) => ({ token: await f.passwordResetToken(), password: f.password }), expect: 204 },
    handler: async ({ body, res, deps }) => {
      const found = await findLinkToken(deps.knex, body.token, 'password_reset');
      assertStrongPassword(body.password, found.user, 'password');
      const passwordHash = await hashPassword(body.password);
      await deps.knex.transaction(async (trx) => {
        const { record, user } = await findLinkToken(trx, body.token, 'password_reset', true);
        await record.$query(trx).patch({ usedAt: new Date() });
        await user.$query(trx).patch({ passwordHash });
        // A reset usually means the old password leaked: end every session.
        await revokeAllRefreshTokens(trx, user.id);
        await recordAudit(trx, { actorId: user.id, action: 'user.password_reset', entity: 'user', entityId: user.id });
      });
      res.status(204).end();
    },
  }),
];
