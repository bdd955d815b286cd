import { ENGINE_VERSION, type ReductionConfig } from '@tunnelwright/aero';
import { OutboxMessage, Reduction, reductionOutboxQueue, reductionQueue, Run } from '@tunnelwright/db';
import type { Knex } from 'knex';
import type { CalibrationUse } from './calibration-check';
import type { UsedImportProfile } from './saved-import-profile';

/** What a new reduction version is made of. */
export interface NewReduction {
  runId: string;
  rawFileId: string;
  inputSha256: string;
  config: ReductionConfig;
  calibration: CalibrationUse;
  createdBy: string;
  /** The saved import profile the raw file is read through, recorded in the config as `importProfile`. */
  importProfile?: UsedImportProfile;
}

/**
 * Inside `trx`: adds the next reduction version of the run (state queued) and the outbox message that
 * will start it. A saved import profile goes into the stored configuration (id, name and the whole
 * profile JSON), so the version reads its raw bytes the same way whenever it is run. The run row is locked so two requests never take the same version number.
 * @returns the reduction and the outbox message id to dispatch after commit
 */
export async function queueReduction(trx: Knex.Transaction, input: NewReduction): Promise<{ reduction: Reduction; outboxId: string }> {
  await Run.query(trx).findById(input.runId).forUpdate();
  const latest = (await Reduction.query(trx).where('runId', input.runId).max('version as version').first()) as unknown as { version: number | null } | undefined;
  const reduction = await Reduction.query(trx)
    .insert({
      runId: input.runId,
      rawFileId: input.rawFileId,
      version: (latest?.version ?? 0) + 1,
      engineVersion: ENGINE_VERSION,
      config: { ...(input.config as unknown as Record<string, unknown>), ...(input.importProfile ? { importProfile: input.importProfile } : {}) },
      calibrationId: input.calibration.calibration?.id ?? null,
      overrideId: input.calibration.overrideId,
      state: 'queued',
      progress: 0,
      inputSha256: input.inputSha256,
      warnings: [],
      summary: null,
      createdBy: input.createdBy,
    })
    .returning('*');
  const message = await OutboxMessage.query(trx)
    .insert({ queue: reductionOutboxQueue(), jobName: reductionQueue.jobName, jobId: reduction.id, payload: { reductionId: reduction.id } })
    .returning('*');
  return { reduction, outboxId: message.id };
}
