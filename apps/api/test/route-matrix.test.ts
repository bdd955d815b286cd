import { roles, type Role } from '@tunnelwright/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { routeTable } from '../src/routes/route-table';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

type Principal = 'anonymous' | Role | 'other-organisation customer' | 'deactivated lab_manager';

/**
 * The status a principal should get from a route, read from the route table itself: 401 without a token,
 * 403 for a role the route does not list, 404 for a customer reaching another organisation's record,
 * otherwise the sample's own status.
 */
function expectedStatus(route: (typeof routeTable)[number], principal: Principal): number {
  if (route.access === 'public') return route.sample.expect;
  if (principal === 'anonymous' || principal === 'deactivated lab_manager') return 401;
  const role: Role = principal === 'other-organisation customer' ? 'customer' : principal;
  if (route.access !== 'authenticated' && !route.access.includes(role)) return 403;
  if (principal === 'other-organisation customer' && route.sample.crossOrganisation) return 404;
  return route.sample.expect;
}

describe('role × route matrix (generated from the route table)', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  const principals = new Map<Principal, FixtureUser | null>();

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    principals.set('anonymous', null);
    for (const role of roles) principals.set(role, await fixtures.user({ role }));
    principals.set('deactivated lab_manager', await fixtures.user({ role: 'lab_manager', active: false }));
    principals.set('other-organisation customer', await fixtures.user({ role: 'customer', organisationId: (await fixtures.customerOrganisation()).id }));
  });
  afterAll(() => t?.close());

  it('covers every route of the table', () => {
    expect(routeTable.length).toBeGreaterThanOrEqual(25);
  });

  for (const route of routeTable) {
    describe(`${route.method.toUpperCase()} ${route.fullPath}`, () => {
      for (const principal of ['anonymous', ...roles, 'other-organisation customer', 'deactivated lab_manager'] as Principal[]) {
        it(`${principal} → ${route.access === 'public' ? 'public' : 'guarded'}`, async () => {
          const caller = principals.get(principal) ?? null;
          const params = route.sample.params ? await route.sample.params(fixtures) : {};
          const path = route.fullPath.replace(/:(\w+)/g, (_m, name: string) => encodeURIComponent(params[name] ?? ''));
          let call = request(t.app)[route.method](path).query(route.sample.query ?? {});
          if (caller) call = call.set('Authorization', `Bearer ${caller.token}`);
          const body = route.sample.body ? await route.sample.body(fixtures) : undefined;
          const response = body === undefined ? await call : await call.send(body as object);
          const expected = expectedStatus(route, principal);
          expect(response.status, JSON.stringify(response.body)).toBe(expected);
          if (expected >= 400) expect(response.headers['content-type']).toMatch(/application\/problem\+json/);
        });
      }
    });
  }
});
