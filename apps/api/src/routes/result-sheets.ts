import type { PointResult } from '@tunnelwright/aero';
import { resultSheetListQuerySchema } from '@tunnelwright/contracts';
import { isStaff, PointExclusion, Reduction, ReductionPoint, ResultSheet, Run, TestRecord, type User } from '@tunnelwright/db';
import type { QueryBuilder } from 'objection';
import { sheetListColumns, toResultSheets } from '../approval/presenters';
import { pointsCsv, type CsvRun } from '../approval/points-csv';
import { HttpError } from '../errors/http-error';
import { sampleIssuedSheet } from './approval-samples';
import { route, type RouteDef } from './route';

/** Limits a sheet query to what the caller may see: staff every sheet, a customer their organisation's. */
function visibleSheets<R>(query: QueryBuilder<ResultSheet, R>, caller: User): QueryBuilder<ResultSheet, R> {
  if (isStaff(caller)) return query;
  return query.whereIn('testId', TestRecord.query().select('id').where('organisationId', caller.organisationId));
}

async function findSheet(caller: User, id: string, withBytes = false): Promise<ResultSheet> {
  const query = ResultSheet.query().findById(id);
  if (!withBytes) query.select(...sheetListColumns);
  const sheet = await visibleSheets(query, caller);
  if (!sheet) throw HttpError.notFound('The result sheet');
  return sheet;
}

/** /api/result-sheets: issued certified sheets, published to the customer at issue; nothing exists here before. */
export const resultSheetRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: 'authenticated',
    summary: 'Issued result sheets, newest first (customers: their own organisation; `testId` to filter)',
    query: resultSheetListQuerySchema,
    sample: { expect: 200 },
    handler: async ({ caller, query, res, deps }) => {
      const builder = visibleSheets(ResultSheet.query().select(...sheetListColumns), caller).orderBy('createdAt', 'desc');
      if (query.testId) builder.where('testId', query.testId);
      res.json(await toResultSheets(deps.knex, await builder, deps.config.publicUrl));
    },
  }),
  route({
    method: 'get',
    path: '/:id',
    access: 'authenticated',
    summary: 'One result sheet',
    sample: { params: async (f) => ({ id: (await sampleIssuedSheet(f)).sheetId }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res, deps }) => {
      const [dto] = await toResultSheets(deps.knex, [await findSheet(caller, params.id ?? '')], deps.config.publicUrl);
      res.json(dto);
    },
  }),
  route({
    method: 'get',
    path: '/:id/pdf',
    access: 'authenticated',
    summary: 'The issued PDF, byte for byte as hashed at issue',
    sample: { params: async (f) => ({ id: (await sampleIssuedSheet(f)).sheetId }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res }) => {
      const sheet = await findSheet(caller, params.id ?? '', true);
      res
        .status(200)
        .type('application/pdf')
        .set('Cache-Control', 'private, no-store')
        .set('X-Content-SHA256', sheet.sha256.trim())
        .attachment(`${sheet.reportNumber}.pdf`)
        .send(sheet.pdf);
    },
  }),
  route({
    method: 'get',
    path: '/:id/points.csv',
    access: 'authenticated',
    summary: "The sheet's points as CSV: corrected coefficients with U (k = 2), excluded points marked, cells neutralised against formula injection",
    sample: { params: async (f) => ({ id: (await sampleIssuedSheet(f)).sheetId }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res, deps }) => {
      const sheet = await findSheet(caller, params.id ?? '');
      const links = (await deps.knex('submissionReductions').where('submissionId', sheet.submissionId)) as { reductionId: string; runId: string }[];
      const runs = await Run.query().whereIn('id', links.map((l) => l.runId)).where('kind', 'data').orderBy('runNumber');
      const reductions = await Reduction.query().select('id', 'runId', 'version').whereIn('id', links.map((l) => l.reductionId));
      const exclusions = await PointExclusion.query().whereIn('reductionId', reductions.map((r) => r.id));
      const csvRuns: CsvRun[] = [];
      for (const run of runs) {
        const reduction = reductions.find((r) => r.runId === run.id);
        if (!reduction) continue;
        const rows = await ReductionPoint.query().select('index', 'result').where('reductionId', reduction.id).orderBy('index');
        csvRuns.push({
          runNumber: run.runNumber,
          configurationLabel: run.configurationLabel,
          version: reduction.version,
          points: rows.map((r) => ({ index: r.index, result: r.result as unknown as PointResult })),
          exclusions: new Map(exclusions.filter((e) => e.reductionId === reduction.id).map((e) => [e.pointIndex, e.reason])),
        });
      }
      const csv = pointsCsv(`Points of result sheet ${sheet.reportNumber} (${sheet.state === 'valid' ? 'valid' : 'superseded'})`, csvRuns);
      res.status(200).type('text/csv; charset=utf-8').attachment(`${sheet.reportNumber}-points.csv`).send(csv);
    },
  }),
];
