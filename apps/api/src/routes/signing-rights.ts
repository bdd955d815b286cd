import { revokeSigningRightInputSchema, signingRightInputSchema } from '@tunnelwright/contracts';
import { recordAudit, SigningRight, User } from '@tunnelwright/db';
import { z } from 'zod';
import { toSigningRights } from '../approval/presenters';
import { currentSigningRight, illegal } from '../approval/workflow';
import { HttpError } from '../errors/http-error';
import { route, type RouteDef, type SampleFixtures } from './route';

const staff = ['technician', 'analyst', 'lab_manager'] as const;
const listQuerySchema = z.object({ current: z.enum(['true', 'false'], { message: 'current is true or false' }).optional() });

async function labPerson(f: SampleFixtures, role: 'analyst' | 'lab_manager'): Promise<User> {
  const manager = await User.query().where({ role: 'lab_manager' }).first();
  if (!manager) throw new Error('the samples need a lab manager');
  return User.query().insert({ email: `signatory-${f.unique()}@example.com`, name: 'Sample signatory', role, organisationId: manager.organisationId, passwordHash: null, active: true });
}

/** /api/signing-rights: who may approve results and sign sheets. Lab managers grant and remove the right. */
export const signingRightRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: staff,
    summary: 'Signing rights, current first, with their history (`current=true` for holders only)',
    query: listQuerySchema,
    sample: { query: { current: 'true' }, expect: 200 },
    handler: async ({ query, res, deps }) => {
      const builder = SigningRight.query().orderByRaw('revoked_at IS NOT NULL').orderBy('createdAt', 'desc');
      if (query.current === 'true') builder.whereNull('revokedAt');
      res.json(await toSigningRights(deps.knex, await builder));
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: ['lab_manager'],
    summary: 'Grant an active analyst or lab manager the right to sign (409 if they hold it already)',
    body: signingRightInputSchema,
    sample: { body: async (f) => ({ userId: (await labPerson(f, 'analyst')).id, scopeNote: 'Road-vehicle force tests' }), expect: 201 },
    handler: async ({ caller, body, res, deps }) => {
      const right = await deps.knex.transaction(async (trx) => {
        const user = await User.query(trx).findById(body.userId).forUpdate();
        if (!user) throw HttpError.field('userId', 'Choose an existing person');
        if (!user.active) throw HttpError.field('userId', `${user.name} is deactivated and cannot sign`);
        if (user.role !== 'analyst' && user.role !== 'lab_manager') throw HttpError.field('userId', 'Only analysts and lab managers can hold the right to sign');
        if (await currentSigningRight(trx, user.id)) throw illegal('Already holds the right', `${user.name} already holds the right to sign.`);
        const created = await SigningRight.query(trx).insert({ userId: user.id, grantedBy: caller.id, scopeNote: body.scopeNote }).returning('*');
        await recordAudit(trx, { actorId: caller.id, action: 'signing_right.granted', entity: 'user', entityId: user.id, after: { signingRightId: created.id, scopeNote: body.scopeNote } });
        return created;
      });
      const [dto] = await toSigningRights(deps.knex, [right]);
      res.status(201).json(dto);
    },
  }),
  route({
    method: 'post',
    path: '/:id/revoke',
    access: ['lab_manager'],
    summary: 'Remove a signing right, with the reason (409 if already removed); history is kept',
    body: revokeSigningRightInputSchema,
    sample: {
      params: async (f) => {
        const user = await labPerson(f, 'analyst');
        const manager = await User.query().where({ role: 'lab_manager' }).first();
        const right = await SigningRight.query().insert({ userId: user.id, grantedBy: manager!.id, scopeNote: '' });
        return { id: right.id };
      },
      body: () => ({ reason: 'Moved to the planning team' }),
      expect: 200,
    },
    handler: async ({ caller, params, body, res, deps }) => {
      const right = await deps.knex.transaction(async (trx) => {
        const found = await SigningRight.query(trx).findById(params.id ?? '').forUpdate();
        if (!found) throw HttpError.notFound('The signing right');
        if (found.revokedAt) throw illegal('Already removed', 'This signing right was already removed.');
        const after = await SigningRight.query(trx).patchAndFetchById(found.id, { revokedAt: new Date(), revokedBy: caller.id, revokedReason: body.reason });
        await recordAudit(trx, { actorId: caller.id, action: 'signing_right.revoked', entity: 'user', entityId: found.userId, after: { signingRightId: found.id, reason: body.reason } });
        return after;
      });
      const [dto] = await toSigningRights(deps.knex, [right]);
      res.json(dto);
    },
  }),
];

/** GET /api/me/signing-right: whether the signed-in person may approve and sign. */
export const mySigningRightRoute: RouteDef = route({
  method: 'get',
  path: '/signing-right',
  access: 'authenticated',
  summary: 'Whether I hold the right to sign',
  sample: { expect: 200 },
  handler: async ({ caller, res, deps }) => {
    const right = await currentSigningRight(deps.knex, caller.id);
    res.json({ holds: !!right, right: right ? (await toSigningRights(deps.knex, [right]))[0] : null });
  },
});
