import { createHash } from 'node:crypto';
import { createReadStream, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { RawFile } from '@tunnelwright/db';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeLargeRunFile, type LargeRunFile } from '../../../scripts/make-large-run-file';
import { createIngestWorld, type IngestWorld } from './support/ingest-world';

async function sha256Of(path: string): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of createReadStream(path)) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

describe('ingest: a 1,000,000-row run file end to end', () => {
  let w: IngestWorld;
  let work: string;
  let file: LargeRunFile;
  const auth = () => ({ Authorization: `Bearer ${w.analyst.token}` });

  beforeAll(async () => {
    work = mkdtempSync(join(tmpdir(), 'tw-million-'));
    [w, file] = await Promise.all([createIngestWorld(), writeLargeRunFile(join(work, 'run-million.csv'), 1_000_000, 1000)]);
  }, 60_000);
  afterAll(async () => {
    await w?.close();
    rmSync(work, { recursive: true, force: true });
  });

  it('uploads, is reduced by the worker to exactly one point per 1000 rows, each once, raw bytes unchanged', async () => {
    const runId = await w.newRun();
    const expectedSha256 = await sha256Of(file.path);
    const response = await request(w.t.app).post(`/api/runs/${runId}/files`).set('Authorization', `Bearer ${w.technician.token}`).attach('file', file.path, 'run-million.csv');
    expect(response.status, JSON.stringify(response.body)).toBe(202);
    expect(response.body.rawFile).toMatchObject({ size: file.bytes, sha256: expectedSha256 });

    const reduction = await w.settle(response.body.reduction.id, 50_000);
    expect(reduction.state, reduction.errorMessage ?? '').toBe('done');
    expect(reduction.inputSha256).toBe(expectedSha256);

    const view = await request(w.t.app).get(`/api/reductions/${reduction.id}`).set(auth());
    expect(view.body).toMatchObject({ state: 'done', pointCount: file.points });
    expect(file.points).toBe(1000);

    const page = await request(w.t.app).get(`/api/reductions/${reduction.id}/points?limit=1000`).set(auth());
    expect(page.status).toBe(200);
    expect(page.body.total).toBe(1000);
    const numbers = page.body.items.map((p: { pointNumber: number }) => p.pointNumber);
    expect(numbers).toEqual(Array.from({ length: 1000 }, (_, i) => i + 1));
    expect(page.body.items.every((p: { sampleCount: number }) => p.sampleCount === 1000)).toBe(true);

    const counts = await w.t.knex('reduction_points').where('reduction_id', reduction.id).select(w.t.knex.raw('count(*)::int as rows, count(distinct point_number)::int as points')).first();
    expect(counts).toEqual({ rows: 1000, points: 1000 });

    const rawFile = await RawFile.query(w.t.knex).findById(response.body.rawFile.id);
    expect(rawFile?.sha256).toBe(expectedSha256);
    const raw = await request(w.t.app)
      .get(`/api/runs/${runId}/raw`)
      .set(auth())
      .buffer(true)
      .parse((res, done) => {
        const hash = createHash('sha256');
        res.on('data', (c: Buffer) => hash.update(c));
        res.on('end', () => done(null, hash.digest('hex')));
      });
    expect(raw.headers['x-content-sha256']).toBe(expectedSha256);
    expect(raw.body).toBe(expectedSha256);
  }, 60_000);
});
