import { calibrationOverrideInputSchema, runInputSchema, testInputSchema, type TestInput } from '@tunnelwright/contracts';
import { Balance, CalibrationOverride, Organisation, RawFile, recordAudit, Run, scopeToCaller, TestArticle, TestRecord, Tunnel } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { UniqueViolationError } from 'objection';
import { testProgress } from '../approval/test-progress';
import { HttpError } from '../errors/http-error';
import { currentCalibration, isOverdue, testCalibrationState } from '../ingest/calibration-check';
import { toRun, toTest } from '../ingest/ingest-presenters';
import { sampleTestBody, sampleTestId } from './ingest-samples';
import { route, type RouteDef } from './route';

const staff = ['technician', 'analyst', 'lab_manager'] as const;

/** Checks that the records a test names exist and fit together: the article belongs to the test's customer. */
async function checkReferences(knex: Knex, body: TestInput): Promise<void> {
  const organisation = await Organisation.query(knex).findById(body.organisationId);
  if (!organisation || organisation.kind !== 'customer') throw HttpError.field('organisationId', 'Choose a customer organisation');
  const article = await TestArticle.query(knex).findById(body.articleId);
  if (!article) throw HttpError.field('articleId', 'Choose an existing test article');
  if (article.organisationId !== body.organisationId) throw HttpError.field('articleId', "The article belongs to another organisation than the test's customer");
  const tunnel = await Tunnel.query(knex).findById(body.tunnelId);
  if (!tunnel || tunnel.archivedAt) throw HttpError.field('tunnelId', 'Choose a tunnel in service');
  if (body.balanceId && !(await Balance.query(knex).findById(body.balanceId))) throw HttpError.field('balanceId', 'Choose an existing balance');
}

/** The test if the caller may see it (customers: their own organisation's), else 404. */
export async function visibleTest(caller: Parameters<typeof scopeToCaller>[1], id: string): Promise<TestRecord> {
  const test = await scopeToCaller(TestRecord.query(), caller).findById(id);
  if (!test) throw HttpError.notFound('The test');
  return test;
}

