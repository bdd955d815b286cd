import { maintenanceBlockInputSchema, maintenanceListQuerySchema, type MaintenanceBlock as MaintenanceBlockDto } from '@tunnelwright/contracts';
import { MaintenanceBlock, recordAudit, Tunnel } from '@tunnelwright/db';
import { withClashCheck } from '../bookings/booking-transitions';
import { loadLabBookingContext } from '../bookings/lab-booking-settings';
import { instantsOf, parsePeriod, rangeLiteral, toPeriod } from '../bookings/periods';
import { HttpError } from '../errors/http-error';
import { sampleMaintenanceBlockId, sampleMaintenanceBody } from './booking-samples';
import { route, type RouteDef } from './route';

function toMaintenanceBlock(block: MaintenanceBlock, timeZone: string): MaintenanceBlockDto {
  return { id: block.id, tunnelId: block.tunnelId, period: toPeriod(parsePeriod(block.period)), reason: block.reason, timeZone, createdAt: block.createdAt.toISOString() };
}

/** /api/maintenance-blocks: periods a tunnel is closed; they occupy the tunnel exactly as bookings do. */
export const maintenanceBlockRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: ['technician', 'analyst', 'lab_manager'],
    summary: 'List maintenance blocks, soonest first',
    query: maintenanceListQuerySchema,
    sample: { expect: 200 },
    handler: async ({ query, deps, res }) => {
      const context = await loadLabBookingContext(deps.knex);
      const builder = MaintenanceBlock.query(deps.knex).orderByRaw('lower(period)');
      if (query.tunnelId) builder.where('tunnelId', query.tunnelId);
      res.json((await builder).map((b) => toMaintenanceBlock(b, context.timeZone)));
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: ['lab_manager'],
    summary: 'Close a tunnel for maintenance; 409 if the period overlaps a booking or another block',
    body: maintenanceBlockInputSchema,
    sample: { body: sampleMaintenanceBody, expect: 201 },
    handler: async ({ caller, body, deps, res }) => {
      const period = instantsOf(body);
      const context = await loadLabBookingContext(deps.knex);
      const block = await withClashCheck(deps.knex, body.tunnelId, period, context.timeZone, () =>
        deps.knex.transaction(async (trx) => {
          const tunnel = await Tunnel.query(trx).findById(body.tunnelId);
          if (!tunnel) throw HttpError.field('tunnelId', 'Choose a tunnel of the lab');
          const created = await MaintenanceBlock.query(trx).insert({ tunnelId: tunnel.id, period: rangeLiteral(period), reason: body.reason, createdBy: caller.id });
          await recordAudit(trx, { actorId: caller.id, action: 'maintenance_block.created', entity: 'maintenance_block', entityId: created.id, after: { tunnelId: tunnel.id, period: created.period, reason: created.reason } });
          return created;
        }),
      );
      const stored = await MaintenanceBlock.query(deps.knex).findById(block.id);
      res.status(201).json(toMaintenanceBlock(stored ?? block, context.timeZone));
    },
  }),
  route({
    method: 'delete',
    path: '/:id',
    access: ['lab_manager'],
    summary: 'Remove a maintenance block; its period is free again',
    sample: { params: async (f) => ({ id: await sampleMaintenanceBlockId(f) }), expect: 204 },
    handler: async ({ caller, params, deps, res }) => {
      await deps.knex.transaction(async (trx) => {
        const block = await MaintenanceBlock.query(trx).findById(params.id ?? '').forUpdate();
        if (!block) throw HttpError.notFound('The maintenance block');
        await MaintenanceBlock.query(trx).deleteById(block.id);
        await recordAudit(trx, { actorId: caller.id, action: 'maintenance_block.removed', entity: 'maintenance_block', entityId: block.id, before: { tunnelId: block.tunnelId, period: block.period, reason: block.reason } });
      });
      res.status(204).end();
    },
  }),
];
