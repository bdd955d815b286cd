import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

describe('/api/articles: the items customers send for testing', () => {
  let t: TestApp;
  let f: FixtureBuilder;
  let technician: FixtureUser;
  let customer: FixtureUser;
  let rival: FixtureUser;
  let organisationId: string;
  const as = (user: FixtureUser) => ({ Authorization: `Bearer ${user.token}` });
  const body = (overrides: Record<string, unknown> = {}) => ({
    organisationId,
    name: `Roof-box model ${f.unique()}, 1:3 (invented)`,
    kind: 'road_vehicle',
    conditionOnReceipt: 'One fixing clip missing; replaced by the lab.',
    referenceArea: 0.12,
    referenceAreaKind: 'frontal',
    referenceLength: 0.6,
    scale: 3,
    ...overrides,
  });

  beforeAll(async () => {
    t = await createTestApp();
    f = new FixtureBuilder(t.knex, t.config.jwtSecret);
    technician = await f.user({ role: 'technician' });
    customer = await f.user({ role: 'customer' });
    organisationId = customer.organisationId!;
    rival = await f.user({ role: 'customer', organisationId: (await f.customerOrganisation()).id });
  });
  afterAll(() => t?.close());

  it('records the day of receipt, which a certified sheet states, and keeps it through an edit', async () => {
    const created = await request(t.app).post('/api/articles').set(as(technician)).send(body({ receivedOn: '2026-11-20' }));
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body).toMatchObject({ receivedOn: '2026-11-20', conditionOnReceipt: 'One fixing clip missing; replaced by the lab.' });
    const edited = await request(t.app).put(`/api/articles/${created.body.id}`).set(as(technician)).send(body({ name: created.body.name, receivedOn: '2026-11-21' }));
    expect(edited.status).toBe(200);
    expect((await request(t.app).get(`/api/articles/${created.body.id}`).set(as(customer))).body.receivedOn).toBe('2026-11-21');
    // Left out, it is not recorded.
    const undated = await request(t.app).post('/api/articles').set(as(technician)).send(body());
    expect(undated.body.receivedOn).toBeNull();
  });

  it('400 names the field of a date that is not a calendar date', async () => {
    const bad = await request(t.app).post('/api/articles').set(as(technician)).send(body({ receivedOn: '2026-13-40' }));
    expect(bad.status).toBe(400);
    expect(bad.body.errors).toEqual([{ field: 'receivedOn', message: 'Use a date in the form YYYY-MM-DD' }]);
  });

  it('customers read only their own organisation’s articles and cannot record one', async () => {
    const mine = await request(t.app).post('/api/articles').set(as(technician)).send(body());
    expect((await request(t.app).get('/api/articles').set(as(customer))).body.map((a: { id: string }) => a.id)).toContain(mine.body.id);
    expect((await request(t.app).get('/api/articles').set(as(rival))).body.map((a: { id: string }) => a.id)).not.toContain(mine.body.id);
    expect((await request(t.app).get(`/api/articles/${mine.body.id}`).set(as(rival))).status).toBe(404);
    expect((await request(t.app).post('/api/articles').set(as(customer)).send(body())).status).toBe(403);
  });
});
