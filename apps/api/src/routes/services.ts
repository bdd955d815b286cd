import { catalogueListQuerySchema, serviceInputSchema, type ServiceInput } from '@tunnelwright/contracts';
import { isStaff, recordAudit, Service, Tunnel } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { HttpError } from '../errors/http-error';
import { setArchived } from './archiving';
import { toService } from './presenters';
import { route, type RouteDef } from './route';

const serviceRecord = { entity: 'service', label: 'The service', present: toService };

function sampleService(unique: string) {
  return { name: `Matrix service ${unique}`, unit: 'half_day', rate: 180000, currency: 'GBP' };
}

/** Throws a 400 on `tunnelId` unless it names an existing tunnel. */
async function assertTunnelExists(trx: Knex.Transaction, input: ServiceInput): Promise<void> {
  if (input.tunnelId && !(await Tunnel.query(trx).findById(input.tunnelId))) {
    throw HttpError.field('tunnelId', 'Choose an existing tunnel, or none for any tunnel');
  }
}

/** /api/services: the priced services of the catalogue. Customers see live ones; lab managers keep them. */
export const serviceRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: 'authenticated',
    summary: 'List services (archived ones for staff on request)',
    query: catalogueListQuerySchema,
    sample: { expect: 200 },
    handler: async ({ caller, query, res }) => {
      const builder = Service.query().orderBy('name');
      if (!(query.includeArchived && isStaff(caller))) builder.whereNull('archivedAt');
      res.json((await builder).map(toService));
    },
  }),
  route({
    method: 'get',
    path: '/:id',
    access: 'authenticated',
    summary: 'One service',
    sample: { params: async (f) => ({ id: await f.serviceId() }), expect: 200 },
    handler: async ({ caller, params, res }) => {
      const service = await Service.query().findById(params.id ?? '');
      if (!service || (service.archivedAt && !isStaff(caller))) throw HttpError.notFound('The service');
      res.json(toService(service));
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: ['lab_manager'],
    summary: 'Add a service',
    body: serviceInputSchema,
    sample: { body: (f) => sampleService(f.unique()), expect: 201 },
    handler: async ({ caller, body, res, deps }) => {
      const created = await deps.knex.transaction(async (trx) => {
        await assertTunnelExists(trx, body);
        const service = await Service.query(trx).insert(body).returning('*');
        await recordAudit(trx, { actorId: caller.id, action: 'service.created', entity: 'service', entityId: service.id, after: toService(service) });
        return service;
      });
      res.status(201).json(toService(created));
    },
  }),
  route({
    method: 'put',
    path: '/:id',
    access: ['lab_manager'],
    summary: 'Edit a service',
    body: serviceInputSchema,
    sample: { params: async (f) => ({ id: await f.serviceId() }), body: (f) => sampleService(f.unique()), expect: 200 },
    handler: async ({ caller, params, body, res, deps }) => {
      const updated = await deps.knex.transaction(async (trx) => {
        const service = await Service.query(trx).findById(params.id ?? '').forUpdate();
        if (!service) throw HttpError.notFound('The service');
        await assertTunnelExists(trx, body);
        const after = await Service.query(trx).patchAndFetchById(service.id, body);
        await recordAudit(trx, { actorId: caller.id, action: 'service.updated', entity: 'service', entityId: service.id, before: toService(service), after: toService(after) });
        return after;
      });
      res.json(toService(updated));
    },
  }),
  route({
    method: 'post',
    path: '/:id/archive',
    access: ['lab_manager'],
    summary: 'Archive a service',
    sample: { params: async (f) => ({ id: await f.serviceId() }), expect: 200 },
    handler: async ({ caller, params, res, deps }) => {
      res.json(await setArchived(deps.knex, Service, serviceRecord, params.id ?? '', true, caller.id));
    },
  }),
  route({
    method: 'post',
    path: '/:id/restore',
    access: ['lab_manager'],
    summary: 'Bring an archived service back',
    sample: { params: async (f) => ({ id: await f.serviceId() }), expect: 200 },
    handler: async ({ caller, params, res, deps }) => {
      res.json(await setArchived(deps.knex, Service, serviceRecord, params.id ?? '', false, caller.id));
    },
  }),
];
