import { occupancyWindowSchema, provisionalStates, type BookingState, type OccupancySlot } from '@tunnelwright/contracts';
import { isStaff, Tunnel } from '@tunnelwright/db';
import { loadLabBookingContext } from '../bookings/lab-booking-settings';
import { parsePeriod, rangeLiteral, toPeriod, type Instants } from '../bookings/periods';
import { HttpError } from '../errors/http-error';
import { route, type RouteDef } from './route';

interface OccupancyRow {
  period: string;
  bookingId: string | null;
  maintenanceBlockId: string | null;
  state: BookingState | null;
  holdExpiresAt: Date | null;
  organisationId: string | null;
  organisationName: string | null;
  reason: string | null;
}

/** /api/tunnels/:id/occupancy: the tunnel's calendar as busy and free stretches. */
export const occupancyRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/:id/occupancy',
    access: 'authenticated',
    summary: "A tunnel's busy and free periods; other customers' bookings show only as busy",
    query: occupancyWindowSchema,
    sample: { params: async (f) => ({ id: await f.tunnelId() }), query: { from: '2026-01-01T00:00:00Z', to: '2026-03-01T00:00:00Z' }, expect: 200 },
    handler: async ({ caller, params, query, deps, res }) => {
      const tunnel = await Tunnel.query(deps.knex).findById(params.id ?? '');
      if (!tunnel || (tunnel.archivedAt && !isStaff(caller))) throw HttpError.notFound('The tunnel');
      const context = await loadLabBookingContext(deps.knex);
      const window: Instants = { start: new Date(query.from), end: new Date(query.to) };
      const rows = (await deps.knex('tunnel_occupancy as o')
        .leftJoin('bookings as b', 'b.id', 'o.booking_id')
        .leftJoin('organisations as org', 'org.id', 'b.organisation_id')
        .leftJoin('maintenance_blocks as m', 'm.id', 'o.maintenance_block_id')
        .select('o.period', 'o.booking_id', 'o.maintenance_block_id', 'b.state', 'b.hold_expires_at', 'b.organisation_id', 'org.name as organisation_name', 'm.reason')
        .where('o.tunnel_id', tunnel.id)
        .whereRaw('o.period && ?::tstzrange', [rangeLiteral(window)])
        .orderByRaw('lower(o.period)')) as OccupancyRow[];
      const now = new Date();
      // A lapsed hold frees its slot at once, whether or not the sweep has run yet.
      const live = rows.filter((r) => !(r.state && provisionalStates.includes(r.state) && r.holdExpiresAt && r.holdExpiresAt <= now));
      const slots: OccupancySlot[] = [];
      let cursor = window.start;
      for (const row of live) {
        const period = parsePeriod(row.period);
        const start = period.start < window.start ? window.start : period.start;
        const end = period.end > window.end ? window.end : period.end;
        if (start > cursor) slots.push({ status: 'free', period: toPeriod({ start: cursor, end: start }) });
        const busy: OccupancySlot = { status: 'busy', period: toPeriod({ start, end }) };
        const mayKnow = isStaff(caller) || (row.organisationId !== null && row.organisationId === caller.organisationId);
        if (row.maintenanceBlockId) {
          busy.kind = 'maintenance';
          if (isStaff(caller)) busy.reason = row.reason ?? '';
        } else if (mayKnow && row.bookingId && row.state) {
          Object.assign(busy, { kind: 'booking', bookingId: row.bookingId, state: row.state, organisationName: row.organisationName ?? '' });
        }
        slots.push(busy);
        if (end > cursor) cursor = end;
      }
      if (cursor < window.end) slots.push({ status: 'free', period: toPeriod({ start: cursor, end: window.end }) });
      res.json({ tunnelId: tunnel.id, timeZone: context.timeZone, from: window.start.toISOString(), to: window.end.toISOString(), slots });
    },
  }),
];
