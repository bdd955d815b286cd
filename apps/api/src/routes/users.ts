import { staffRoles, updateUserSchema, userListQuerySchema, type Role } from '@tunnelwright/contracts';
import { Organisation, recordAudit, User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { revokeAllRefreshTokens } from '../auth/refresh-tokens';
import { HttpError } from '../errors/http-error';
import { toUserSummary } from './presenters';
import { route, type RouteDef } from './route';

const sortColumns = { name: 'users.name', email: 'users.email', role: 'users.role', createdAt: 'users.createdAt' } as const;

/** Throws a 400 on `role` unless staff roles go with the lab and the customer role with a customer organisation. */
export function assertRoleFitsOrganisation(role: Role, organisation: Organisation): void {
  const staff = staffRoles.includes(role);
  if (staff && organisation.kind !== 'lab') {
    throw HttpError.field('role', 'Staff roles (technician, analyst, lab manager) belong to the laboratory organisation');
  }
  if (!staff && organisation.kind !== 'customer') {
    throw HttpError.field('role', 'The customer role belongs to a customer organisation, not the laboratory');
  }
}

/** Whether some other active lab manager remains, checked under lock so two managers cannot demote each other at once. */
async function anotherActiveManagerExists(trx: Knex.Transaction, exceptId: string): Promise<boolean> {
  const others = await User.query(trx).where({ role: 'lab_manager', active: true }).whereNotNull('passwordHash').whereNot('id', exceptId).forUpdate();
  return others.length > 0;
}

/** /api/users: the lab manager's list of accounts, role changes and (de)activation. */
export const userRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: ['lab_manager'],
    summary: 'Search and page through users, optionally of one role and only active (or only deactivated) ones',
    query: userListQuerySchema,
    sample: { query: { q: 'a', role: 'technician', active: 'true', sort: 'email', order: 'desc', page: '1', pageSize: '5' }, expect: 200 },
    handler: async ({ query, res }) => {
      const builder = User.query().joinRelated('organisation');
      if (query.q) {
        const pattern = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
        builder.where((w) => w.whereILike('users.name', pattern).orWhereILike('users.email', pattern).orWhereILike('organisation.name', pattern));
      }
      if (query.role) builder.where('users.role', query.role);
      if (query.active !== undefined) builder.where('users.active', query.active);
      const total = await builder.clone().resultSize();
      const items = await builder
        .select('users.*')
        .withGraphFetched('organisation')
        .orderBy(sortColumns[query.sort], query.order)
        .orderBy('users.id')
        .limit(query.pageSize)
        .offset((query.page - 1) * query.pageSize);
      res.json({ items: items.map(toUserSummary), total });
    },
  }),
  route({
    method: 'patch',
    path: '/:id',
    access: ['lab_manager'],
    summary: 'Change a user’s role or name, deactivate or reactivate',
    body: updateUserSchema,
    sample: { params: async (f) => ({ id: (await f.customerUser()).id }), body: () => ({ name: 'Renamed by the lab' }), expect: 200 },
    handler: async ({ caller, params, body, res, deps }) => {
      const updated = await deps.knex.transaction(async (trx) => {
        const user = await User.query(trx).findById(params.id ?? '').withGraphFetched('organisation').forUpdate();
        if (!user || !user.organisation) throw HttpError.notFound('The user');
        if (body.role) assertRoleFitsOrganisation(body.role, user.organisation);
        const losesManager = user.role === 'lab_manager' && user.active && ((body.role !== undefined && body.role !== 'lab_manager') || body.active === false);
        if (losesManager && !(await anotherActiveManagerExists(trx, user.id))) {
          throw new HttpError(
            409,
            'Last lab manager',
            user.id === caller.id
              ? 'You are the only active lab manager. Make someone else lab manager before changing your own account.'
              : 'This is the only active lab manager. Make someone else lab manager first.',
          );
        }
        const before = toUserSummary(user);
        const patched = await User.query(trx).patchAndFetchById(user.id, body).withGraphFetched('organisation');
        if (body.active === false) await revokeAllRefreshTokens(trx, user.id);
        const after = toUserSummary(patched);
        const action = body.active === false ? 'user.deactivated' : body.active === true && !before.active ? 'user.reactivated' : body.role && body.role !== before.role ? 'user.role_changed' : 'user.updated';
        await recordAudit(trx, { actorId: caller.id, action, entity: 'user', entityId: user.id, before, after });
        return after;
      });
      res.json(updated);
    },
  }),
];
