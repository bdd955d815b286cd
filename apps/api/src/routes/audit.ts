import { auditListQuerySchema } from '@tunnelwright/contracts';
import { AuditEntry } from '@tunnelwright/db';
import { toAuditEntry } from './presenters';
import { route, type RouteDef } from './route';

/** /api/audit: the trail of changes of consequence, newest first. */
export const auditRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: ['lab_manager'],
    summary: 'Page through the audit trail',
    query: auditListQuerySchema,
    sample: { query: { entity: 'tunnel', page: '1', pageSize: '10' }, expect: 200 },
    handler: async ({ query, res }) => {
      const builder = AuditEntry.query();
      if (query.entity) builder.where('entity', query.entity);
      if (query.entityId) builder.where('entityId', query.entityId);
      const total = await builder.clone().resultSize();
      const items = await builder
        .withGraphFetched('actor')
        .orderBy('createdAt', 'desc')
        .orderBy('id', 'desc')
        .limit(query.pageSize)
        .offset((query.page - 1) * query.pageSize);
      res.json({ items: items.map(toAuditEntry), total });
    },
  }),
];