/** /api/tests: tests and their runs. Staff create them; customers read their own organisation's. */
export const testRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: 'authenticated',
    summary: 'List tests with where each stands (customers: their own organisation)',
    sample: { expect: 200 },
    handler: async ({ caller, res, deps }) => {
      const tests = await scopeToCaller(TestRecord.query().orderBy('createdAt', 'desc'), caller);
      const progress = await testProgress(deps.knex, tests);
      res.json(tests.map((t) => ({ ...toTest(t), progress: progress.get(t.id) })));
    },
  }),
  route({
    method: 'get',
    path: '/:id',
    access: 'authenticated',
    summary: 'One test (staff also get where its balance calibration stands and any override on record)',
    sample: { params: async (f) => ({ id: await sampleTestId(f) }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res, deps }) => {
      const test = await visibleTest(caller, params.id ?? '');
      const progress = (await testProgress(deps.knex, [test])).get(test.id);
      // The calibration and override reason are the lab's own records; customers see their test without them.
      if (caller.role === 'customer') {
        res.json({ ...toTest(test), progress });
        return;
      }
      res.json({ ...toTest(test), progress, calibration: await testCalibrationState(deps.knex, test) });
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: staff,
    summary: 'Open a test',
    body: testInputSchema,
    sample: { body: sampleTestBody, expect: 201 },
    handler: async ({ caller, body, res, deps }) => {
      await checkReferences(deps.knex, body);
      const created = await deps.knex.transaction(async (trx) => {
        const test = await TestRecord.query(trx).insert({ ...body, bookingId: null, createdBy: caller.id }).returning('*');
        await recordAudit(trx, { actorId: caller.id, action: 'test.created', entity: 'test', entityId: test.id, after: toTest(test) });
        return test;
      });
      res.status(201).json(toTest(created));
    },
  }),
  route({
    method: 'put',
    path: '/:id',
    access: staff,
    summary: 'Edit a test',
    body: testInputSchema,
    sample: { params: async (f) => ({ id: await sampleTestId(f) }), body: sampleTestBody, expect: 200 },
    handler: async ({ caller, params, body, res, deps }) => {
      await checkReferences(deps.knex, body);
      const updated = await deps.knex.transaction(async (trx) => {
        const test = await TestRecord.query(trx).findById(params.id ?? '').forUpdate();
        if (!test) throw HttpError.notFound('The test');
        const after = await TestRecord.query(trx).patchAndFetchById(test.id, body);
        await recordAudit(trx, { actorId: caller.id, action: 'test.updated', entity: 'test', entityId: test.id, before: toTest(test), after: toTest(after) });
        return after;
      });
      res.json(toTest(updated));
    },
  }),
  route({
    method: 'post',
    path: '/:id/calibration-overrides',
    access: ['lab_manager'],
    summary: "Let a test be reduced with its balance's overdue calibration, giving a reason (audited)",
    body: calibrationOverrideInputSchema,
    sample: { params: async (f) => ({ id: await sampleTestId(f, true) }), body: () => ({ reason: 'Calibration check on 2026-11-30 within 0.1 % of the matrix' }), expect: 201 },
    handler: async ({ caller, params, body, res, deps }) => {
      const test = await TestRecord.query().findById(params.id ?? '');
      if (!test) throw HttpError.notFound('The test');
      if (!test.balanceId) throw new HttpError(409, 'No balance', 'This test names no balance, so there is no calibration to override.');
      const calibration = await currentCalibration(deps.knex, test.balanceId);
      if (!calibration || !isOverdue(calibration)) throw new HttpError(409, 'Calibration not overdue', "The balance's current calibration is not past due; no override is needed.");
      const override = await deps.knex.transaction(async (trx) => {
        try {
          const created = await CalibrationOverride.query(trx).insert({ testId: test.id, calibrationId: calibration.id, grantedBy: caller.id, reason: body.reason }).returning('*');
          await recordAudit(trx, { actorId: caller.id, action: 'calibration.overridden', entity: 'test', entityId: test.id, after: { calibrationId: calibration.id, version: calibration.version, dueOn: calibration.dueOn, reason: body.reason } });
          return created;
        } catch (error) {
          if (error instanceof UniqueViolationError) throw new HttpError(409, 'Override exists', 'An override for this test and calibration is already recorded.');
          throw error;
        }
      });
      res.status(201).json({ id: override.id, testId: test.id, calibrationId: calibration.id, reason: override.reason, grantedBy: caller.id, createdAt: override.createdAt.toISOString() });
    },
  }),
  route({
    method: 'get',
    path: '/:id/runs',
    access: 'authenticated',
    summary: 'Runs of a test with their raw files (customers: their own tests; no points before approval)',
    sample: { params: async (f) => ({ id: await sampleTestId(f) }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res }) => {
      const test = await visibleTest(caller, params.id ?? '');
      const runs = await Run.query().where('testId', test.id).orderBy('runNumber');
      const files = await RawFile.query().whereIn('runId', runs.map((r) => r.id)).orderBy('createdAt');
      res.json(runs.map((run) => toRun(run, files.filter((f) => f.runId === run.id))));
    },
  }),
  route({
    method: 'post',
    path: '/:id/runs',
    access: staff,
    summary: 'Add a run to a test (number: the next free one unless given)',
    body: runInputSchema,
    sample: { params: async (f) => ({ id: await sampleTestId(f) }), body: () => ({ kind: 'data', configurationLabel: 'baseline' }), expect: 201 },
    handler: async ({ caller, params, body, res, deps }) => {
      const run = await deps.knex.transaction(async (trx) => {
        const test = await TestRecord.query(trx).findById(params.id ?? '').forUpdate();
        if (!test) throw HttpError.notFound('The test');
        const latest = (await Run.query(trx).where('testId', test.id).max('runNumber as runNumber').first()) as unknown as { runNumber: number | null } | undefined;
        const runNumber = body.runNumber ?? (latest?.runNumber ?? 0) + 1;
        if (await Run.query(trx).findOne({ testId: test.id, runNumber })) throw HttpError.field('runNumber', `Run ${runNumber} already exists in this test`);
        const created = await Run.query(trx).insert({ testId: test.id, runNumber, kind: body.kind, configurationLabel: body.configurationLabel, notes: body.notes, createdBy: caller.id }).returning('*');
        await recordAudit(trx, { actorId: caller.id, action: 'run.created', entity: 'run', entityId: created.id, after: toRun(created, []) });
        return created;
      });
      res.status(201).json(toRun(run, []));
    },
  }),
];
