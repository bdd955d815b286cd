import { parseReductionConfig, reduceRun } from '@tunnelwright/aero';
import { RawFile, Reduction, Run } from '@tunnelwright/db';
import { storeEngineReduction } from './engine-reduction-samples';
import { sampleRunFile, sampleRunId } from './ingest-samples';
import type { SampleFixtures } from './route';

/** An invented closed section and 1:4 model, enough for the engine to reduce the sample run file. */
const sampleConfig = {
  tunnel: { kind: 'closed', sectionArea: 2.9 },
  article: { referenceArea: 0.14, referenceAreaKind: 'frontal', referenceLength: 0.7, scale: 4 },
  minimumSamplesPerPoint: 2,
};

/**
 * A reduction of the sample run file by the real engine, stored as the worker stores one (key columns and the
 * whole per-point result), so the review routes of the role matrix read genuine engine output.
 */
export async function sampleEngineReductionId(f: SampleFixtures): Promise<string> {
  const runId = await sampleRunId(f);
  const run = await Run.query().findById(runId);
  const rawFile = await RawFile.query().findOne({ runId });
  if (!run || !rawFile) throw new Error('sample run missing');
  const config = parseReductionConfig(sampleConfig, 'sample configuration');
  const result = await reduceRun([Buffer.from(sampleRunFile)], config, { fileName: rawFile.originalName });
  const reduction = await storeEngineReduction({ runId, rawFileId: rawFile.id, inputSha256: rawFile.sha256, createdBy: run.createdBy }, result);
  return reduction.id;
}

/** The test of a sample engine reduction. */
export async function sampleReviewTestId(f: SampleFixtures): Promise<string> {
  const reduction = await Reduction.query().findById(await sampleEngineReductionId(f));
  const run = reduction && (await Run.query().findById(reduction.runId));
  if (!run) throw new Error('sample reduction missing');
  return run.testId;
}
