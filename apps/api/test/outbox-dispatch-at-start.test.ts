import { OutboxMessage, Reduction, reductionQueue } from '@tunnelwright/db';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HEADER, validRows } from '../../../scripts/make-bad-run-files';
import { ingestServices } from '../src/ingest/ingest-services';
import { queueReduction } from '../src/ingest/queue-reduction';
import { startApi, type RunningApi } from '../src/start-api';
import { createIngestWorld, type IngestWorld } from './support/ingest-world';

const runFile = (points: number, samples: number) => Buffer.from(`# note: outbox at start\n${HEADER}\n${validRows(points, samples).join('\n')}\n`);

describe('API start-up dispatches the outbox', () => {
  // No worker: the jobs stay in the queue, where the test can look at them.
  let w: IngestWorld;
  let api: RunningApi | undefined;

  beforeAll(async () => {
    w = await createIngestWorld({ startWorker: false });
  });
  afterAll(async () => {
    await api?.close();
    await w?.close();
  });

  it('a reduction committed but never enqueued (API died in between) is enqueued when the API starts, once however often it is sent', async () => {
    const queue = ingestServices(w.t.deps).reductionQueue;
    const runId = await w.newRun();
    const upload = await w.upload(runId, runFile(2, 3), 'outbox-start.csv');
    expect(upload.status, JSON.stringify(upload.body)).toBe(202);
    const base = await Reduction.query(w.t.knex).findById(upload.body.reduction.id as string);

    // The upload's commit without its enqueue: what is left when the process dies between the two.
    const orphan = await w.t.knex.transaction((trx) =>
      queueReduction(trx, { runId, rawFileId: base?.rawFileId ?? '', inputSha256: base?.inputSha256 ?? '', config: base?.config as never, calibration: { calibration: undefined, overrideId: null }, createdBy: w.analyst.id }),
    );
    expect((await OutboxMessage.query(w.t.knex).findById(orphan.outboxId))?.dispatchedAt).toBeNull();
    expect(await queue.getJob(orphan.reduction.id)).toBeUndefined();

    api = await startApi(w.t.deps, { port: 0, host: '127.0.0.1', dispatchEveryMs: 200 });

    const job = await queue.getJob(orphan.reduction.id);
    expect(job?.name).toBe(reductionQueue.jobName);
    expect(job?.data).toEqual({ reductionId: orphan.reduction.id });
    expect(job?.opts.attempts).toBe(reductionQueue.jobOptions.attempts);
    expect((await OutboxMessage.query(w.t.knex).findById(orphan.outboxId))?.dispatchedAt).not.toBeNull();
    expect(await queue.getJobCounts('waiting')).toEqual({ waiting: 2 });
    // It listens too: an unauthenticated call is refused, not left hanging.
    expect((await fetch(`http://127.0.0.1:${api.port}/api/reductions/${orphan.reduction.id}`)).status).toBe(401);

    // A crash after the enqueue but before the row was marked: the periodic round sends it again, and the
    // job id (the reduction id) keeps it one job.
    await OutboxMessage.query(w.t.knex).patch({ dispatchedAt: null }).where('id', orphan.outboxId);
    const deadline = Date.now() + 10_000;
    while ((await OutboxMessage.query(w.t.knex).findById(orphan.outboxId))?.dispatchedAt === null) {
      if (Date.now() > deadline) throw new Error('the periodic round did not send the message again');
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    expect(await queue.getJobCounts('waiting')).toEqual({ waiting: 2 });
    expect((await queue.getJobs(['waiting'])).map((j) => j.id).sort()).toEqual([upload.body.reduction.id, orphan.reduction.id].sort());
  });
});
