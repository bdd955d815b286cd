import { Router, type RequestHandler } from 'express';
import type { User } from '@tunnelwright/db';
import type { AppDeps } from '../deps';
import { HttpError } from '../errors/http-error';
import type { RouteContext, RouteDef } from './route';

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function authorise(route: RouteDef, authenticate: RequestHandler): RequestHandler[] {
  if (route.access === 'public') return [];
  const allowed = route.access === 'authenticated' ? null : route.access;
  const checkRole: RequestHandler = (req, _res, next) => {
    const user = req.user as User;
    if (allowed && !allowed.includes(user.role)) {
      next(new HttpError(403, 'Not allowed', 'Your role does not allow this action.'));
      return;
    }
    next();
  };
  return [authenticate, checkRole];
}

/** Builds one resource's Router from its route-table entries: access check, validation, handler. */
export function buildRouter(routes: RouteDef[], deps: AppDeps, authenticate: RequestHandler): Router {
  const router = Router();
  for (const route of routes) {
    if (route.enabled && !route.enabled(deps.config)) continue;
    const run: RequestHandler = async (req, res) => {
      for (const [name, value] of Object.entries(req.params)) {
        // Ids are UUIDs; anything else cannot name a record, so it is simply not found.
        if ((name === 'id' || name.endsWith('Id')) && !uuidPattern.test(String(value))) throw HttpError.notFound('The record');
      }
      const body: unknown = route.body ? route.body.parse(req.body ?? {}) : undefined;
      const query: unknown = route.query ? route.query.parse(req.query) : undefined;
      const ctx: RouteContext<unknown, unknown> = {
        req,
        res,
        deps,
        body,
        query,
        params: req.params as Record<string, string>,
        get caller(): User {
          if (!req.user) throw new HttpError(401, 'Sign-in required', 'Sign in to continue.');
          return req.user as User;
        },
        get maybeCaller(): User | undefined {
          return req.user as User | undefined;
        },
      };
      await route.handler(ctx as never);
    };
    router[route.method](route.path, ...(route.middleware?.(deps) ?? []), ...authorise(route, authenticate), run);
  }
  return router;
}
