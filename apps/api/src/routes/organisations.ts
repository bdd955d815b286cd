import { createOrganisationSchema } from '@tunnelwright/contracts';
import { Organisation, recordAudit, scopeToCaller } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';
import { toOrganisation } from './presenters';
import { route, type RouteDef } from './route';

/** /api/organisations: the lab and its customer organisations. */
export const organisationRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    // Technicians and analysts open tests and record articles for a customer, so they choose from this list too.
    access: ['technician', 'analyst', 'lab_manager'],
    summary: 'List organisations, the lab first (staff)',
    sample: { expect: 200 },
    handler: async ({ res }) => {
      const organisations = await Organisation.query().orderByRaw("kind = 'lab' desc").orderBy('name');
      res.json(organisations.map(toOrganisation));
    },
  }),
  route({
    method: 'get',
    path: '/:id',
    access: 'authenticated',
    summary: 'One organisation; customers see only their own',
    sample: { params: async (f) => ({ id: await f.customerOrganisationId() }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res }) => {
      const organisation = await scopeToCaller(Organisation.query(), caller, 'id').findById(params.id ?? '');
      if (!organisation) throw HttpError.notFound('The organisation');
      res.json(toOrganisation(organisation));
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: ['lab_manager'],
    summary: 'Add a customer organisation',
    body: createOrganisationSchema,
    sample: { body: (f) => ({ name: `Customer ${f.unique()}` }), expect: 201 },
    handler: async ({ caller, body, res, deps }) => {
      const organisation = await deps.knex.transaction(async (trx) => {
        const created = await Organisation.query(trx).insert({ name: body.name, kind: 'customer', settings: {} }).returning('*');
        await recordAudit(trx, { actorId: caller.id, action: 'organisation.created', entity: 'organisation', entityId: created.id, after: toOrganisation(created) });
        return created;
      });
      res.status(201).json(toOrganisation(organisation));
    },
  }),
];
