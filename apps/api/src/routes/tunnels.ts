import { catalogueListQuerySchema, tunnelInputSchema } from '@tunnelwright/contracts';
import type { InstalledBalance } from '@tunnelwright/contracts';
import { Balance, isStaff, recordAudit, Tunnel } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';
import { setArchived } from './archiving';
import { toTunnel } from './presenters';
import { route, type RouteDef } from './route';

/** A tunnel body the matrix can send; the name is unique per call. */
function sampleTunnel(unique: string) {
  return { name: `Matrix tunnel ${unique}`, kind: 'closed', width: 2, height: 1.5, area: 2.9, length: 4, maxSpeed: 50 };
}

function assertSpeedRange(input: { minSpeed: number; maxSpeed: number }): void {
  if (input.minSpeed > input.maxSpeed) throw HttpError.field('minSpeed', 'Minimum speed cannot exceed the maximum speed');
}

const tunnelRecord = { entity: 'tunnel', label: 'The tunnel', present: (tunnel: Tunnel) => toTunnel(tunnel) };

/** The balances installed in each of `tunnelIds`, by identifier. */
async function installedBalances(tunnelIds: readonly string[]): Promise<Map<string, InstalledBalance[]>> {
  const byTunnel = new Map<string, InstalledBalance[]>();
  if (tunnelIds.length === 0) return byTunnel;
  for (const b of await Balance.query().select('tunnelId', 'identifier', 'capacities').whereIn('tunnelId', tunnelIds).orderBy('identifier')) {
    const list = byTunnel.get(b.tunnelId!) ?? [];
    list.push({ identifier: b.identifier, capacities: b.capacities });
    byTunnel.set(b.tunnelId!, list);
  }
  return byTunnel;
}

/** /api/tunnels: the lab's tunnels. Everybody signed in reads them; lab managers keep them. */
export const tunnelRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: 'authenticated',
    summary: 'List tunnels (archived ones for staff on request)',
    query: catalogueListQuerySchema,
    sample: { expect: 200 },
    handler: async ({ caller, query, res }) => {
      const builder = Tunnel.query().orderBy('name');
      if (!(query.includeArchived && isStaff(caller))) builder.whereNull('archivedAt');
      const tunnels = await builder;
      const balances = await installedBalances(tunnels.map((t) => t.id));
      res.json(tunnels.map((t) => toTunnel(t, balances.get(t.id))));
    },
  }),
  route({
    method: 'get',
    path: '/:id',
    access: 'authenticated',
    summary: 'One tunnel',
    sample: { params: async (f) => ({ id: await f.tunnelId() }), expect: 200 },
    handler: async ({ caller, params, res }) => {
      const tunnel = await Tunnel.query().findById(params.id ?? '');
      // Customers only ever see the live catalogue.
      if (!tunnel || (tunnel.archivedAt && !isStaff(caller))) throw HttpError.notFound('The tunnel');
      res.json(toTunnel(tunnel, (await installedBalances([tunnel.id])).get(tunnel.id)));
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: ['lab_manager'],
    summary: 'Add a tunnel',
    body: tunnelInputSchema,
    sample: { body: (f) => sampleTunnel(f.unique()), expect: 201 },
    handler: async ({ caller, body, res, deps }) => {
      assertSpeedRange(body);
      const created = await deps.knex.transaction(async (trx) => {
        const tunnel = await Tunnel.query(trx).insert(body).returning('*');
        await recordAudit(trx, { actorId: caller.id, action: 'tunnel.created', entity: 'tunnel', entityId: tunnel.id, after: toTunnel(tunnel) });
        return tunnel;
      });
      res.status(201).json(toTunnel(created));
    },
  }),
  route({
    method: 'put',
    path: '/:id',
    access: ['lab_manager'],
    summary: 'Edit a tunnel',
    body: tunnelInputSchema,
    sample: { params: async (f) => ({ id: await f.tunnelId() }), body: (f) => sampleTunnel(f.unique()), expect: 200 },
    handler: async ({ caller, params, body, res, deps }) => {
      assertSpeedRange(body);
      const updated = await deps.knex.transaction(async (trx) => {
        const tunnel = await Tunnel.query(trx).findById(params.id ?? '').forUpdate();
        if (!tunnel) throw HttpError.notFound('The tunnel');
        const after = await Tunnel.query(trx).patchAndFetchById(tunnel.id, body);
        await recordAudit(trx, { actorId: caller.id, action: 'tunnel.updated', entity: 'tunnel', entityId: tunnel.id, before: toTunnel(tunnel), after: toTunnel(after) });
        return after;
      });
      res.json(toTunnel(updated));
    },
  }),
  route({
    method: 'post',
    path: '/:id/archive',
    access: ['lab_manager'],
    summary: 'Archive a tunnel (hidden from customers, kept for history)',
    sample: { params: async (f) => ({ id: await f.tunnelId() }), expect: 200 },
    handler: async ({ caller, params, res, deps }) => {
      res.json(await setArchived(deps.knex, Tunnel, tunnelRecord, params.id ?? '', true, caller.id));
    },
  }),
  route({
    method: 'post',
    path: '/:id/restore',
    access: ['lab_manager'],
    summary: 'Bring an archived tunnel back',
    sample: { params: async (f) => ({ id: await f.tunnelId() }), expect: 200 },
    handler: async ({ caller, params, res, deps }) => {
      res.json(await setArchived(deps.knex, Tunnel, tunnelRecord, params.id ?? '', false, caller.id));
    },
  }),
];
