import { applyImportProfile, parseImportProfile, parseReductionConfig, reduceRun, ReductionConfigError, ReductionError, RunFileError, type PointResult, type ReductionResult } from '@tunnelwright/aero';
import { RawFile, RawObjectMissingError, Reduction, type RawStore } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { createHash, type Hash } from 'node:crypto';
import { recordFailure, type ReductionFailure } from './record-failure';

/** How often progress is written to the reduction row and the job, ms. */
const progressEveryMs = 250;
/**
 * Points inserted per statement. A point's row holds its whole result as JSON (about 10 kB), and rows are
 * made one statement at a time, so this bounds the memory the write needs whatever the number of points.
 */
const pointBatch = 100;

/** What one attempt at a reduction ended with. */
export type ReductionOutcome = { kind: 'done'; points: number } | { kind: 'skipped'; state: string } | { kind: 'failed'; failure: ReductionFailure };

/** Maps an error of bad input to the failure recorded on the reduction; anything else is transient (undefined). */
export function failureOf(error: unknown): ReductionFailure | undefined {
  if (error instanceof RunFileError) {
    const first = error.issues[0];
    return { code: first?.code ?? 'INVALID_FILE', message: error.message, line: first?.line ?? null, column: first?.column ?? null, issues: error.issues };
  }
  if (error instanceof ReductionError) return { code: error.code, message: error.message, line: error.line, column: error.column };
  if (error instanceof ReductionConfigError) return { code: error.code, message: error.message, line: null, column: null, issues: error.issues };
  if (error instanceof RawObjectMissingError) return { code: 'RAW_FILE_MISSING', message: error.message, line: null, column: null };
  return undefined;
}

function numberOrNull(value: number | undefined): number | null {
  return value === undefined || !Number.isFinite(value) ? null : value;
}

/** The row of one point: key figures as columns, the whole engine result as JSON. */
function pointRow(reductionId: string, index: number, p: PointResult) {
  return {
    reductionId,
    index,
    pointNumber: p.point,
    sampleCount: p.sampleCount,
    yaw: p.yaw,
    pitch: p.pitch,
    dynamicPressure: numberOrNull(p.correctedDynamicPressure),
    speed: numberOrNull(p.correctedSpeed),
    reynoldsNumber: numberOrNull(p.reynoldsNumber),
    cdUncorrected: numberOrNull(p.uncorrected.dragCoefficient.value),
    cdCorrected: numberOrNull(p.corrected.dragCoefficient.value),
    clCorrected: numberOrNull(p.corrected.liftCoefficient.value),
    csCorrected: numberOrNull(p.corrected.sideForceCoefficient.value),
    dragCounts: numberOrNull(p.dragCounts),
    setpoints: JSON.stringify({ yaw: p.yaw, pitch: p.pitch }),
    result: JSON.stringify(p),
  };
}

/** Passes the raw bytes on unchanged while hashing them, so the hash is of the stored bytes, not of a rewrite. */
async function* hashingRaw(input: AsyncIterable<Buffer | string>, hash: Hash): AsyncGenerator<Buffer | string> {
  for await (const chunk of input) {
    hash.update(chunk);
    yield chunk;
  }
}

/** Writes every point and marks the reduction done, in one transaction; a retry after a crash inserts nothing twice. */
async function saveResult(knex: Knex, reduction: Reduction, result: ReductionResult): Promise<number> {
  return knex.transaction(async (trx) => {
    for (let i = 0; i < result.points.length; i += pointBatch) {
      const rows = result.points.slice(i, i + pointBatch).map((p, j) => pointRow(reduction.id, i + j, p));
      await trx('reduction_points').insert(rows).onConflict(['reductionId', 'index']).ignore();
    }
    const { points: _points, config: _config, ...summary } = result;
    await Reduction.query(trx)
      .patch({ state: 'done', progress: 1, engineVersion: result.engineVersion, warnings: result.warnings, summary: summary as unknown as Record<string, unknown>, finishedAt: new Date(), errorCode: null, errorMessage: null, errorLine: null, errorColumn: null })
      .where('id', reduction.id);
    return result.points.length;
  });
}

/**
 * Runs one reduction: streams its raw file from the store through the engine, reporting progress, then
 * writes the points and the result in one transaction. Idempotent: a reduction already done or failed for
 * bad input is left alone. Bad input is recorded on the reduction and returned as `failed`; any other
 * error is thrown, so the queue retries it.
 *
 * @param report called with the fraction 0–1 read so far, at most every 250 ms
 */
export async function runReduction(knex: Knex, store: RawStore, reductionId: string, report: (fraction: number) => Promise<void> | void): Promise<ReductionOutcome> {
  const reduction = await Reduction.query(knex).findById(reductionId);
  if (!reduction) return { kind: 'failed', failure: { code: 'REDUCTION_MISSING', message: `reduction ${reductionId} does not exist`, line: null, column: null } };
  if (reduction.state === 'done' || reduction.state === 'failed') return { kind: 'skipped', state: reduction.state };
  const rawFile = await RawFile.query(knex).findById(reduction.rawFileId);
  if (!rawFile) return { kind: 'failed', failure: { code: 'RAW_FILE_MISSING', message: `raw file ${reduction.rawFileId} is not recorded`, line: null, column: null } };

  await Reduction.query(knex).patch({ state: 'running', startedAt: reduction.startedAt ?? new Date() }).where('id', reduction.id);
  let lastReport = 0;
  let pending: Promise<unknown> = Promise.resolve();
  const onProgress = (bytesRead: number) => {
    const now = Date.now();
    if (now - lastReport < progressEveryMs) return;
    lastReport = now;
    // The row never claims completion before the points are written.
    const fraction = Math.min(0.99, rawFile.size > 0 ? bytesRead / rawFile.size : 0);
    pending = pending.then(() => Promise.all([Reduction.query(knex).patch({ progress: fraction }).where('id', reduction.id).where('state', 'running'), report(fraction)])).catch(() => undefined);
  };
  try {
    // A saved import profile recorded at upload is not part of the engine's configuration: it says how
    // the raw bytes are read, and the engine then sees the canonical text it writes.
    const { importProfile, ...engineConfig } = reduction.config as { importProfile?: { profile: unknown } };
    const config = parseReductionConfig(engineConfig, `reduction ${reduction.version} configuration`);
    const raw = await store.get(rawFile.storageKey);
    const rawHash = createHash('sha256');
    const input = importProfile ? applyImportProfile(hashingRaw(raw as AsyncIterable<Buffer>, rawHash), parseImportProfile(importProfile.profile), rawFile.originalName) : raw;
    const result = await reduceRun(input, config, { fileName: rawFile.originalName, onProgress });
    await pending;
    const rawSha256 = importProfile ? rawHash.digest('hex') : result.inputSha256;
    if (rawSha256 !== rawFile.sha256) {
      const failure = { code: 'RAW_FILE_CHANGED', message: `the stored bytes hash to ${rawSha256}, not ${rawFile.sha256} as recorded at upload`, line: null, column: null };
      await recordFailure(knex, reduction.id, failure);
      return { kind: 'failed', failure };
    }
    const points = await saveResult(knex, reduction, { ...result, inputSha256: rawSha256 });
    await report(1);
    return { kind: 'done', points };
  } catch (error) {
    await pending;
    const failure = failureOf(error);
    if (!failure) throw error;
    await recordFailure(knex, reduction.id, failure);
    return { kind: 'failed', failure };
  }
}
