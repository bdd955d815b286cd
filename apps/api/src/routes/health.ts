import { HttpError } from '../errors/http-error';
import { route, type RouteDef } from './route';

/** GET /api/health: whether the database and Redis answer, and whether demo mode is on. */
export const healthRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: 'public',
    summary: 'Service health',
    sample: { expect: 200 },
    handler: async ({ res, deps }) => {
      try {
        await Promise.all([deps.knex.raw('select 1'), deps.redis.ping()]);
      } catch {
        throw new HttpError(503, 'Unavailable', 'The database or the queue is not reachable.');
      }
      res.json({ status: 'ok', demoMode: deps.config.demoMode });
    },
  }),
];
