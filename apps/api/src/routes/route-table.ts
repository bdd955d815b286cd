import type { Resource, RouteDef } from './route';
import { healthRoutes } from './health';

/**
 * Every route of the API, declared once. `app.ts` mounts one Router per resource built from this table,
 * and the integration tests generate the role × route matrix from it, so a new route is covered at once.
 */
export const resources: Resource[] = [{ mount: '/api/health', routes: healthRoutes }];

/** One row per route with its full path, as the test matrix reads it. */
export const routeTable: (RouteDef & { fullPath: string })[] = resources.flatMap((resource) =>
  resource.routes.map((r) => ({ ...r, fullPath: `${resource.mount}${r.path === '/' ? '' : r.path}` })),
);
