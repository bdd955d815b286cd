import { AuditEntry } from '@tunnelwright/db';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

/** An invented linear matrix: a diagonal of sensitivities with small cross terms (mV/V per N or N·m). */
const linear = [0, 1, 2, 3, 4, 5].map((i) => [0, 1, 2, 3, 4, 5].map((j) => (i === j ? 0.002 + i * 0.0001 : 0.00001 * (j - i))));

describe('/api/balances and their calibration versions', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let manager: FixtureUser;
  let technician: FixtureUser;
  const auth = (user: FixtureUser) => `Bearer ${user.token}`;

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    manager = await fixtures.user({ role: 'lab_manager', name: 'Ilse Vantongeren' });
    technician = await fixtures.user({ role: 'technician' });
  });
  afterAll(() => t?.close());

  it('400 names the field of a bad balance: empty identifier, five capacities, a zero capacity', async () => {
    const short = await request(t.app).post('/api/balances').set('Authorization', auth(manager)).send({ identifier: ' ', capacities: [1, 2, 3, 4, 5] });
    expect(short.status).toBe(400);
    expect(short.body.errors).toEqual(
      expect.arrayContaining([
        { field: 'identifier', message: 'Enter the identifier' },
        { field: 'capacities', message: 'Give six numbers: Fx, Fy, Fz, Mx, My, Mz' },
      ]),
    );
    const zero = await request(t.app).post('/api/balances').set('Authorization', auth(manager)).send({ identifier: `QB-${fixtures.unique()}`, capacities: [400, 0, 1200, 120, 200, 120] });
    expect(zero.status).toBe(400);
    expect(zero.body.errors).toEqual([{ field: 'capacities', message: 'Every capacity must be greater than zero' }]);
  });

  it('a balance installed in a tunnel is listed with its capacities on that tunnel, for customers too; an unknown or archived tunnel is 400', async () => {
    const customer = await fixtures.user({ role: 'customer' });
    const tunnel = await request(t.app)
      .post('/api/tunnels')
      .set('Authorization', auth(manager))
      .send({ name: `Balance-check tunnel ${fixtures.unique()}`, kind: 'closed', width: 2, height: 1.5, area: 2.9, length: 4, maxSpeed: 50 });
    expect(tunnel.status).toBe(201);
    expect(tunnel.body.balances).toEqual([]);
    const identifier = `TB-${fixtures.unique()}`;
    const installed = await request(t.app).post('/api/balances').set('Authorization', auth(manager)).send({ identifier, capacities: [400, 400, 1200, 120, 200, 120], tunnelId: tunnel.body.id });
    expect(installed.status, JSON.stringify(installed.body)).toBe(201);
    expect(installed.body.tunnelId).toBe(tunnel.body.id);

    const listed = await request(t.app).get('/api/tunnels').set('Authorization', auth(customer));
    const shown = listed.body.find((x: { id: string }) => x.id === tunnel.body.id);
    expect(shown.balances).toEqual([{ identifier, capacities: [400, 400, 1200, 120, 200, 120] }]);
    expect((await request(t.app).get(`/api/tunnels/${tunnel.body.id}`).set('Authorization', auth(customer))).body.balances).toHaveLength(1);

    const unknown = await request(t.app).put(`/api/balances/${installed.body.id}`).set('Authorization', auth(manager)).send({ identifier, capacities: [400, 400, 1200, 120, 200, 120], tunnelId: '00000000-0000-4000-8000-000000000000' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.errors).toEqual([{ field: 'tunnelId', message: 'Choose a tunnel of the catalogue; this one does not exist or is archived' }]);
    expect((await request(t.app).post(`/api/tunnels/${tunnel.body.id}/archive`).set('Authorization', auth(manager))).status).toBe(200);
    const archived = await request(t.app).post('/api/balances').set('Authorization', auth(manager)).send({ identifier: `TB-${fixtures.unique()}`, capacities: [400, 400, 1200, 120, 200, 120], tunnelId: tunnel.body.id });
    expect(archived.status).toBe(400);

    // Taken out of the tunnel, it is no longer listed there.
    const removed = await request(t.app).put(`/api/balances/${installed.body.id}`).set('Authorization', auth(manager)).send({ identifier, capacities: [400, 400, 1200, 120, 200, 120], tunnelId: null });
    expect(removed.body.tunnelId).toBeNull();
    const staffView = await request(t.app).get(`/api/tunnels/${tunnel.body.id}`).set('Authorization', auth(manager));
    expect(staffView.body.balances).toEqual([]);
  });

  it('versions are kept newest first, each with the name of who entered it; the balance shows the newest', async () => {
    const created = await request(t.app)
      .post('/api/balances')
      .set('Authorization', auth(manager))
      .send({ identifier: `QB-${fixtures.unique()}`, description: 'Six-component under-floor balance', capacities: [400, 400, 1200, 120, 200, 120] });
    expect(created.status).toBe(201);
    expect(created.body.currentCalibration).toBeNull();
    const id = created.body.id as string;

    const first = await request(t.app).post(`/api/balances/${id}/calibrations`).set('Authorization', auth(manager)).send({ matrices: { linear }, calibratedOn: '2026-01-12', dueOn: '2027-01-12' });
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ version: 1, overdue: false, enteredBy: manager.id });
    const second = await request(t.app).post(`/api/balances/${id}/calibrations`).set('Authorization', auth(manager)).send({ matrices: { linear }, calibratedOn: '2026-06-02', dueOn: '2099-06-02' });
    expect(second.body.version).toBe(2);

    const versions = await request(t.app).get(`/api/balances/${id}/calibrations`).set('Authorization', auth(technician));
    expect(versions.status).toBe(200);
    expect(versions.body.map((v: { version: number }) => v.version)).toEqual([2, 1]);
    expect(versions.body[0]).toMatchObject({ enteredBy: manager.id, enteredByName: 'Ilse Vantongeren', calibratedOn: '2026-06-02', dueOn: '2099-06-02' });
    expect(versions.body[1].matrices.linear).toEqual(linear);

    const balance = await request(t.app).get(`/api/balances/${id}`).set('Authorization', auth(technician));
    expect(balance.body.currentCalibration).toMatchObject({ version: 2, dueOn: '2099-06-02' });
    expect(await AuditEntry.query(t.knex).where({ action: 'balance.calibrated', entityId: id }).resultSize()).toBe(2);
  });

  it('400 names the cell of a bad matrix and a due date before the calibration date', async () => {
    const created = await request(t.app).post('/api/balances').set('Authorization', auth(manager)).send({ identifier: `QB-${fixtures.unique()}`, capacities: [1, 1, 1, 1, 1, 1] });
    const rows = linear.map((row) => [...row]);
    (rows[2] as unknown[])[3] = 'x';
    const response = await request(t.app)
      .post(`/api/balances/${created.body.id}/calibrations`)
      .set('Authorization', auth(manager))
      .send({ matrices: { linear: rows }, calibratedOn: '2026-03-01', dueOn: '2026-02-01' });
    expect(response.status).toBe(400);
    expect(response.body.errors).toEqual(expect.arrayContaining([expect.objectContaining({ field: 'matrices.linear.2.3' })]));
    const dates = await request(t.app)
      .post(`/api/balances/${created.body.id}/calibrations`)
      .set('Authorization', auth(manager))
      .send({ matrices: { linear }, calibratedOn: '2026-03-01', dueOn: '2026-02-01' });
    expect(dates.body.errors).toEqual([{ field: 'dueOn', message: 'The due date cannot be before the calibration date' }]);
  });
});
