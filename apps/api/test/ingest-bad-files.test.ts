import { readdirSync } from 'node:fs';
import { OutboxMessage, RawFile, Reduction, ReductionPoint } from '@tunnelwright/db';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { badRunFiles } from '../../../scripts/make-bad-run-files';
import { createIngestWorld, sha256, type IngestWorld } from './support/ingest-world';

const limitBytes = 1024 * 1024;
const corpus = badRunFiles(limitBytes);

describe('POST /api/runs/:runId/files with the bad-file corpus', () => {
  let w: IngestWorld;
  let testId: string;

  beforeAll(async () => {
    w = await createIngestWorld({ uploadLimitBytes: limitBytes });
    testId = await w.newTest();
  });
  afterAll(() => w?.close());

  it('has at least 40 files', () => {
    expect(corpus.length).toBeGreaterThanOrEqual(40);
  });

  for (const file of corpus) {
    const x = file.expect;
    const what = x.outcome === 'failed' ? `fails with ${x.code} at ${x.line}:${x.column}` : x.outcome === 'reduced' ? `is reduced${x.warnings.length ? ` with ${x.warnings.join(', ')}` : ''}` : `is refused with ${x.status}`;
    it(`${file.name} ${what}`, async () => {
      const runId = await w.newRun(testId);
      const response = await w.upload(runId, file.bytes, file.name);

      if (x.outcome === 'refused') {
        expect(response.status, JSON.stringify(response.body)).toBe(x.status);
        expect(response.headers['content-type']).toMatch(/application\/problem\+json/);
        expect(response.body.detail).toContain(String(limitBytes));
        expect(await RawFile.query(w.t.knex).where('runId', runId).resultSize()).toBe(0);
        expect(await Reduction.query(w.t.knex).where('runId', runId).resultSize()).toBe(0);
        expect(readdirSync(w.uploadDir)).toEqual([]);
        return;
      }

      expect(response.status, JSON.stringify(response.body)).toBe(202);
      const reductionId: string = response.body.reduction.id;
      const reduction = await w.settle(reductionId);
      const points = await ReductionPoint.query(w.t.knex).where('reductionId', reductionId).resultSize();
      if (x.outcome === 'failed') {
        expect({ state: reduction.state, code: reduction.errorCode, line: reduction.errorLine, column: reduction.errorColumn }).toEqual({ state: 'failed', code: x.code, line: x.line, column: x.column });
        expect(reduction.errorMessage).toContain(`${file.name}:${x.line}:${x.column}`);
        expect(points).toBe(0);
        const shown = await request(w.t.app).get(`/api/reductions/${reductionId}`).set('Authorization', `Bearer ${w.analyst.token}`);
        expect(shown.body.error).toMatchObject({ code: x.code, line: x.line, column: x.column });
      } else {
        expect(reduction.state, reduction.errorMessage ?? '').toBe('done');
        expect(points).toBeGreaterThan(0);
        expect([...new Set((reduction.warnings as { code: string }[]).map((warning) => warning.code))].sort()).toEqual([...x.warnings].sort());
      }

      // Exactly one raw file, one reduction and one dispatched outbox message: nothing half-written.
      const rawFiles = await RawFile.query(w.t.knex).where('runId', runId);
      expect(rawFiles).toHaveLength(1);
      expect(await Reduction.query(w.t.knex).where('runId', runId).resultSize()).toBe(1);
      const outbox = await OutboxMessage.query(w.t.knex).where('jobId', reductionId);
      expect(outbox).toHaveLength(1);
      expect(outbox[0]?.dispatchedAt).not.toBeNull();

      // The stored bytes are exactly the uploaded ones.
      expect(rawFiles[0]?.sha256).toBe(sha256(file.bytes));
      expect(rawFiles[0]?.size).toBe(file.bytes.length);
      const download = await request(w.t.app).get(`/api/runs/${runId}/raw`).set('Authorization', `Bearer ${w.technician.token}`).buffer(true).parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
      expect(download.status).toBe(200);
      expect(sha256(download.body as Buffer)).toBe(sha256(file.bytes));
      expect(download.headers['x-content-sha256']).toBe(sha256(file.bytes));
    });
  }
});
