import { compareQuerySchema, previewFieldsSchema, reductionOverridesSchema, uploadFieldsSchema } from '@tunnelwright/contracts';
import { DESIGN_CAUTION, type ImportProfile } from '@tunnelwright/aero';
import { isStaff, RawFile, Reduction, ReductionPoint, Run, scopeToCaller, TestRecord } from '@tunnelwright/db';
import { pipeline } from 'node:stream/promises';
import { z } from 'zod';
import { HttpError } from '../errors/http-error';
import { toProblem } from '../errors/problem';
import { toRawFile, toReduction, toRun } from '../ingest/ingest-presenters';
import { ingestServices } from '../ingest/ingest-services';
import { previewUpload } from '../ingest/preview-upload';
import { receiveUpload } from '../ingest/receive-upload';
import { parseProfileField, usableImportProfile } from '../ingest/saved-import-profile';
import { DuplicateUploadError, reduceAgain, storeUpload } from '../ingest/store-upload';
import { sampleComparedRunId, sampleRunId } from './ingest-samples';
import { route, type RouteDef } from './route';

const staff = ['technician', 'analyst', 'lab_manager'] as const;

const reduceAgainSchema = reductionOverridesSchema.extend({ rawFileId: z.uuid().optional() });
const rawQuerySchema = z.object({ fileId: z.uuid().optional() });

async function pointCount(reductionId: string): Promise<number> {
  return ReductionPoint.query().where('reductionId', reductionId).resultSize();
}

