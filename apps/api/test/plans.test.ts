import {
  buildUpDrag,
  estimateDuration,
  fullScalePower,
  headTailPowerSeries,
  ISA_SEA_LEVEL,
  PLANNER_CAUTION,
  tunnelFit,
} from '@tunnelwright/aero';
import { PLANNER_DEFAULT_AIR } from '@tunnelwright/contracts';
import { Balance } from '@tunnelwright/db';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

const close = (actual: number, expected: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.abs(expected) * 1e-12);

describe('/api/plans', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let customer: FixtureUser;
  let otherCustomer: FixtureUser;
  let analyst: FixtureUser;
  let manager: FixtureUser;
  let technician: FixtureUser;
  let tunnelId: string;

  const auth = (user: FixtureUser) => `Bearer ${user.token}`;

  /** Two spheres, a cylinder in cross-flow and a custom part with a known drag area. */
  const threePartInput = () => ({
    parts: [
      { type: 'shape', shapeId: 'sphere', dimensions: { diameter: 0.2 }, count: 2, label: 'Lamp heads' },
      { type: 'shape', shapeId: 'circular-cylinder-cross-flow', dimensions: { length: 1, diameter: 0.05 }, count: 1 },
      { type: 'custom', label: 'Mounting box', dragArea: 0.05, frontalArea: 0.08, count: 1 },
    ],
    speeds: [20, 40],
    interferenceFactor: 1.1,
    tunnelId,
    dragCapacity: 100,
    scale: 0.5,
    yawMargin: 0.25,
    fullScale: { groundSpeed: 15, windSpeed: 4, windDirection: 0, seriesMaxWind: 10 },
    duration: { points: 120, dwellSeconds: 30, configurationChanges: 4, changeMinutes: 15, setupMinutes: 60 },
  });

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    customer = await fixtures.user({ role: 'customer' });
    otherCustomer = await fixtures.user({ role: 'customer', organisationId: (await fixtures.customerOrganisation()).id });
    analyst = await fixtures.user({ role: 'analyst' });
    manager = await fixtures.user({ role: 'lab_manager' });
    technician = await fixtures.user({ role: 'technician' });
    tunnelId = (await fixtures.tunnel({ area: 2.9, maxSpeed: 50, kind: 'closed' })).id;
  });
  afterAll(() => t?.close());

  describe('POST /evaluate', () => {
    it('three-part plan → 200 matching the numerics computed independently', async () => {
      const response = await request(t.app).post('/api/plans/evaluate').set('Authorization', auth(customer)).send(threePartInput());
      expect(response.status).toBe(200);
      const body = response.body;
      expect(body.caution).toBe(PLANNER_CAUTION);

      const air = { density: ISA_SEA_LEVEL.density, viscosity: ISA_SEA_LEVEL.viscosity };
      const buildUp = buildUpDrag(
        [
          { shapeId: 'sphere', dimensions: { diameter: 0.2 }, count: 2, label: 'Lamp heads' },
          { shapeId: 'circular-cylinder-cross-flow', dimensions: { length: 1, diameter: 0.05 }, count: 1 },
          { label: 'Mounting box', dragArea: 0.05, frontalArea: 0.08, count: 1 },
        ],
        { speed: 15, ...air, interferenceFactor: 1.1 },
      );
      const fit = tunnelFit({
        buildUp,
        tunnel: { kind: 'closed-section', sectionArea: 2.9, maxSpeed: 50, capacities: { drag: 100 }, ...air },
        scale: 0.5,
        speeds: [20, 40],
        yawMargin: 0.25,
      });
      const power = fullScalePower({ dragArea: buildUp.totalDragArea, density: air.density, groundSpeed: 15, windSpeed: 4, windDirection: 0 });
      const series = headTailPowerSeries({ dragArea: buildUp.totalDragArea, density: air.density, groundSpeed: 15, windSpeeds: [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10] });
      const duration = estimateDuration({ points: 120, dwellSeconds: 30, configurationChanges: 4, changeMinutes: 15, setupMinutes: 60 });

      expect(body.buildUp.parts).toHaveLength(3);
      body.buildUp.parts.forEach((part: { dragArea: number; dragShare: number; label: string }, i: number) => {
        close(part.dragArea, buildUp.parts[i]!.dragArea);
        close(part.dragShare, buildUp.parts[i]!.dragShare);
        expect(part.label).toBe(buildUp.parts[i]!.label);
      });
      close(body.buildUp.totalDragArea, buildUp.totalDragArea);
      close(body.buildUp.totalDrag, buildUp.totalDrag);
      expect(body.fit.checks).toEqual(fit.checks);
      expect(body.fit.overall).toBe(fit.overall);
      close(body.fit.modelDragArea, fit.modelDragArea);
      close(body.fullScale.power, power.power);
      close(body.fullScale.airspeed, 19);
      expect(body.powerSeries).toHaveLength(11);
      close(body.powerSeries[4].headwind.power, series.points[4]!.headwind.power);
      close(body.powerSeries[4].tailwind.power, series.points[4]!.tailwind!.power);
      expect(body.duration.hours).toBe(duration.hours);
      expect(body.duration.hours).toBe(3);
      expect(body.tunnel).toMatchObject({ id: tunnelId, sectionArea: 2.9, maxSpeed: 50, dragCapacity: 100, capacitySource: 'request' });
      expect(body.measured).toBeNull();
    });

    it('defaults the air to ISA sea level', () => {
      expect(PLANNER_DEFAULT_AIR).toEqual({ density: ISA_SEA_LEVEL.density, viscosity: ISA_SEA_LEVEL.viscosity });
    });

    it('balance instead of a capacity → 200 with that balance’s Fx capacity', async () => {
      const balance = await Balance.query(t.knex).insert({ identifier: `Plan balance ${fixtures.unique()}`, description: '', capacities: [250, 250, 500, 50, 50, 50] });
      const { dragCapacity: _omitted, ...rest } = threePartInput();
      const response = await request(t.app).post('/api/plans/evaluate').set('Authorization', auth(analyst)).send({ ...rest, balanceId: balance.id });
      expect(response.status).toBe(200);
      expect(response.body.tunnel).toMatchObject({ dragCapacity: 250, capacitySource: 'balance', balanceIdentifier: balance.identifier });
    });

    it('measured drag area → estimate vs measured with the difference in percent', async () => {
      const response = await request(t.app).post('/api/plans/evaluate').set('Authorization', auth(customer)).send({ ...threePartInput(), measuredDragArea: 0.1 });
      expect(response.status).toBe(200);
      const { estimatedDragArea, differencePercent } = response.body.measured;
      close(differencePercent, ((estimatedDragArea - 0.1) / 0.1) * 100);
    });

    it('bad fields → 400 naming each field', async () => {
      const input = threePartInput();
      const response = await request(t.app)
        .post('/api/plans/evaluate')
        .set('Authorization', auth(customer))
        .send({ ...input, scale: -1, speeds: [], parts: [{ ...input.parts[0], count: 1.5 }] });
      expect(response.status).toBe(400);
      expect(response.body.errors).toEqual(
        expect.arrayContaining([
          { field: 'scale', message: 'Scale must be greater than zero' },
          { field: 'speeds', message: 'Plan at least one speed' },
          { field: 'parts.0.count', message: 'Count must be a whole number' },
        ]),
      );
    });

    it('missing dimension → 400 naming the dimension', async () => {
      const input = threePartInput();
      const response = await request(t.app)
        .post('/api/plans/evaluate')
        .set('Authorization', auth(customer))
        .send({ ...input, parts: [input.parts[0], { type: 'shape', shapeId: 'circular-cylinder-cross-flow', dimensions: { diameter: 0.05 }, count: 1 }] });
      expect(response.status).toBe(400);
      expect(response.body.errors).toEqual([expect.objectContaining({ field: 'parts.1.dimensions.length' })]);
    });

    it('unknown shape, unknown tunnel, no capacity → 400 on that field', async () => {
      const input = threePartInput();
      const send = (body: unknown) => request(t.app).post('/api/plans/evaluate').set('Authorization', auth(customer)).send(body as object);
      expect((await send({ ...input, parts: [{ type: 'shape', shapeId: 'teapot', dimensions: {}, count: 1 }] })).body.errors[0].field).toBe('parts.0.shapeId');
      expect((await send({ ...input, tunnelId: '00000000-0000-4000-8000-000000000000' })).body.errors[0].field).toBe('tunnelId');
      const { dragCapacity: _omitted, ...noCapacity } = input;
      expect((await send(noCapacity)).body.errors[0].field).toBe('dragCapacity');
    });

    it('technician → 403', async () => {
      const response = await request(t.app).post('/api/plans/evaluate').set('Authorization', auth(technician)).send(threePartInput());
      expect(response.status).toBe(403);
    });
  });

  describe('POST / and PUT /:id', () => {
    it('each save adds a version and keeps the older ones', async () => {
      const created = await request(t.app).post('/api/plans').set('Authorization', auth(customer)).send({ name: 'Street lamp', input: threePartInput() });
      expect(created.status).toBe(201);
      expect(created.body).toMatchObject({ name: 'Street lamp', currentVersion: 1, organisationId: customer.organisationId, bookingId: null, caution: PLANNER_CAUTION });
      expect(created.body.evaluation.buildUp.parts).toHaveLength(3);
      const id = created.body.id as string;

      const changed = { ...threePartInput(), scale: 0.25 };
      const updated = await request(t.app).put(`/api/plans/${id}`).set('Authorization', auth(customer)).send({ name: 'Street lamp, quarter scale', input: changed, note: 'Quarter scale' });
      expect(updated.status).toBe(200);
      expect(updated.body).toMatchObject({ currentVersion: 2, name: 'Street lamp, quarter scale' });
      expect(updated.body.latest).toMatchObject({ version: 2, note: 'Quarter scale' });
      expect(updated.body.latest.input.scale).toBe(0.25);

      const versions = await request(t.app).get(`/api/plans/${id}/versions`).set('Authorization', auth(customer));
      expect(versions.status).toBe(200);
      expect(versions.body.caution).toBe(PLANNER_CAUTION);
      expect(versions.body.items.map((v: { version: number }) => v.version)).toEqual([2, 1]);
      expect(versions.body.items[1].input.scale).toBe(0.5);

      const audit = await t.knex('audit_entries').where({ entity: 'plan', entityId: id }).orderBy('createdAt');
      expect(audit.map((row: { action: string }) => row.action)).toEqual(['plan.created', 'plan.versioned']);
    });

    it('invalid input on save → 400 naming the field under input', async () => {
      const response = await request(t.app).post('/api/plans').set('Authorization', auth(customer)).send({ name: '', input: { ...threePartInput(), yawMargin: -1 } });
      expect(response.status).toBe(400);
      expect(response.body.errors).toEqual(
        expect.arrayContaining([
          { field: 'name', message: 'Name the plan' },
          { field: 'input.yawMargin', message: 'Yaw margin cannot be negative' },
        ]),
      );
    });

    it('staff without an organisation → 400 on organisationId; with one → 201 in that organisation', async () => {
      const missing = await request(t.app).post('/api/plans').set('Authorization', auth(manager)).send({ name: 'Staff plan', input: threePartInput() });
      expect(missing.status).toBe(400);
      expect(missing.body.errors[0].field).toBe('organisationId');
      const made = await request(t.app).post('/api/plans').set('Authorization', auth(manager)).send({ name: 'Staff plan', input: threePartInput(), organisationId: customer.organisationId });
      expect(made.status).toBe(201);
      expect(made.body.organisationId).toBe(customer.organisationId);
    });

    it('customer linking certified results → 400; analyst → 200 with estimate vs measured', async () => {
      const created = await request(t.app).post('/api/plans').set('Authorization', auth(customer)).send({ name: 'Sign board', input: threePartInput() });
      const link = { dragArea: 0.1, source: 'Certified results CR-0042' };
      const refused = await request(t.app).put(`/api/plans/${created.body.id}`).set('Authorization', auth(customer)).send({ name: 'Sign board', input: threePartInput(), measured: link });
      expect(refused.status).toBe(400);
      expect(refused.body.errors[0].field).toBe('measured');
      const linked = await request(t.app).put(`/api/plans/${created.body.id}`).set('Authorization', auth(analyst)).send({ name: 'Sign board', input: threePartInput(), measured: link });
      expect(linked.status).toBe(200);
      expect(linked.body.measured).toEqual(link);
      const { estimatedDragArea, differencePercent, source } = linked.body.evaluation.measured;
      expect(source).toBe(link.source);
      close(differencePercent, ((estimatedDragArea - 0.1) / 0.1) * 100);
      // A later customer save keeps the link.
      const resaved = await request(t.app).put(`/api/plans/${created.body.id}`).set('Authorization', auth(customer)).send({ name: 'Sign board', input: threePartInput() });
      expect(resaved.body).toMatchObject({ currentVersion: 3, measured: link });
    });
  });

  describe('attached by POST /api/bookings', () => {
    const bookingBody = async (planId: string) => {
      const start = new Date(Math.ceil((Date.now() + 70 * 86_400_000) / 3_600_000) * 3_600_000);
      return {
        tunnelId: (await fixtures.tunnel()).id,
        start: start.toISOString(),
        end: new Date(start.getTime() + 8 * 3_600_000).toISOString(),
        articles: [{ name: 'Street lamp model', referenceAreaKind: 'frontal' }],
        planId,
      };
    };

    it('own plan → 201 and the plan names the booking; another organisation’s plan → 400 on planId', async () => {
      const created = await request(t.app).post('/api/plans').set('Authorization', auth(customer)).send({ name: 'For booking', input: threePartInput() });
      const booking = await request(t.app).post('/api/bookings').set('Authorization', auth(customer)).send(await bookingBody(created.body.id));
      expect(booking.status).toBe(201);
      const plan = await request(t.app).get(`/api/plans/${created.body.id}`).set('Authorization', auth(customer));
      expect(plan.body.bookingId).toBe(booking.body.id);

      const foreign = await request(t.app).post('/api/bookings').set('Authorization', auth(otherCustomer)).send(await bookingBody(created.body.id));
      expect(foreign.status).toBe(400);
      expect(foreign.body.errors).toEqual([expect.objectContaining({ field: 'planId' })]);
    });
  });

  describe('organisation privacy', () => {
    it('a customer of another organisation gets 404 and does not see the plan listed; staff see it', async () => {
      const created = await request(t.app).post('/api/plans').set('Authorization', auth(customer)).send({ name: 'Private plan', input: threePartInput() });
      const id = created.body.id as string;
      for (const path of [`/api/plans/${id}`, `/api/plans/${id}/versions`]) {
        expect((await request(t.app).get(path).set('Authorization', auth(otherCustomer))).status).toBe(404);
      }
      const put = await request(t.app).put(`/api/plans/${id}`).set('Authorization', auth(otherCustomer)).send({ name: 'Taken', input: threePartInput() });
      expect(put.status).toBe(404);
      const otherList = await request(t.app).get('/api/plans').set('Authorization', auth(otherCustomer));
      expect(otherList.body.items.map((p: { id: string }) => p.id)).not.toContain(id);
      const ownList = await request(t.app).get('/api/plans').set('Authorization', auth(customer));
      expect(ownList.body.items.map((p: { id: string }) => p.id)).toContain(id);
      expect(ownList.body.caution).toBe(PLANNER_CAUTION);
      const staff = await request(t.app).get(`/api/plans/${id}`).set('Authorization', auth(analyst));
      expect(staff.status).toBe(200);
    });

    it('a malformed id → 404', async () => {
      expect((await request(t.app).get('/api/plans/not-a-plan').set('Authorization', auth(customer))).status).toBe(404);
    });
  });
});
