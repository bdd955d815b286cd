import { PLANNER_CAUTION } from '@tunnelwright/aero';
import { certifiedResultLinkSchema, planInputSchema, planSaveSchema, type MeasuredLink, type PlanDetail, type PlanSave, type Role } from '@tunnelwright/contracts';
import { isStaff, Organisation, Plan, PlanVersion, recordAudit, scopeToCaller, type User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { HttpError } from '../errors/http-error';
import { certifiedCandidates, certifiedLinkColumns, linkCertifiedResult, measuredLinks, unlinkedColumns } from '../planner/certified-result';
import { evaluatePlan } from '../planner/evaluate-plan';
import { toPlanSummary, toPlanVersion } from '../planner/plan-presenters';
import { sampleIssuedSheet } from './approval-samples';
import { route, type RouteDef, type SampleFixtures } from './route';

const planners: readonly Role[] = ['customer', 'analyst', 'lab_manager'];
/** Roles that may link certified results to a plan. */
const resultLinkers: readonly Role[] = ['analyst', 'lab_manager'];

async function sampleInput(f: SampleFixtures) {
  return {
    parts: [{ type: 'shape', shapeId: 'sphere', dimensions: { diameter: 0.3 }, count: 1 }],
    speeds: [20, 30],
    tunnelId: await f.tunnelId(),
    dragCapacity: 500,
    scale: 1,
    fullScale: { groundSpeed: 15 },
  };
}

async function sampleSave(f: SampleFixtures) {
  return { name: `Matrix plan ${f.unique()}`, input: await sampleInput(f), organisationId: await f.customerOrganisationId() };
}

/** A plan of the matrix customer's organisation, so a customer of another organisation must get 404. */
async function samplePlanId(f: SampleFixtures): Promise<Record<string, string>> {
  const [organisationId, author] = await Promise.all([f.customerOrganisationId(), f.customerUser()]);
  const plan = await Plan.query().insert({ organisationId, name: `Matrix plan ${f.unique()}`, currentVersion: 1, createdBy: author.id });
  await PlanVersion.query().insert({ planId: plan.id, version: 1, input: planInputSchema.parse(await sampleInput(f)), createdBy: author.id });
  return { id: plan.id };
}

/** The matrix customer's plan, linked to configuration A of the matrix customer's issued sheet. */
async function sampleLinkedPlanId(f: SampleFixtures): Promise<Record<string, string>> {
  const [{ id }, { sheetId }, author] = await Promise.all([samplePlanId(f), sampleIssuedSheet(f), f.customerUser()]);
  await Plan.transaction(async (trx) => {
    const plan = await Plan.query(trx).findById(id).withGraphFetched('organisation').throwIfNotFound();
    await Plan.query(trx).findById(id).patch(await certifiedLinkColumns(trx, plan, sheetId, 'A', author.id));
  });
  return { id };
}

/**
 * What the caller may read of a plan's measured values: staff everything; a customer only a value taken from an
 * issued sheet, so a number typed in before plans were linked to sheets never reaches them as a measurement.
 */
async function visibleMeasured(knex: Knex, caller: User, plans: readonly Plan[]): Promise<Map<string, MeasuredLink | null>> {
  const links = await measuredLinks(knex, plans);
  if (!isStaff(caller)) for (const [id, link] of links) if (link && !link.certified) links.set(id, null);
  return links;
}

/** The plan's organisation: the caller's own for a customer; a customer organisation named in the body for staff. */
async function owningOrganisation(caller: User, body: PlanSave): Promise<string> {
  if (!isStaff(caller)) return caller.organisationId;
  if (!body.organisationId) throw HttpError.field('organisationId', 'Choose the customer organisation the plan is for');
  const organisation = await Organisation.query().findById(body.organisationId);
  if (organisation?.kind !== 'customer') throw HttpError.field('organisationId', 'Choose a customer organisation');
  return organisation.id;
}

async function findPlan(caller: User, id: string): Promise<Plan> {
  const plan = await scopeToCaller(Plan.query(), caller).findById(id).withGraphFetched('organisation');
  if (!plan) throw HttpError.notFound('The plan');
  return plan;
}

async function planDetail(knex: Knex, caller: User, plan: Plan): Promise<PlanDetail> {
  const latest = await PlanVersion.query(knex).findOne({ planId: plan.id, version: plan.currentVersion });
  if (!latest) throw HttpError.notFound('The plan version');
  const version = toPlanVersion(latest);
  const link = (await visibleMeasured(knex, caller, [plan])).get(plan.id) ?? null;
  const measured = link ? { dragArea: link.dragArea, expandedUncertainty: link.expandedUncertainty, source: link.source } : null;
  // A saved plan stays readable when its tunnel is later archived, so it is evaluated as staff would see it.
  const evaluation = await evaluatePlan(version.input, { ...caller, role: 'lab_manager' }, { prefix: 'input.', measured });
  return { ...toPlanSummary(plan, link), latest: version, evaluation, caution: PLANNER_CAUTION };
}

/**
 * /api/plans: test plans of customer organisations, versioned (every save adds a version, older ones are kept),
 * and the stateless evaluation. Customers see their own organisation's plans; analysts and lab managers all.
 */
export const planRoutes: RouteDef[] = [
  route({
    method: 'post',
    path: '/evaluate',
    access: planners,
    summary: 'Evaluate a plan without saving it: build-up, tunnel fit, full-scale power, power series, tunnel hours',
    body: planInputSchema,
    sample: { body: sampleInput, expect: 200 },
    handler: async ({ caller, body, res }) => {
      res.json(await evaluatePlan(body, caller));
    },
  }),
  route({
    method: 'get',
    path: '/',
    access: planners,
    summary: 'List plans, most recently saved first',
    sample: { expect: 200 },
    handler: async ({ caller, res, deps }) => {
      const plans = await scopeToCaller(Plan.query(), caller).withGraphFetched('organisation').orderBy('updatedAt', 'desc').limit(500);
      const measured = await visibleMeasured(deps.knex, caller, plans);
      res.json({ items: plans.map((plan) => toPlanSummary(plan, measured.get(plan.id) ?? null)), caution: PLANNER_CAUTION });
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: planners,
    summary: 'Save a new plan (version 1)',
    body: planSaveSchema,
    sample: { body: sampleSave, expect: 201 },
    handler: async ({ caller, body, res, deps }) => {
      const organisationId = await owningOrganisation(caller, body);
      await evaluatePlan(body.input, caller, { prefix: 'input.' });
      const planId = await deps.knex.transaction(async (trx) => {
        const plan = await Plan.query(trx).insert({
          organisationId,
          name: body.name,
          currentVersion: 1,
          createdBy: caller.id,
        });
        await PlanVersion.query(trx).insert({ planId: plan.id, version: 1, input: body.input, note: body.note, createdBy: caller.id });
        await recordAudit(trx, { actorId: caller.id, action: 'plan.created', entity: 'plan', entityId: plan.id, after: { name: body.name, version: 1 } });
        return plan.id;
      });
      res.status(201).json(await planDetail(deps.knex, caller, await findPlan(caller, planId)));
    },
  }),
  route({
    method: 'get',
    path: '/:id',
    access: planners,
    summary: 'One plan with its latest version and that version evaluated',
    sample: { params: samplePlanId, expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res, deps }) => {
      res.json(await planDetail(deps.knex, caller, await findPlan(caller, params.id ?? '')));
    },
  }),
  route({
    method: 'put',
    path: '/:id',
    access: planners,
    summary: 'Save a plan again: adds a new version, older versions are kept',
    body: planSaveSchema,
    sample: { params: samplePlanId, body: sampleSave, expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, body, res, deps }) => {
      const existing = await findPlan(caller, params.id ?? '');
      await evaluatePlan(body.input, caller, { prefix: 'input.' });
      await deps.knex.transaction(async (trx) => {
        const plan = await Plan.query(trx).findById(existing.id).forUpdate();
        if (!plan) throw HttpError.notFound('The plan');
        const version = plan.currentVersion + 1;
        await PlanVersion.query(trx).insert({ planId: plan.id, version, input: body.input, note: body.note, createdBy: caller.id });
        await Plan.query(trx).patchAndFetchById(plan.id, { name: body.name, currentVersion: version });
        await recordAudit(trx, {
          actorId: caller.id,
          action: 'plan.versioned',
          entity: 'plan',
          entityId: plan.id,
          before: { name: plan.name, version: plan.currentVersion },
          after: { name: body.name, version },
        });
      });
      res.json(await planDetail(deps.knex, caller, await findPlan(caller, existing.id)));
    },
  }),
  route({
    method: 'get',
    path: '/:id/versions',
    access: planners,
    summary: 'Every saved version of a plan, newest first',
    sample: { params: samplePlanId, expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res }) => {
      const plan = await findPlan(caller, params.id ?? '');
      const versions = await PlanVersion.query().where({ planId: plan.id }).orderBy('version', 'desc');
      res.json({ items: versions.map(toPlanVersion), caution: PLANNER_CAUTION });
    },
  }),
  route({
    method: 'get',
    path: '/:id/certified-candidates',
    access: resultLinkers,
    summary: "Valid result sheets of the plan's customer, each configuration with the drag area at the yaw nearest 0° a link would take",
    sample: { params: samplePlanId, expect: 200 },
    handler: async ({ caller, params, res, deps }) => {
      const plan = await findPlan(caller, params.id ?? '');
      res.json({ items: await certifiedCandidates(deps.knex, plan.organisationId), caution: PLANNER_CAUTION });
    },
  }),
  route({
    method: 'put',
    path: '/:id/certified-result',
    access: resultLinkers,
    summary: "Link the plan to a configuration of a valid result sheet of its customer: the measured C_D·S (with U, k = 2) at the yaw nearest 0°, scaled to full size",
    body: certifiedResultLinkSchema,
    sample: { params: samplePlanId, body: async (f) => ({ sheetId: (await sampleIssuedSheet(f)).sheetId, configurationCode: 'A' }), expect: 200 },
    handler: async ({ caller, params, body, res, deps }) => {
      const existing = await findPlan(caller, params.id ?? '');
      await deps.knex.transaction(async (trx) => {
        const plan = await Plan.query(trx).findById(existing.id).forUpdate();
        if (!plan) throw HttpError.notFound('The plan');
        plan.organisation = existing.organisation;
        await linkCertifiedResult(trx, plan, body.sheetId, body.configurationCode, caller.id);
      });
      res.json(await planDetail(deps.knex, caller, await findPlan(caller, existing.id)));
    },
  }),
  route({
    method: 'delete',
    path: '/:id/certified-result',
    access: resultLinkers,
    summary: 'Unlink the measured value from the plan; the estimate stands alone again',
    sample: { params: sampleLinkedPlanId, expect: 204 },
    handler: async ({ caller, params, res, deps }) => {
      const existing = await findPlan(caller, params.id ?? '');
      await deps.knex.transaction(async (trx) => {
        const plan = await Plan.query(trx).findById(existing.id).forUpdate();
        if (!plan) throw HttpError.notFound('The plan');
        if (plan.measuredDragArea === null) throw new HttpError(409, 'Nothing to unlink', 'The plan has no measured value linked.');
        await Plan.query(trx).findById(plan.id).patch(unlinkedColumns);
        await recordAudit(trx, {
          actorId: caller.id,
          action: 'plan.certified_result_unlinked',
          entity: 'plan',
          entityId: plan.id,
          before: { sheetId: plan.measuredSheetId, source: plan.measuredSource, dragArea: plan.measuredDragArea },
        });
      });
      res.status(204).end();
    },
  }),
];
