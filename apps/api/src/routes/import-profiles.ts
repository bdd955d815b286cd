import { importProfileFieldsSchema, importProfileListQuerySchema } from '@tunnelwright/contracts';
import { ImportProfile, recordAudit, type User } from '@tunnelwright/db';
import type { Request, Response } from 'express';
import type { Knex } from 'knex';
import type { AppDeps } from '../deps';
import { HttpError } from '../errors/http-error';
import { ingestServices } from '../ingest/ingest-services';
import { previewUpload } from '../ingest/preview-upload';
import { receiveUpload } from '../ingest/receive-upload';
import { parseProfileField, toSavedImportProfile } from '../ingest/saved-import-profile';
import { sampleImportProfileId } from './ingest-samples';
import { route, type RouteDef } from './route';

const staff = ['technician', 'analyst', 'lab_manager'] as const;

/** A saved profile's fields after its sample file was read through it without a single issue. */
interface TriedProfile {
  name: string;
  description: string;
  profile: Record<string, unknown>;
}

/**
 * Receives the multipart save of a profile (`name`, `description`, `profile` JSON and a sample `file`) and
 * previews the sample through the profile; a profile is only kept once it has read a real file cleanly.
 * @throws HttpError 400 on `profile.<path>` for an invalid profile, on `file` with the first issue's line and column
 */
async function tryProfileOnSample(req: Request, res: Response, deps: AppDeps): Promise<TriedProfile> {
  const services = ingestServices(deps);
  const upload = await receiveUpload(req, res, { dir: services.uploadDir, limitBytes: services.uploadLimitBytes });
  try {
    const fields = importProfileFieldsSchema.parse(upload.fields);
    const profile = parseProfileField(fields.profile);
    const preview = await previewUpload(upload.path, upload.originalName, profile);
    if (!preview.valid) {
      const errors = preview.issues.map((i) => ({ field: 'file', message: `line ${i.line}, column ${i.column}: ${i.message}` }));
      throw new HttpError(400, 'Profile does not fit the sample', `The sample file read through the profile has ${errors.length} issue(s); the first: ${errors[0]?.message ?? ''}`, errors);
    }
    return { name: fields.name, description: fields.description, profile: profile as unknown as Record<string, unknown> };
  } finally {
    await upload.discard();
  }
}

async function requireNameFree(trx: Knex.Transaction, name: string, exceptId?: string): Promise<void> {
  const clash = ImportProfile.query(trx).whereRaw('lower(name) = lower(?)', [name]);
  if (exceptId) clash.whereNot('id', exceptId);
  if (await clash.first()) throw new HttpError(409, 'Already exists', 'An import profile of the lab already has this name', [{ field: 'name', message: 'An import profile of the lab already has this name' }]);
}

const audited = (p: ImportProfile) => ({ name: p.name, description: p.description, profile: p.profile, archived: p.archived });

async function saveNew(deps: AppDeps, caller: User, tried: TriedProfile): Promise<ImportProfile> {
  return deps.knex.transaction(async (trx) => {
    await requireNameFree(trx, tried.name);
    const created = await ImportProfile.query(trx).insert({ ...tried, createdBy: caller.id, archived: false }).returning('*');
    await recordAudit(trx, { actorId: caller.id, action: 'import_profile.created', entity: 'import_profile', entityId: created.id, after: audited(created) });
    return created;
  });
}

/** /api/import-profiles: the lab's saved import profiles for run files of other layouts. */
export const importProfileRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: staff,
    summary: 'The lab’s saved import profiles by name (archived ones only with `archived=true`)',
    query: importProfileListQuerySchema,
    sample: { expect: 200 },
    handler: async ({ query, res }) => {
      const builder = ImportProfile.query().orderBy('name');
      if (!query.archived) builder.where('archived', false);
      res.json((await builder).map(toSavedImportProfile));
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: staff,
    summary: 'Save an import profile (multipart `name`, `description`, `profile` JSON and a sample `file` it must read without issues)',
    sample: { expect: 400 },
    handler: async ({ req, res, deps, caller }) => {
      const tried = await tryProfileOnSample(req, res, deps);
      const created = await saveNew(deps, caller, tried);
      res.status(201).location(`/api/import-profiles/${created.id}`).json(toSavedImportProfile(created));
    },
  }),
  route({
    method: 'put',
    path: '/:id',
    access: staff,
    summary: 'Replace an import profile (same multipart fields as saving; the sample file must read without issues)',
    sample: { params: async (f) => ({ id: await sampleImportProfileId(f) }), expect: 400 },
    handler: async ({ req, res, deps, caller, params }) => {
      if (!(await ImportProfile.query().findById(params.id ?? ''))) throw HttpError.notFound('The import profile');
      const tried = await tryProfileOnSample(req, res, deps);
      const updated = await deps.knex.transaction(async (trx) => {
        const before = await ImportProfile.query(trx).findById(params.id ?? '').forUpdate();
        if (!before) throw HttpError.notFound('The import profile');
        if (before.archived) throw new HttpError(409, 'Profile archived', 'An archived import profile is kept as it was used; save a new one instead.');
        await requireNameFree(trx, tried.name, before.id);
        const after = await ImportProfile.query(trx).patchAndFetchById(before.id, tried);
        await recordAudit(trx, { actorId: caller.id, action: 'import_profile.updated', entity: 'import_profile', entityId: before.id, before: audited(before), after: audited(after) });
        return after;
      });
      res.json(toSavedImportProfile(updated));
    },
  }),
  route({
    method: 'post',
    path: '/:id/archive',
    access: staff,
    summary: 'Archive an import profile: no new uploads through it; reductions that used it keep its JSON',
    sample: { params: async (f) => ({ id: await sampleImportProfileId(f) }), expect: 200 },
    handler: async ({ res, deps, caller, params }) => {
      const archived = await deps.knex.transaction(async (trx) => {
        const before = await ImportProfile.query(trx).findById(params.id ?? '').forUpdate();
        if (!before) throw HttpError.notFound('The import profile');
        if (before.archived) return before;
        const after = await ImportProfile.query(trx).patchAndFetchById(before.id, { archived: true });
        await recordAudit(trx, { actorId: caller.id, action: 'import_profile.archived', entity: 'import_profile', entityId: before.id, before: { archived: false }, after: { archived: true } });
        return after;
      });
      res.json(toSavedImportProfile(archived));
    },
  }),
];
