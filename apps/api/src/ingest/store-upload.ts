import { createReadStream } from 'node:fs';
import type { ReductionOverrides } from '@tunnelwright/contracts';
import { RawFile, recordAudit, Reduction, type User } from '@tunnelwright/db';
import { UniqueViolationError } from 'objection';
import type { AppDeps } from '../deps';
import { HttpError } from '../errors/http-error';
import { buildReductionConfig } from './build-reduction-config';
import { requireUsableCalibration } from './calibration-check';
import { ingestServices } from './ingest-services';
import { loadRunForReduction, reducedRunKinds } from './load-run';
import { queueReduction } from './queue-reduction';
import type { ReceivedUpload } from './receive-upload';
import type { UsedImportProfile } from './saved-import-profile';

/** The same bytes are already stored for this run. */
export class DuplicateUploadError extends Error {
  constructor(readonly existing: RawFile) {
    super(`this file is already stored for the run as ${existing.id}`);
    this.name = 'DuplicateUploadError';
  }
}

/** What an accepted upload produced. */
export interface StoredUpload {
  rawFile: RawFile;
  reduction: Reduction | null;
}

/**
 * Keeps an upload of a run: refuses an overdue calibration (409) or an unreducible configuration (400)
 * before anything is kept, refuses bytes already stored for the run (`DuplicateUploadError`), puts the
 * bytes in the raw store, then writes the raw-file row, the queued reduction and its outbox message in
 * one transaction, and only after commit hands the message to the queue. With `importProfile` the
 * reduction reads the bytes through that saved profile; the stored raw file is still the bytes received.
 */
export async function storeUpload(deps: AppDeps, runId: string, upload: ReceivedUpload, overrides: ReductionOverrides, caller: User, importProfile?: UsedImportProfile): Promise<StoredUpload> {
  const run = await loadRunForReduction(runId);
  const reduce = reducedRunKinds.has(run.kind);
  const calibration = reduce ? await requireUsableCalibration(deps.knex, run.test) : undefined;
  const config = calibration ? buildReductionConfig(run.test, calibration.calibration, overrides) : undefined;

  const duplicate = await RawFile.query().findOne({ runId: run.id, sha256: upload.sha256 });
  if (duplicate) throw new DuplicateUploadError(duplicate);

  const services = ingestServices(deps);
  const stored = await services.rawStore.put(createReadStream(upload.path));
  if (stored.sha256 !== upload.sha256 || stored.size !== upload.size) {
    // The spooled file changed between receipt and storage: never record bytes we did not receive.
    throw new HttpError(500, 'Upload damaged', 'The stored bytes differ from those received; please upload again.');
  }

  let outboxId: string | undefined;
  let result: StoredUpload;
  try {
    result = await deps.knex.transaction(async (trx) => {
      const rawFile = await RawFile.query(trx)
        .insert({ runId: run.id, originalName: upload.originalName, size: stored.size, sha256: stored.sha256, storageKey: stored.key, uploadedBy: caller.id })
        .returning('*');
      await recordAudit(trx, { actorId: caller.id, action: 'run.file_uploaded', entity: 'run', entityId: run.id, after: { rawFileId: rawFile.id, originalName: rawFile.originalName, size: rawFile.size, sha256: rawFile.sha256, importProfileId: importProfile?.id ?? null } });
      if (!config || !calibration) return { rawFile, reduction: null };
      const queued = await queueReduction(trx, { runId: run.id, rawFileId: rawFile.id, inputSha256: rawFile.sha256, config, calibration, createdBy: caller.id, importProfile });
      outboxId = queued.outboxId;
      return { rawFile, reduction: queued.reduction };
    });
  } catch (error) {
    if (error instanceof UniqueViolationError) {
      // Two identical uploads raced; the other one won.
      const existing = await RawFile.query().findOne({ runId: run.id, sha256: upload.sha256 });
      if (existing) throw new DuplicateUploadError(existing);
    }
    throw error;
  }
  if (outboxId) {
    // A failure here loses nothing: the message stays undispatched and the dispatcher loop re-sends it.
    await services.dispatch([outboxId]).catch(() => undefined);
  }
  return result;
}

/**
 * Queues a new reduction version of a run's raw file (the newest unless `rawFileId` is given) with the
 * current test settings and `overrides`; earlier versions stay as they are. A raw file first reduced
 * through an import profile is read through the same recorded profile again.
 */
export async function reduceAgain(deps: AppDeps, runId: string, overrides: ReductionOverrides, rawFileId: string | undefined, caller: User): Promise<Reduction> {
  const run = await loadRunForReduction(runId);
  if (!reducedRunKinds.has(run.kind)) throw new HttpError(409, 'Run not reduced', `Runs of kind ${run.kind} are stored, not reduced.`);
  const rawFile = rawFileId
    ? await RawFile.query().findOne({ id: rawFileId, runId: run.id })
    : await RawFile.query().where('runId', run.id).orderBy('createdAt', 'desc').first();
  if (!rawFile) throw new HttpError(409, 'No raw file', 'Upload the run file before reducing it.');
  const calibration = await requireUsableCalibration(deps.knex, run.test);
  const config = buildReductionConfig(run.test, calibration.calibration, overrides);
  const first = await Reduction.query().where('rawFileId', rawFile.id).orderBy('version').first();
  const importProfile = first?.config['importProfile'] as UsedImportProfile | undefined;
  const queued = await deps.knex.transaction(async (trx) => {
    const q = await queueReduction(trx, { runId: run.id, rawFileId: rawFile.id, inputSha256: rawFile.sha256, config, calibration, createdBy: caller.id, importProfile });
    await recordAudit(trx, { actorId: caller.id, action: 'run.reduced_again', entity: 'run', entityId: run.id, after: { reductionId: q.reduction.id, version: q.reduction.version, overrides } });
    return q;
  });
  // As for uploads: an undispatched message is re-sent by the dispatcher loop.
  await ingestServices(deps)
    .dispatch([queued.outboxId])
    .catch(() => undefined);
  return queued.reduction;
}