/** /api/runs: one run, its raw file, uploads, previews and reduction versions. */
export const runRoutes: RouteDef[] = [
  route({
    method: 'post',
    path: '/preview',
    access: staff,
    summary: 'Check a run file without keeping it (optionally through an import profile: multipart `profile` JSON or `profileId` of a saved one): header, first rows, or every issue with line and column',
    sample: { expect: 400 },
    handler: async ({ req, res, deps }) => {
      const services = ingestServices(deps);
      const upload = await receiveUpload(req, res, { dir: services.uploadDir, limitBytes: services.uploadLimitBytes });
      try {
        const fields = previewFieldsSchema.parse(upload.fields);
        if (fields.profile && fields.profileId) throw HttpError.field('profileId', 'Give either a profile or a saved profile, not both');
        let profile: ImportProfile | undefined;
        if (fields.profile) profile = parseProfileField(fields.profile);
        if (fields.profileId) profile = (await usableImportProfile(fields.profileId)).profile;
        res.json(await previewUpload(upload.path, upload.originalName, profile));
      } finally {
        await upload.discard();
      }
    },
  }),
  route({
    method: 'get',
    path: '/:id',
    access: 'authenticated',
    summary: 'One run with its raw files (customers: runs of their own tests)',
    sample: { params: async (f) => ({ id: await sampleRunId(f) }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res }) => {
      const run = await Run.query().findById(params.id ?? '');
      const test = run && (await scopeToCaller(TestRecord.query(), caller).findById(run.testId));
      if (!run || !test) throw HttpError.notFound('The run');
      res.json(toRun(run, await RawFile.query().where('runId', run.id).orderBy('createdAt')));
    },
  }),
  route({
    method: 'post',
    path: '/:runId/files',
    access: staff,
    summary: 'Upload the raw balance file of a run (multipart `file`, optional `overrides` JSON and `profileId` of a saved import profile) and queue its reduction',
    sample: { params: async (f) => ({ runId: await sampleRunId(f) }), expect: 400 },
    handler: async ({ req, res, deps, params, caller }) => {
      const services = ingestServices(deps);
      const runId = params.runId ?? '';
      if (!(await Run.query().findById(runId))) throw HttpError.notFound('The run');
      const upload = await receiveUpload(req, res, { dir: services.uploadDir, limitBytes: services.uploadLimitBytes });
      try {
        const fields = uploadFieldsSchema.parse(upload.fields);
        const profile = fields.profileId ? await usableImportProfile(fields.profileId) : undefined;
        const stored = await storeUpload(deps, runId, upload, fields.overrides, caller, profile);
        const href = `/api/runs/${runId}/raw?fileId=${stored.rawFile.id}`;
        res
          .status(202)
          .location(stored.reduction ? `/api/reductions/${stored.reduction.id}` : href)
          .json({ rawFile: toRawFile(stored.rawFile), reduction: stored.reduction ? toReduction(stored.reduction, 0) : null });
      } catch (error) {
        if (!(error instanceof DuplicateUploadError)) throw error;
        const href = `/api/runs/${runId}/raw?fileId=${error.existing.id}`;
        const problem = toProblem(new HttpError(409, 'File already uploaded', `This exact file (SHA-256 ${error.existing.sha256}) is already stored for this run as "${error.existing.originalName}".`));
        res
          .status(409)
          .type('application/problem+json')
          .set('Link', `<${href}>; rel="duplicate"`)
          .json({ ...problem, instance: req.originalUrl, existing: { ...toRawFile(error.existing), href } });
      } finally {
        await upload.discard();
      }
    },
  }),
  route({
    method: 'get',
    path: '/:id/raw',
    access: staff,
    summary: 'Download a raw file of the run exactly as uploaded (newest unless `fileId`), with its SHA-256',
    query: rawQuerySchema,
    sample: { params: async (f) => ({ id: await sampleRunId(f) }), expect: 200 },
    handler: async ({ params, query, res, deps }) => {
      const builder = RawFile.query().where('runId', params.id ?? '');
      const rawFile = query.fileId ? await builder.findById(query.fileId) : await builder.orderBy('createdAt', 'desc').first();
      if (!rawFile) throw HttpError.notFound('The raw file');
      const stream = await ingestServices(deps).rawStore.get(rawFile.storageKey);
      res.set({
        'Content-Type': 'text/csv; charset=utf-8',
        'Content-Length': String(rawFile.size),
        'Content-Disposition': `attachment; filename="${rawFile.originalName.replace(/[^\w.\- ]/g, '_')}"`,
        'X-Content-SHA256': rawFile.sha256,
        'Repr-Digest': `sha-256=:${Buffer.from(rawFile.sha256, 'hex').toString('base64')}:`,
      });
      await pipeline(stream, res);
    },
  }),
  route({
    method: 'get',
    path: '/:id/reductions',
    access: 'authenticated',
    summary: 'Every reduction version of the run, newest first (customers: their own tests, approved versions only)',
    sample: { params: async (f) => ({ id: await sampleComparedRunId(f) }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res }) => {
      const run = await Run.query().findById(params.id ?? '');
      // A customer reaches only runs of their own organisation's tests; others' runs do not exist for them.
      if (!run || !(await scopeToCaller(TestRecord.query(), caller).findById(run.testId))) throw HttpError.notFound('The run');
      const builder = Reduction.query().where('runId', run.id).orderBy('version', 'desc');
      if (!isStaff(caller)) builder.whereNotNull('approvedAt');
      const reductions = await builder;
      res.json(await Promise.all(reductions.map(async (r) => toReduction(r, await pointCount(r.id)))));
    },
  }),
  route({
    method: 'post',
    path: '/:id/reductions',
    access: ['analyst', 'lab_manager'],
    summary: 'Reduce the run again with other corrections, reference area or density model (a new version; old ones kept)',
    body: reduceAgainSchema,
    sample: { params: async (f) => ({ id: await sampleRunId(f) }), body: () => ({ corrections: { solidBlockage: 'none' }, densityModel: 'ideal-gas-buck' }), expect: 202 },
    handler: async ({ params, body, res, deps, caller }) => {
      const { rawFileId, ...overrides } = body;
      const reduction = await reduceAgain(deps, params.id ?? '', overrides, rawFileId, caller);
      res.status(202).location(`/api/reductions/${reduction.id}`).json(toReduction(reduction, 0));
    },
  }),
  route({
    method: 'get',
    path: '/:id/reductions/compare',
    access: staff,
    summary: 'Two reduction versions side by side: corrected drag counts per point and their difference',
    query: compareQuerySchema,
    sample: { params: async (f) => ({ id: await sampleComparedRunId(f) }), query: { from: '1', to: '2' }, expect: 200 },
    handler: async ({ params, query, res }) => {
      const runId = params.id ?? '';
      const versions = await Reduction.query().where('runId', runId).whereIn('version', [query.from, query.to]);
      const from = versions.find((r) => r.version === query.from);
      const to = versions.find((r) => r.version === query.to);
      if (!from || !to) throw HttpError.notFound(`Reduction version ${!from ? query.from : query.to} of the run`);
      for (const r of [from, to]) {
        if (r.state !== 'done') throw new HttpError(409, 'Reduction not finished', `Version ${r.version} is ${r.state}; only finished versions can be compared.`);
      }
      const points = await ReductionPoint.query().whereIn('reductionId', [from.id, to.id]).select('reductionId', 'pointNumber', 'yaw', 'dragCounts');
      const numbers = [...new Set(points.map((p) => p.pointNumber))].sort((a, b) => a - b);
      const rows = numbers.map((pointNumber) => {
        const a = points.find((p) => p.reductionId === from.id && p.pointNumber === pointNumber);
        const b = points.find((p) => p.reductionId === to.id && p.pointNumber === pointNumber);
        const fromDragCounts = a?.dragCounts ?? null;
        const toDragCounts = b?.dragCounts ?? null;
        return {
          pointNumber,
          yaw: (b ?? a)?.yaw ?? null,
          fromDragCounts,
          toDragCounts,
          differenceDragCounts: fromDragCounts !== null && toDragCounts !== null ? toDragCounts - fromDragCounts : null,
        };
      });
      res.json({ runId, from: from.version, to: to.version, rows, caution: DESIGN_CAUTION });
    },
  }),
];
