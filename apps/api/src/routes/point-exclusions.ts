import type { PointResult } from '@tunnelwright/aero';
import { exclusionInputSchema } from '@tunnelwright/contracts';
import { PointExclusion, recordAudit, Reduction, ReductionPoint, Run } from '@tunnelwright/db';
import { z } from 'zod';
import { toExclusions } from '../approval/presenters';
import { pointsCsv } from '../approval/points-csv';
import { illegal } from '../approval/workflow';
import { HttpError } from '../errors/http-error';
import { sampleReducedRun } from './approval-samples';
import { route, type RouteDef } from './route';

const staff = ['technician', 'analyst', 'lab_manager'] as const;
const pointIndex = z.coerce.number({ message: 'The point index must be a whole number' }).int({ message: 'The point index must be a whole number' }).min(0);

/** The reduction and the point the path names, locked for the change; 409 once the reduction is approved. */
async function openPoint(trx: Parameters<typeof Reduction.query>[0], reductionId: string, rawIndex: string | undefined) {
  const parsed = pointIndex.safeParse(rawIndex);
  if (!parsed.success) throw HttpError.field('index', parsed.error.issues[0]?.message ?? 'Give a point index');
  const reduction = await Reduction.query(trx).findById(reductionId).forUpdate();
  if (!reduction) throw HttpError.notFound('The reduction');
  if (reduction.approvedAt) throw illegal('Approved and frozen', 'This reduction is approved, so its points and exclusions can no longer change. Corrections go in a new reduction version and a revised sheet.');
  if (reduction.state !== 'done') throw illegal('Not finished', `This reduction is ${reduction.state}; points can be excluded once it has finished.`);
  const point = await ReductionPoint.query(trx).select('index', 'pointNumber', 'yaw').findOne({ reductionId: reduction.id, index: parsed.data });
  if (!point) throw HttpError.notFound(`Point index ${parsed.data} of this reduction`);
  return { reduction, point };
}

/** /api/reductions/:id/…: points an analyst leaves out (each with a reason), and the points as CSV. */
export const pointExclusionRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/:id/exclusions',
    access: staff,
    summary: "A reduction's excluded points with their reasons",
    sample: { params: async (f) => ({ id: (await sampleReducedRun(f)).reductionId }), expect: 200 },
    handler: async ({ params, res, deps }) => {
      const reduction = await Reduction.query().findById(params.id ?? '');
      if (!reduction) throw HttpError.notFound('The reduction');
      res.json(await toExclusions(deps.knex, await PointExclusion.query().where('reductionId', reduction.id).orderBy('pointIndex')));
    },
  }),
  route({
    method: 'put',
    path: '/:id/points/:index/exclusion',
    access: ['analyst'],
    summary: 'Leave a point out of the result, with the written reason (409 once approved); the point stays visible, marked',
    body: exclusionInputSchema,
    sample: { params: async (f) => ({ id: (await sampleReducedRun(f)).reductionId, index: '2' }), body: () => ({ reason: 'Model vibrated visibly at this yaw angle' }), expect: 200 },
    handler: async ({ caller, params, body, res, deps }) => {
      const saved = await deps.knex.transaction(async (trx) => {
        const { reduction, point } = await openPoint(trx, params.id ?? '', params.index);
        const run = await Run.query(trx).findById(reduction.runId);
        const existing = await PointExclusion.query(trx).findOne({ reductionId: reduction.id, pointIndex: point.index });
        const exclusion = existing
          ? await PointExclusion.query(trx).patchAndFetchById(existing.id, { reason: body.reason, excludedBy: caller.id })
          : await PointExclusion.query(trx).insert({ reductionId: reduction.id, pointIndex: point.index, reason: body.reason, excludedBy: caller.id }).returning('*');
        await recordAudit(trx, {
          actorId: caller.id,
          action: 'point.excluded',
          entity: 'test',
          entityId: run?.testId ?? null,
          before: existing ? { reason: existing.reason } : null,
          after: { reductionId: reduction.id, runNumber: run?.runNumber, version: reduction.version, point: point.pointNumber, index: point.index, reason: body.reason },
        });
        return exclusion;
      });
      const [dto] = await toExclusions(deps.knex, [saved]);
      res.json(dto);
    },
  }),
  route({
    method: 'delete',
    path: '/:id/points/:index/exclusion',
    access: ['analyst'],
    summary: 'Put an excluded point back into the result (409 once approved)',
    sample: {
      params: async (f) => {
        const { reductionId } = await sampleReducedRun(f);
        const reduction = await Reduction.query().findById(reductionId).throwIfNotFound();
        await PointExclusion.query().insert({ reductionId, pointIndex: 1, reason: 'Sample exclusion to restore', excludedBy: reduction.createdBy });
        return { id: reductionId, index: '1' };
      },
      expect: 204,
    },
    handler: async ({ caller, params, res, deps }) => {
      await deps.knex.transaction(async (trx) => {
        const { reduction, point } = await openPoint(trx, params.id ?? '', params.index);
        const existing = await PointExclusion.query(trx).findOne({ reductionId: reduction.id, pointIndex: point.index });
        if (!existing) throw HttpError.notFound(`An exclusion of point index ${point.index}`);
        const run = await Run.query(trx).findById(reduction.runId);
        await PointExclusion.query(trx).deleteById(existing.id);
        await recordAudit(trx, {
          actorId: caller.id,
          action: 'point.restored',
          entity: 'test',
          entityId: run?.testId ?? null,
          before: { reason: existing.reason, excludedBy: existing.excludedBy },
          after: { reductionId: reduction.id, runNumber: run?.runNumber, version: reduction.version, point: point.pointNumber, index: point.index },
        });
      });
      res.status(204).end();
    },
  }),
  route({
    method: 'get',
    path: '/:id/points.csv',
    access: staff,
    summary: "A reduction's points as CSV, corrected coefficients with U (k = 2), excluded points marked (cells neutralised against formula injection)",
    sample: { params: async (f) => ({ id: (await sampleReducedRun(f)).reductionId }), expect: 200 },
    handler: async ({ params, res }) => {
      const reduction = await Reduction.query().findById(params.id ?? '');
      if (!reduction) throw HttpError.notFound('The reduction');
      const run = await Run.query().findById(reduction.runId).throwIfNotFound();
      const rows = await ReductionPoint.query().select('index', 'result').where('reductionId', reduction.id).orderBy('index');
      const exclusions = await PointExclusion.query().where('reductionId', reduction.id);
      const csv = pointsCsv(`Run ${run.runNumber}, reduction version ${reduction.version}${reduction.approvedAt ? ' (approved)' : ' (not approved)'}`, [
        {
          runNumber: run.runNumber,
          configurationLabel: run.configurationLabel,
          version: reduction.version,
          points: rows.filter((r) => r.result && typeof (r.result as { point?: unknown }).point === 'number').map((r) => ({ index: r.index, result: r.result as unknown as PointResult })),
          exclusions: new Map(exclusions.map((e) => [e.pointIndex, e.reason])),
        },
      ]);
      res.status(200).type('text/csv; charset=utf-8').attachment(`run-${run.runNumber}-v${reduction.version}-points.csv`).send(csv);
    },
  }),
];
