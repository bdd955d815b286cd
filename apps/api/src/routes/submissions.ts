import { approvalInputSchema, issueInputSchema, sendBackInputSchema, submissionInputSchema } from '@tunnelwright/contracts';
import { Organisation, Submission, TestRecord } from '@tunnelwright/db';
import { toResultSheets, toSubmissions } from '../approval/presenters';
import { sheetIssuedMail } from '../approval/sheet-mail';
import { approveSubmission, issueSheet, sendBackSubmission, sheetRecipients, submitForApproval } from '../approval/workflow';
import { HttpError } from '../errors/http-error';
import { grantEveryAnalyst, sampleReducedRun, sampleSubmission, type ReducedSample } from './approval-samples';
import { sampleTestId } from './ingest-samples';
import { route, type RouteDef } from './route';

const staff = ['technician', 'analyst', 'lab_manager'] as const;

/** The run the submission sample's params just made, for its body (the matrix asks for params, then the body). */
let lastReduced: ReducedSample | undefined;

async function findSubmission(id: string): Promise<Submission> {
  const submission = await Submission.query().findById(id);
  if (!submission) throw HttpError.notFound('The submission');
  return submission;
}

/** /api/tests/:id/submissions: a test's results put forward for approval (staff only; customers see sheets once issued). */
export const testSubmissionRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/:id/submissions',
    access: staff,
    summary: "A test's submissions for approval, newest first, with their chosen reductions and decisions",
    sample: { params: async (f) => ({ id: await sampleTestId(f) }), expect: 200 },
    handler: async ({ params, res, deps }) => {
      const test = await TestRecord.query().findById(params.id ?? '');
      if (!test) throw HttpError.notFound('The test');
      res.json(await toSubmissions(deps.knex, await Submission.query().where('testId', test.id).orderBy('sequence', 'desc')));
    },
  }),
  route({
    method: 'post',
    path: '/:id/submissions',
    access: ['technician', 'analyst'],
    summary: "Submit a test's chosen reductions (one finished version per run) for approval (409 while one awaits approval)",
    body: submissionInputSchema,
    sample: {
      params: async (f) => {
        lastReduced = await sampleReducedRun(f);
        return { id: lastReduced.testId };
      },
      body: () => ({ reductionIds: [lastReduced?.reductionId], note: 'Baseline yaw sweep, repeat within 2 counts' }),
      expect: 201,
    },
    handler: async ({ caller, params, body, res, deps }) => {
      const submission = await submitForApproval(deps.knex, params.id ?? '', body.reductionIds, body.note, caller);
      const [dto] = await toSubmissions(deps.knex, [submission]);
      res.status(201).json(dto);
    },
  }),
];

/** /api/submissions: deciding on submissions and issuing their certified sheets. */
export const submissionRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/:id',
    access: staff,
    summary: 'One submission',
    sample: { params: async (f) => ({ id: (await sampleSubmission(f)).submissionId }), expect: 200 },
    handler: async ({ params, res, deps }) => {
      const [dto] = await toSubmissions(deps.knex, [await findSubmission(params.id ?? '')]);
      res.json(dto);
    },
  }),
  route({
    method: 'post',
    path: '/:id/approve',
    access: ['analyst'],
    summary: 'Approve a submission and freeze its data (signatories only; not whoever uploaded or submitted it; 409 unless awaiting approval)',
    body: approvalInputSchema,
    sample: {
      params: async (f) => {
        const { submissionId } = await sampleSubmission(f);
        await grantEveryAnalyst(f);
        return { id: submissionId };
      },
      body: () => ({ comment: 'Repeatability within the method limit' }),
      expect: 200,
    },
    handler: async ({ caller, params, body, res, deps }) => {
      const submission = await approveSubmission(deps.knex, params.id ?? '', body.comment, caller);
      const [dto] = await toSubmissions(deps.knex, [submission]);
      res.json(dto);
    },
  }),
  route({
    method: 'post',
    path: '/:id/send-back',
    access: ['analyst'],
    summary: 'Send a submission back with the reason (signatories only; not whoever uploaded or submitted it; 409 unless awaiting approval)',
    body: sendBackInputSchema,
    sample: {
      params: async (f) => {
        const { submissionId } = await sampleSubmission(f);
        await grantEveryAnalyst(f);
        return { id: submissionId };
      },
      body: () => ({ reason: 'Point 7 shows a balance overload warning; re-run it' }),
      expect: 200,
    },
    handler: async ({ caller, params, body, res, deps }) => {
      const submission = await sendBackSubmission(deps.knex, params.id ?? '', body.reason, caller);
      const [dto] = await toSubmissions(deps.knex, [submission]);
      res.json(dto);
    },
  }),
  route({
    method: 'post',
    path: '/:id/issue',
    access: ['analyst', 'lab_manager'],
    summary: "Issue the certified sheet of an approved submission, publish it to the customer and e-mail them (a revision supersedes the test's valid sheet and needs a reason)",
    body: issueInputSchema,
    sample: {
      params: async (f) => {
        const { submissionId } = await sampleSubmission(f, 'approved');
        await grantEveryAnalyst(f);
        return { id: submissionId };
      },
      body: () => ({}),
      expect: 201,
    },
    handler: async ({ caller, params, body, req, res, deps }) => {
      const { sheet, superseded } = await issueSheet(deps.knex, params.id ?? '', body.revisionReason, caller, deps.config.publicUrl);
      const [dto] = await toResultSheets(deps.knex, [sheet], deps.config.publicUrl);
      // The sheet is committed; a mail failure is logged, and the sheet stays available in the portal.
      try {
        const lab = await Organisation.query().findOne({ kind: 'lab' });
        for (const to of await sheetRecipients(deps.knex, sheet.testId)) {
          await deps.mailer.send(sheetIssuedMail({ to, sheet, testTitle: dto!.testTitle, labName: lab?.name ?? 'The laboratory', publicUrl: deps.config.publicUrl, ...(superseded ? { replaces: superseded.reportNumber } : {}) }));
        }
      } catch (error) {
        req.log.error({ err: error, sheetId: sheet.id }, 'result sheet mail could not be sent');
      }
      res.status(201).json(dto);
    },
  }),
];
