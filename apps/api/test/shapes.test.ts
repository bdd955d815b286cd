import { PLANNER_CAUTION, SHAPE_LIBRARY } from '@tunnelwright/aero';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

describe('/api/shapes', () => {
  let t: TestApp;
  let customer: FixtureUser;
  let technician: FixtureUser;

  beforeAll(async () => {
    t = await createTestApp();
    const fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    customer = await fixtures.user({ role: 'customer' });
    technician = await fixtures.user({ role: 'technician' });
  });
  afterAll(() => t?.close());

  describe('GET /', () => {
    it('customer → 200 with every entry, its area rule, dimensions and source, and the caution', async () => {
      const response = await request(t.app).get('/api/shapes').set('Authorization', `Bearer ${customer.token}`);
      expect(response.status).toBe(200);
      expect(response.body.caution).toBe(PLANNER_CAUTION);
      expect(response.body.items).toHaveLength(SHAPE_LIBRARY.length);
      const cylinder = response.body.items.find((item: { id: string }) => item.id === 'circular-cylinder-cross-flow');
      expect(cylinder).toMatchObject({ kind: '2-d', referenceArea: { basis: 'frontal', dimensions: ['length', 'diameter'] }, dragCoefficient: { curve: 'cylinder' } });
      expect(cylinder.source.citation).toEqual(expect.any(String));
      expect(new Set(response.body.items.map((item: { kind: string }) => item.kind))).toEqual(new Set(['2-d', '3-d', 'object']));
    });

    it('technician → 403', async () => {
      expect((await request(t.app).get('/api/shapes').set('Authorization', `Bearer ${technician.token}`)).status).toBe(403);
    });
  });
});
