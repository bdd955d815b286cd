import { pointsQuerySchema } from '@tunnelwright/contracts';
import { DESIGN_CAUTION } from '@tunnelwright/aero';
import { isStaff, Reduction, ReductionPoint, Run, scopeToCaller, TestRecord, type User } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';
import { toPoint, toReduction } from '../ingest/ingest-presenters';
import { sampleSubmission } from './approval-samples';
import { sampleReductionId } from './ingest-samples';
import { route, type RouteDef } from './route';

const staff = ['technician', 'analyst', 'lab_manager'] as const;

/** How often the progress feed looks at the reduction, ms. */
const feedIntervalMs = 500;
/** Longest a progress feed stays open, ms; the client reconnects if the reduction is still running. */
const feedLifetimeMs = 10 * 60 * 1000;

async function findReduction(id: string): Promise<Reduction> {
  const reduction = await Reduction.query().findById(id);
  if (!reduction) throw HttpError.notFound('The reduction');
  return reduction;
}

/**
 * The reduction as `caller` may see it: staff every one; a customer only approved ones of their own organisation's
 * tests, so nothing before approval and nothing of another customer (404 either way).
 */
async function visibleReduction(caller: User, id: string): Promise<Reduction> {
  const reduction = await findReduction(id);
  if (isStaff(caller)) return reduction;
  const run = await Run.query().select('testId').findById(reduction.runId);
  const test = run ? await scopeToCaller(TestRecord.query(), caller).select('id').findById(run.testId) : undefined;
  if (!reduction.approvedAt || !test) throw HttpError.notFound('The reduction');
  return reduction;
}

/** /api/reductions: one reduction version's state, progress, error location and points; customers see approved ones of their own tests. */
export const reductionRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/:id',
    access: staff,
    summary: 'State, progress (0–1) and, when failed, the error code, message, line and column',
    sample: { params: async (f) => ({ id: await sampleReductionId(f) }), expect: 200 },
    handler: async ({ params, res }) => {
      const reduction = await findReduction(params.id ?? '');
      res.json(toReduction(reduction, await ReductionPoint.query().where('reductionId', reduction.id).resultSize()));
    },
  }),
  route({
    method: 'get',
    path: '/:id/points',
    access: 'authenticated',
    summary: 'Reduced points in order (`offset`, `limit`, `full=true` for everything the engine reported); customers: approved versions of their own tests',
    query: pointsQuerySchema,
    sample: { params: async (f) => ({ id: (await sampleSubmission(f, 'approved')).reductionId }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, query, res }) => {
      const reduction = await visibleReduction(caller, params.id ?? '');
      const base = ReductionPoint.query().where('reductionId', reduction.id);
      const total = await base.clone().resultSize();
      const builder = base.orderBy('index').offset(query.offset).limit(query.limit);
      if (!query.full) builder.select('index', 'pointNumber', 'sampleCount', 'yaw', 'pitch', 'dynamicPressure', 'speed', 'reynoldsNumber', 'cdUncorrected', 'cdCorrected', 'clCorrected', 'csCorrected', 'dragCounts');
      res.json({ items: (await builder).map((p) => toPoint(p, query.full)), total, caution: DESIGN_CAUTION });
    },
  }),
  route({
    method: 'get',
    path: '/:id/events',
    access: staff,
    summary: 'Progress feed (server-sent events `progress`, then `end` when done or failed)',
    sample: { params: async (f) => ({ id: await sampleReductionId(f) }), expect: 200 },
    handler: async ({ params, req, res }) => {
      let reduction = await findReduction(params.id ?? '');
      res.status(200).set({ 'Content-Type': 'text/event-stream', 'Cache-Control': 'no-cache', Connection: 'keep-alive' });
      res.flushHeaders();
      let closed = false;
      req.on('close', () => {
        closed = true;
      });
      const deadline = Date.now() + feedLifetimeMs;
      let last = '';
      while (!closed) {
        const event = JSON.stringify({ state: reduction.state, progress: reduction.progress, error: reduction.errorCode ? { code: reduction.errorCode, message: reduction.errorMessage, line: reduction.errorLine, column: reduction.errorColumn } : null });
        if (event !== last) res.write(`event: progress\ndata: ${event}\n\n`);
        last = event;
        if (reduction.state === 'done' || reduction.state === 'failed' || Date.now() > deadline) {
          res.write(`event: end\ndata: ${JSON.stringify({ state: reduction.state })}\n\n`);
          break;
        }
        await new Promise((resolve) => setTimeout(resolve, feedIntervalMs));
        reduction = await findReduction(reduction.id);
      }
      res.end();
    },
  }),
];
