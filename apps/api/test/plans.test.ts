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
import type { ReductionResult } from '@tunnelwright/aero';
import { Balance, Plan, User } from '@tunnelwright/db';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { issueSheet } from '../src/approval/workflow';
import { exampleReduction, sampleSubmission } from '../src/routes/approval-samples';
import { sampleTestId } from '../src/routes/ingest-samples';
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

    it('a typed measured value on save → 400 on measured, for staff and customers alike', async () => {
      const created = await request(t.app).post('/api/plans').set('Authorization', auth(customer)).send({ name: 'Sign board', input: threePartInput() });
      for (const user of [customer, analyst]) {
        const refused = await request(t.app)
          .put(`/api/plans/${created.body.id}`)
          .set('Authorization', auth(user))
          .send({ name: 'Sign board', input: threePartInput(), measured: { dragArea: 0.1, source: 'typed' } });
        expect(refused.status).toBe(400);
        expect(refused.body.errors[0].field).toBe('measured');
      }
      const plan = await request(t.app).get(`/api/plans/${created.body.id}`).set('Authorization', auth(customer));
      expect(plan.body).toMatchObject({ currentVersion: 1, measured: null });
    });

    it('a saved input carrying measuredDragArea shows no comparison: only a linked sheet does', async () => {
      const created = await request(t.app).post('/api/plans').set('Authorization', auth(customer)).send({ name: 'Typed', input: { ...threePartInput(), measuredDragArea: 0.1 } });
      expect(created.status).toBe(201);
      expect(created.body.evaluation.measured).toBeNull();
    });
  });

  describe('certified results', () => {
    /** The engine's own result for the example yaw sweep every sample sheet reports as configuration A. */
    let example: ReductionResult;
    let valid: { sheetId: string; reportNumber: string };
    let superseded: { sheetId: string; reportNumber: string };
    let foreign: { sheetId: string; reportNumber: string };
    let planId: string;

    const link = (user: FixtureUser, id: string, body: object) => request(t.app).put(`/api/plans/${id}/certified-result`).set('Authorization', auth(user)).send(body);

    beforeAll(async () => {
      example = await exampleReduction();
      const signer = await User.query(t.knex).findById(manager.id).throwIfNotFound();
      // Revision 1 then 2 of one test of the customer: revision 1 is superseded.
      const first = await sampleSubmission(fixtures, 'approved');
      const r1 = await issueSheet(t.knex, first.submissionId, '', signer, 'http://localhost:3000');
      const second = await sampleSubmission(fixtures, 'approved', first.testId);
      const r2 = await issueSheet(t.knex, second.submissionId, 'Re-issued to test the link to the valid revision', signer, 'http://localhost:3000');
      superseded = { sheetId: r1.sheet.id, reportNumber: r1.sheet.reportNumber };
      valid = { sheetId: r2.sheet.id, reportNumber: r2.sheet.reportNumber };
      // A sheet of another customer organisation.
      const otherOrganisation: FixtureBuilder = Object.assign(Object.create(fixtures) as FixtureBuilder, { customerOrganisationId: async () => otherCustomer.organisationId });
      const other = await sampleTestId(otherOrganisation);
      const third = await sampleSubmission(fixtures, 'approved', other);
      const r3 = await issueSheet(t.knex, third.submissionId, '', signer, 'http://localhost:3000');
      foreign = { sheetId: r3.sheet.id, reportNumber: r3.sheet.reportNumber };
      planId = (await request(t.app).post('/api/plans').set('Authorization', auth(customer)).send({ name: 'Estate car', input: threePartInput() })).body.id;
    });

    it('lists the valid sheets of the plan’s customer only, each configuration with the point nearest 0° yaw', async () => {
      const response = await request(t.app).get(`/api/plans/${planId}/certified-candidates`).set('Authorization', auth(analyst));
      expect(response.status).toBe(200);
      expect(response.body.caution).toBe(PLANNER_CAUTION);
      const numbers = response.body.items.map((c: { reportNumber: string }) => c.reportNumber);
      expect(numbers).toContain(valid.reportNumber);
      expect(numbers).not.toContain(superseded.reportNumber);
      expect(numbers).not.toContain(foreign.reportNumber);
      const candidate = response.body.items.find((c: { sheetId: string }) => c.sheetId === valid.sheetId);
      expect(candidate.scale).toBe(4);
      expect(candidate.configurations.map((c: { code: string }) => c.code)).toEqual(['A']);
    });

    it('links the drag area at the yaw nearest 0°, scaled to full size, with its U, source and audit row; the customer then sees the comparison', async () => {
      const response = await link(analyst, planId, { sheetId: valid.sheetId, configurationCode: 'A' });
      expect(response.status).toBe(200);
      // Independent reading of the engine result: the point whose |yaw| is least; C_D·S with U(C_D·S) = S·U(C_D).
      const nearest = example.points.reduce((best, p) => (Math.abs(p.yaw) < Math.abs(best.yaw) ? p : best));
      const S = nearest.corrected.dragCoefficient.referenceArea;
      const U = S * nearest.corrected.dragCoefficient.uncertainty!.expandedUncertainty;
      // Definition (similar figures): full-scale area = model area × 4² for the 1:4 example article.
      close(response.body.measured.dragArea, nearest.dragArea * 16);
      close(response.body.measured.expandedUncertainty, U * 16);
      expect(response.body.measured.certified).toMatchObject({
        sheetId: valid.sheetId,
        reportNumber: valid.reportNumber,
        sheetState: 'valid',
        configurationCode: 'A',
        yaw: nearest.yaw,
        scale: 4,
        linkedBy: analyst.name,
      });
      close(response.body.measured.certified.sheetDragArea, nearest.dragArea);
      expect(response.body.measured.source).toBe(`${valid.reportNumber}, configuration A (Baseline) at yaw ${nearest.yaw.toFixed(1)}°`);
      const { estimatedDragArea, differencePercent } = response.body.evaluation.measured;
      // Definition (relative difference): (estimate − measured) / measured × 100.
      close(differencePercent, ((estimatedDragArea - nearest.dragArea * 16) / (nearest.dragArea * 16)) * 100);

      const seen = await request(t.app).get(`/api/plans/${planId}`).set('Authorization', auth(customer));
      expect(seen.body.caution).toBe(PLANNER_CAUTION);
      expect(seen.body.evaluation.caution).toBe(PLANNER_CAUTION);
      expect(seen.body.evaluation.measured.source).toBe(response.body.measured.source);
      const listed = await request(t.app).get('/api/plans').set('Authorization', auth(customer));
      expect(listed.body.items.find((p: { id: string }) => p.id === planId).measured.certified.reportNumber).toBe(valid.reportNumber);

      const audit = await t.knex('audit_entries').where({ entity: 'plan', entityId: planId, action: 'plan.certified_result_linked' });
      expect(audit).toHaveLength(1);
      expect(audit[0].actorId).toBe(analyst.id);
      expect(audit[0].after).toMatchObject({ sheetId: valid.sheetId, configurationCode: 'A' });

      // A later save by the customer keeps the link.
      const resaved = await request(t.app).put(`/api/plans/${planId}`).set('Authorization', auth(customer)).send({ name: 'Estate car', input: threePartInput() });
      expect(resaved.body.measured.certified.sheetId).toBe(valid.sheetId);
    });

    it('refuses a superseded sheet, an unknown configuration and a bad body with field errors; another customer’s sheet → 404', async () => {
      const stale = await link(manager, planId, { sheetId: superseded.sheetId, configurationCode: 'A' });
      expect(stale.status).toBe(400);
      expect(stale.body.errors).toEqual([{ field: 'sheetId', message: `${superseded.reportNumber} is superseded; link the valid revision instead` }]);
      const missing = await link(manager, planId, { sheetId: valid.sheetId, configurationCode: 'Q' });
      expect(missing.status).toBe(400);
      expect(missing.body.errors[0].field).toBe('configurationCode');
      const bad = await link(manager, planId, { sheetId: 'nope', configurationCode: '' });
      expect(bad.status).toBe(400);
      expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['configurationCode', 'sheetId']);
      const other = await link(manager, planId, { sheetId: foreign.sheetId, configurationCode: 'A' });
      expect(other.status).toBe(404);
      const unknownPlan = await link(manager, '00000000-0000-4000-8000-000000000000', { sheetId: valid.sheetId, configurationCode: 'A' });
      expect(unknownPlan.status).toBe(404);
      // Nothing was half-written: the plan still carries the valid link.
      const plan = await Plan.query(t.knex).findById(planId).throwIfNotFound();
      expect(plan.measuredSheetId).toBe(valid.sheetId);
    });

    it('customers and technicians cannot link, unlink or list candidates', async () => {
      for (const user of [customer, technician]) {
        expect((await link(user, planId, { sheetId: valid.sheetId, configurationCode: 'A' })).status).toBe(403);
        expect((await request(t.app).delete(`/api/plans/${planId}/certified-result`).set('Authorization', auth(user))).status).toBe(403);
        expect((await request(t.app).get(`/api/plans/${planId}/certified-candidates`).set('Authorization', auth(user))).status).toBe(403);
      }
    });

    it('unlinks with an audit row; the customer sees no comparison; a second unlink → 409', async () => {
      const unlinked = await request(t.app).delete(`/api/plans/${planId}/certified-result`).set('Authorization', auth(manager));
      expect(unlinked.status).toBe(204);
      const seen = await request(t.app).get(`/api/plans/${planId}`).set('Authorization', auth(customer));
      expect(seen.body.measured).toBeNull();
      expect(seen.body.evaluation.measured).toBeNull();
      const again = await request(t.app).delete(`/api/plans/${planId}/certified-result`).set('Authorization', auth(manager));
      expect(again.status).toBe(409);
      const audit = await t.knex('audit_entries').where({ entity: 'plan', entityId: planId, action: 'plan.certified_result_unlinked' });
      expect(audit).toHaveLength(1);
      expect(audit[0].before).toMatchObject({ sheetId: valid.sheetId });
    });

    it('a link to a sheet superseded later stays, marked superseded, until staff link the new revision', async () => {
      const test = await sampleSubmission(fixtures, 'approved');
      const signer = await User.query(t.knex).findById(manager.id).throwIfNotFound();
      const old = await issueSheet(t.knex, test.submissionId, '', signer, 'http://localhost:3000');
      const id = (await request(t.app).post('/api/plans').set('Authorization', auth(customer)).send({ name: 'Kept link', input: threePartInput() })).body.id;
      expect((await link(analyst, id, { sheetId: old.sheet.id, configurationCode: 'A' })).status).toBe(200);
      const next = await sampleSubmission(fixtures, 'approved', test.testId);
      await issueSheet(t.knex, next.submissionId, 'Re-issued so the linked revision is superseded', signer, 'http://localhost:3000');
      const seen = await request(t.app).get(`/api/plans/${id}`).set('Authorization', auth(analyst));
      expect(seen.body.measured.certified).toMatchObject({ sheetId: old.sheet.id, sheetState: 'superseded' });
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
