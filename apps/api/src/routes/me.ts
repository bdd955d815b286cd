import { changePasswordSchema, updateProfileSchema } from '@tunnelwright/contracts';
import { recordAudit, User } from '@tunnelwright/db';
import { hashPassword, verifyPassword } from '../auth/passwords';
import { issueRefreshToken, revokeAllRefreshTokens, setRefreshCookie } from '../auth/refresh-tokens';
import { toSessionUser } from '../auth/session-user';
import { HttpError } from '../errors/http-error';
import { assertStrongPassword } from './auth';
import { route, type RouteDef } from './route';

/** /api/me: the signed-in user's own profile and password. */
export const meRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: 'authenticated',
    summary: 'Who is signed in',
    sample: { expect: 200 },
    handler: async ({ caller, res }) => {
      res.json(toSessionUser(caller));
    },
  }),
  route({
    method: 'patch',
    path: '/',
    access: 'authenticated',
    summary: 'Change my name',
    body: updateProfileSchema,
    sample: { body: (f) => ({ name: `Renamed ${f.unique()}` }), expect: 200 },
    handler: async ({ caller, body, res, deps }) => {
      const updated = await deps.knex.transaction(async (trx) => {
        const user = await User.query(trx).patchAndFetchById(caller.id, { name: body.name }).withGraphFetched('organisation');
        await recordAudit(trx, { actorId: caller.id, action: 'user.profile_updated', entity: 'user', entityId: caller.id, before: { name: caller.name }, after: { name: body.name } });
        return user;
      });
      res.json(toSessionUser(updated));
    },
  }),
  route({
    method: 'post',
    path: '/password',
    access: 'authenticated',
    summary: 'Change my password (ends every other session)',
    body: changePasswordSchema,
    sample: { body: (f) => ({ currentPassword: f.password, newPassword: f.password }), expect: 204 },
    handler: async ({ caller, body, res, deps }) => {
      if (!(await verifyPassword(caller.passwordHash, body.currentPassword))) {
        throw HttpError.field('currentPassword', 'That is not your current password');
      }
      assertStrongPassword(body.newPassword, caller, 'newPassword');
      const passwordHash = await hashPassword(body.newPassword);
      const refresh = await deps.knex.transaction(async (trx) => {
        await User.query(trx).patchAndFetchById(caller.id, { passwordHash });
        // Other browsers signed in with the old password lose their sessions; this one gets a fresh cookie.
        await revokeAllRefreshTokens(trx, caller.id);
        await recordAudit(trx, { actorId: caller.id, action: 'user.password_changed', entity: 'user', entityId: caller.id });
        return issueRefreshToken(trx, caller.id);
      });
      setRefreshCookie(res, deps.config.publicUrl, refresh);
      res.status(204).end();
    },
  }),
];
