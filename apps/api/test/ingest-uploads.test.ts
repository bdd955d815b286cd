import { AuditEntry, OutboxMessage, RawFile, Reduction, ReductionPoint } from '@tunnelwright/db';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HEADER, validRows } from '../../../scripts/make-bad-run-files';
import { queueReduction } from '../src/ingest/queue-reduction';
import { createIngestWorld, sha256, type IngestWorld } from './support/ingest-world';

const fileOf = (points: number, samples: number, note = '') => Buffer.from(`# note: ${note}\n${HEADER}\n${validRows(points, samples).join('\n')}\n`);

describe('ingest: uploads, versions and the outbox', () => {
  let w: IngestWorld;
  const auth = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    w = await createIngestWorld();
  });
  afterAll(() => w?.close());

  describe('POST /api/runs/:runId/files', () => {
    it('202: stores the file, queues version 1, and the points become queryable', async () => {
      const runId = await w.newRun();
      const bytes = fileOf(5, 4, 'first');
      const response = await w.upload(runId, bytes, 'run-1.csv');
      expect(response.status, JSON.stringify(response.body)).toBe(202);
      expect(response.body.rawFile).toMatchObject({ sha256: sha256(bytes), size: bytes.length, originalName: 'run-1.csv' });
      expect(response.body.reduction).toMatchObject({ version: 1, state: 'queued' });
      expect(response.body.reduction.caution).toMatch(/not design loads/);
      await w.settle(response.body.reduction.id);
      const points = await request(w.t.app).get(`/api/reductions/${response.body.reduction.id}/points`).set(auth(w.analyst.token));
      expect(points.status).toBe(200);
      expect(points.body.total).toBe(5);
      expect(points.body.items.map((p: { pointNumber: number }) => p.pointNumber)).toEqual([1, 2, 3, 4, 5]);
      expect(points.body.items[0].cdCorrected).toEqual(expect.any(Number));
    });

    it('409: the same file twice on one run links to the stored one and keeps one row', async () => {
      const runId = await w.newRun();
      const bytes = fileOf(2, 3, 'twice');
      expect((await w.upload(runId, bytes, 'a.csv')).status).toBe(202);
      const again = await w.upload(runId, bytes, 'renamed.csv');
      expect(again.status).toBe(409);
      expect(again.headers['content-type']).toMatch(/application\/problem\+json/);
      expect(again.body.existing).toMatchObject({ originalName: 'a.csv', sha256: sha256(bytes) });
      expect(again.headers.link).toContain(`/api/runs/${runId}/raw?fileId=${again.body.existing.id}`);
      expect(await RawFile.query(w.t.knex).where('runId', runId).resultSize()).toBe(1);
      expect(await Reduction.query(w.t.knex).where('runId', runId).resultSize()).toBe(1);
    });

    it('two uploads at once to different runs both land, each with its own points', async () => {
      const [runA, runB] = [await w.newRun(), await w.newRun()];
      const [a, b] = await Promise.all([w.upload(runA, fileOf(3, 5, 'A'), 'a.csv'), w.upload(runB, fileOf(4, 5, 'B'), 'b.csv')]);
      expect([a.status, b.status]).toEqual([202, 202]);
      const [ra, rb] = await Promise.all([w.settle(a.body.reduction.id), w.settle(b.body.reduction.id)]);
      expect([ra.state, rb.state]).toEqual(['done', 'done']);
      expect(await ReductionPoint.query(w.t.knex).where('reductionId', ra.id).resultSize()).toBe(3);
      expect(await ReductionPoint.query(w.t.knex).where('reductionId', rb.id).resultSize()).toBe(4);
    });

    it('400: a request without a file part', async () => {
      const runId = await w.newRun();
      const response = await request(w.t.app).post(`/api/runs/${runId}/files`).set(auth(w.technician.token)).field('overrides', '{}');
      expect(response.status).toBe(400);
      expect(response.body.errors).toEqual([{ field: 'file', message: expect.stringContaining('"file"') }]);
    });

    it('404: an unknown run, 403 for a customer', async () => {
      expect((await w.upload('00000000-0000-4000-8000-000000000000', fileOf(1, 2), 'x.csv')).status).toBe(404);
      expect((await w.upload(await w.newRun(), fileOf(1, 2), 'x.csv', w.customer)).status).toBe(403);
    });
  });

  describe('overdue balance calibration', () => {
    it('409 until a lab manager records an override with a reason (audited), then 202', async () => {
      const testId = await w.newTest({ overdue: true });
      const runId = await w.newRun(testId);
      const bytes = fileOf(2, 3, 'overdue');
      const refused = await w.upload(runId, bytes, 'late.csv');
      expect(refused.status).toBe(409);
      expect(refused.body.detail).toMatch(/was due on 2025-07-10.*override with a reason/);
      expect(await RawFile.query(w.t.knex).where('runId', runId).resultSize()).toBe(0);

      const short = await request(w.t.app).post(`/api/tests/${testId}/calibration-overrides`).set(auth(w.labManager.token)).send({ reason: 'ok' });
      expect(short.status).toBe(400);
      const analyst = await request(w.t.app).post(`/api/tests/${testId}/calibration-overrides`).set(auth(w.analyst.token)).send({ reason: 'Check loading on 2026-11-28 agreed within 0.1 %' });
      expect(analyst.status).toBe(403);
      const granted = await request(w.t.app).post(`/api/tests/${testId}/calibration-overrides`).set(auth(w.labManager.token)).send({ reason: 'Check loading on 2026-11-28 agreed within 0.1 %' });
      expect(granted.status).toBe(201);
      const audit = await AuditEntry.query(w.t.knex).where({ action: 'calibration.overridden', entityId: testId });
      expect(audit).toHaveLength(1);
      expect(audit[0]?.actorId).toBe(w.labManager.id);

      const accepted = await w.upload(runId, bytes, 'late.csv');
      expect(accepted.status).toBe(202);
      expect((await w.settle(accepted.body.reduction.id)).state).toBe('done');
    });
  });

  describe('GET /api/tests/:id calibration state', () => {
    it('staff see the overdue version and then the override on record; customers get the test without either', async () => {
      const testId = await w.newTest({ overdue: true });
      const before = await request(w.t.app).get(`/api/tests/${testId}`).set(auth(w.technician.token));
      expect(before.status).toBe(200);
      expect(before.body.calibration).toMatchObject({ balanceIdentifier: expect.stringMatching(/^IB-/), calibration: { version: 1, calibratedOn: '2025-01-10', dueOn: '2025-07-10', overdue: true }, override: null });

      const reason = 'Check loading on 2026-11-28 agreed within 0.1 %';
      const granted = await request(w.t.app).post(`/api/tests/${testId}/calibration-overrides`).set(auth(w.labManager.token)).send({ reason });
      expect(granted.status).toBe(201);
      const after = await request(w.t.app).get(`/api/tests/${testId}`).set(auth(w.analyst.token));
      expect(after.body.calibration.calibration.overdue).toBe(true);
      expect(after.body.calibration.override).toMatchObject({ id: granted.body.id, reason, grantedBy: w.labManager.id, grantedByName: expect.any(String), calibrationId: after.body.calibration.calibration.id });

      const customer = await request(w.t.app).get(`/api/tests/${testId}`).set(auth(w.customer.token));
      expect(customer.status).toBe(200);
      expect(customer.body).not.toHaveProperty('calibration');
    });

    it('a current calibration is not overdue and needs no override', async () => {
      const testId = await w.newTest();
      const response = await request(w.t.app).get(`/api/tests/${testId}`).set(auth(w.labManager.token));
      expect(response.body.calibration).toMatchObject({ calibration: { dueOn: '2099-01-10', overdue: false }, override: null });
    });
  });

  describe('POST /api/runs/:id/reductions and compare', () => {
    it('a new version with other corrections; the old one is kept; compare gives the drag-count difference per point', async () => {
      const runId = await w.newRun();
      const first = await w.upload(runId, fileOf(3, 4, 'versions'), 'v.csv');
      await w.settle(first.body.reduction.id);
      const technician = await request(w.t.app).post(`/api/runs/${runId}/reductions`).set(auth(w.technician.token)).send({ corrections: { solidBlockage: 'none' } });
      expect(technician.status).toBe(403);
      const again = await request(w.t.app).post(`/api/runs/${runId}/reductions`).set(auth(w.analyst.token)).send({ corrections: { solidBlockage: 'none' }, densityModel: 'ideal-gas-buck', referenceArea: 0.15 });
      expect(again.status, JSON.stringify(again.body)).toBe(202);
      expect(again.body.version).toBe(2);
      expect(again.body.config.article.referenceArea).toBe(0.15);
      expect(again.body.config.densityModel).toBe('ideal-gas-buck');
      await w.settle(again.body.id);

      const versions = await request(w.t.app).get(`/api/runs/${runId}/reductions`).set(auth(w.analyst.token));
      expect(versions.body.map((r: { version: number; state: string }) => [r.version, r.state])).toEqual([
        [2, 'done'],
        [1, 'done'],
      ]);
      const compare = await request(w.t.app).get(`/api/runs/${runId}/reductions/compare`).query({ from: 1, to: 2 }).set(auth(w.analyst.token));
      expect(compare.status).toBe(200);
      expect(compare.body.rows).toHaveLength(3);
      for (const row of compare.body.rows) {
        expect(row.differenceDragCounts).toBeCloseTo(row.toDragCounts - row.fromDragCounts, 9);
        // A larger reference area and no blockage correction both lower C_D.
        expect(row.differenceDragCounts).toBeLessThan(0);
      }
      const missing = await request(w.t.app).get(`/api/runs/${runId}/reductions/compare`).query({ from: 1, to: 9 }).set(auth(w.analyst.token));
      expect(missing.status).toBe(404);
    });

    it('accepts Thom blockage with buoyancy (the fixture has a shape factor and a volume); 400 naming the field for a negative reference area', async () => {
      const runId = await w.newRun();
      await w.upload(runId, fileOf(2, 3, 'thom'), 't.csv');
      const bad = await request(w.t.app).post(`/api/runs/${runId}/reductions`).set(auth(w.analyst.token)).send({ corrections: { solidBlockage: 'thom', horizontalBuoyancy: true } });
      expect(bad.status).toBe(202);
      const invalid = await request(w.t.app).post(`/api/runs/${runId}/reductions`).set(auth(w.analyst.token)).send({ referenceArea: -1 });
      expect(invalid.status).toBe(400);
      expect(invalid.body.errors[0].field).toBe('referenceArea');
    });
  });

  describe('GET /api/reductions/:id/events', () => {
    it('streams progress and ends when the reduction is done', async () => {
      const runId = await w.newRun();
      const upload = await w.upload(runId, fileOf(4, 50, 'events'), 'e.csv');
      const response = await request(w.t.app).get(`/api/reductions/${upload.body.reduction.id}/events`).set(auth(w.analyst.token)).buffer(true);
      expect(response.status).toBe(200);
      expect(response.headers['content-type']).toMatch(/text\/event-stream/);
      expect(response.text).toMatch(/event: progress/);
      expect(response.text).toMatch(/event: end\ndata: {"state":"done"}/);
    });
  });

  describe('POST /api/runs/preview', () => {
    it('shows the header and first rows of a good file, and every issue of a bad one, keeping nothing', async () => {
      const good = await request(w.t.app).post('/api/runs/preview').set(auth(w.technician.token)).attach('file', fileOf(3, 30, 'preview'), 'p.csv');
      expect(good.status).toBe(200);
      expect(good.body).toMatchObject({ valid: true, sampleCount: 90, pointCount: 3, issues: [] });
      expect(good.body.firstSamples).toHaveLength(20);
      expect(good.body.header.columns).toHaveLength(14);
      const bad = await request(w.t.app).post('/api/runs/preview').set(auth(w.technician.token)).attach('file', Buffer.from(`${HEADER}\n1, 2\n`), 'bad.csv');
      expect(bad.body.valid).toBe(false);
      expect(bad.body.issues[0]).toMatchObject({ code: 'RAGGED_ROW', line: 2, fileName: 'bad.csv' });
    });

    it('tries an import profile: a semicolon file with decimal commas reads once the profile says so', async () => {
      const semi = Buffer.from(`${HEADER.replaceAll(', ', ';')}\n${validRows(2, 3).map((row) => row.replaceAll(', ', ';').replaceAll('.', ',')).join('\n')}\n`);
      const without = await request(w.t.app).post('/api/runs/preview').set(auth(w.technician.token)).attach('file', semi, 'semi.csv');
      expect(without.body.issues[0]).toMatchObject({ code: 'DECIMAL_COMMA', line: 2 });
      const profile = JSON.stringify({ name: 'semicolon, decimal comma', delimiter: ';', decimalComma: true });
      const withProfile = await request(w.t.app).post('/api/runs/preview').set(auth(w.technician.token)).field('profile', profile).attach('file', semi, 'semi.csv');
      expect(withProfile.status, JSON.stringify(withProfile.body)).toBe(200);
      expect(withProfile.body).toMatchObject({ valid: true, sampleCount: 6, pointCount: 2 });
      const broken = await request(w.t.app).post('/api/runs/preview').set(auth(w.technician.token)).field('profile', '{"delimiter":","').attach('file', semi, 'semi.csv');
      expect(broken.status).toBe(400);
      expect(broken.body.errors[0].field).toBe('profile');
    });
  });

  describe('raw files are immutable', () => {
    it('the database refuses to change the hash or storage key, or to delete the row', async () => {
      const runId = await w.newRun();
      await w.upload(runId, fileOf(1, 3, 'immutable'), 'i.csv');
      const row = await RawFile.query(w.t.knex).findOne({ runId });
      await expect(w.t.knex('raw_files').where('id', row?.id).update({ sha256: 'f'.repeat(64) })).rejects.toThrow(/immutable/);
      await expect(w.t.knex('raw_files').where('id', row?.id).update({ storageKey: 'elsewhere' })).rejects.toThrow(/immutable/);
      await expect(w.t.knex('raw_files').where('id', row?.id).delete()).rejects.toThrow(/immutable/);
      await w.t.knex('raw_files').where('id', row?.id).update({ originalName: 'renamed.csv' });
      expect((await RawFile.query(w.t.knex).findById(row?.id ?? ''))?.sha256).toBe(row?.sha256);
    });
  });

  describe('the outbox', () => {
    it('a reduction committed but never enqueued (crash in between) is sent by the dispatcher loop and reduced', async () => {
      const runId = await w.newRun();
      const first = await w.upload(runId, fileOf(2, 3, 'outbox'), 'o.csv');
      await w.settle(first.body.reduction.id);
      const base = await Reduction.query(w.t.knex).findById(first.body.reduction.id);
      const orphan = await w.t.knex.transaction((trx) =>
        queueReduction(trx, { runId, rawFileId: base?.rawFileId ?? '', inputSha256: base?.inputSha256 ?? '', config: base?.config as never, calibration: { calibration: undefined, overrideId: null }, createdBy: w.analyst.id }),
      );
      expect((await OutboxMessage.query(w.t.knex).findById(orphan.outboxId))?.dispatchedAt).toBeNull();
      const settled = await w.settle(orphan.reduction.id, 20_000);
      expect(settled.state).toBe('done');
      expect((await OutboxMessage.query(w.t.knex).findById(orphan.outboxId))?.dispatchedAt).not.toBeNull();
      expect(await ReductionPoint.query(w.t.knex).where('reductionId', orphan.reduction.id).resultSize()).toBe(2);
    });
  });
});
