import { AuditEntry, ImportProfile, ReductionPoint } from '@tunnelwright/db';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HEADER, validRows } from '../../../scripts/make-bad-run-files';
import { createIngestWorld, sha256, type IngestWorld } from './support/ingest-world';
import type { FixtureUser } from './support/fixtures';

/** The canonical file: a note line, the names row (line 2), then `points` × `samples` rows. */
const canonicalFile = (points: number, samples: number, note: string) => `# note: ${note}\n${HEADER}\n${validRows(points, samples).join('\n')}\n`;

/** Source names of a made-up data logger export for three canonical channels. */
const renamed: Record<string, string> = { 'yaw [deg]': 'beta [deg]', 'q [Pa]': 'dyn_press [Pa]', 'Fx [N]': 'axial [N]' };

/** The same rows as a semicolon export with decimal commas and renamed columns. */
function loggerExport(canonical: string): string {
  return canonical
    .split('\n')
    .map((line, i) => {
      if (line.startsWith('#') || line === '') return line;
      const cells = line.split(', ');
      return (i === 1 ? cells.map((c) => renamed[c] ?? c) : cells.map((c) => c.replace('.', ','))).join(';');
    })
    .join('\n');
}

const loggerProfile = {
  name: 'logger export',
  delimiter: ';',
  decimalComma: true,
  columns: [
    { source: 'beta', channel: 'yaw' },
    { source: 'dyn_press', channel: 'q' },
    { source: 'axial', channel: 'Fx' },
  ],
};

describe('/api/import-profiles', () => {
  let w: IngestWorld;
  const auth = (user: FixtureUser) => ({ Authorization: `Bearer ${user.token}` });
  const sample = () => Buffer.from(loggerExport(canonicalFile(2, 3, `sample ${w.fixtures.unique()}`)));
  const save = (fields: { name?: string; description?: string; profile?: unknown }, file: Buffer | null = sample(), user = w.technician) => {
    const req = request(w.t.app).post('/api/import-profiles').set(auth(user));
    if (fields.name !== undefined) req.field('name', fields.name);
    if (fields.description !== undefined) req.field('description', fields.description);
    if (fields.profile !== undefined) req.field('profile', typeof fields.profile === 'string' ? fields.profile : JSON.stringify(fields.profile));
    return file ? req.attach('file', file, 'sample.txt') : req;
  };

  beforeAll(async () => {
    w = await createIngestWorld();
  });
  afterAll(() => w?.close());

  describe('POST /', () => {
    it('201: keeps a profile that reads its sample file, and audits it', async () => {
      const name = `Logger ${w.fixtures.unique()}`;
      const response = await save({ name, description: 'semicolon export', profile: loggerProfile });
      expect(response.status, JSON.stringify(response.body)).toBe(201);
      expect(response.body).toMatchObject({ name, description: 'semicolon export', archived: false, createdBy: w.technician.id, profile: { delimiter: ';', decimalComma: true, unmappedColumns: 'keep' } });
      expect(response.headers.location).toBe(`/api/import-profiles/${response.body.id}`);
      const audit = await AuditEntry.query(w.t.knex).findOne({ entityId: response.body.id, action: 'import_profile.created' });
      expect(audit?.actorId).toBe(w.technician.id);
    });

    it('400: an invalid profile names the field', async () => {
      const response = await save({ name: `Bad ${w.fixtures.unique()}`, profile: { ...loggerProfile, delimiter: ',' } });
      expect(response.status).toBe(400);
      expect(response.body.errors).toContainEqual({ field: 'profile.delimiter', message: 'decimalComma needs a delimiter other than ","' });
      const unknownChannel = await save({ name: `Bad ${w.fixtures.unique()}`, profile: { ...loggerProfile, columns: [{ source: 'beta', channel: 'sideslip' }] } });
      expect(unknownChannel.status).toBe(400);
      expect(unknownChannel.body.errors[0].field).toBe('profile.columns.0.channel');
    });

    it('400: a missing name or profile names the field', async () => {
      const noName = await save({ profile: loggerProfile });
      expect(noName.status).toBe(400);
      expect(noName.body.errors.map((e: { field: string }) => e.field)).toContain('name');
      const noProfile = await save({ name: `None ${w.fixtures.unique()}` });
      expect(noProfile.status).toBe(400);
      expect(noProfile.body.errors.map((e: { field: string }) => e.field)).toContain('profile');
      const notJson = await save({ name: `None ${w.fixtures.unique()}`, profile: '{"delimiter":' });
      expect(notJson.body.errors[0]).toMatchObject({ field: 'profile', message: 'The import profile must be JSON' });
    });

    it('400: without a sample file nothing is kept', async () => {
      const name = `No sample ${w.fixtures.unique()}`;
      const response = await save({ name, profile: loggerProfile }, null);
      expect(response.status).toBe(400);
      expect(response.body.errors[0].field).toBe('file');
      expect(await ImportProfile.query(w.t.knex).findOne({ name })).toBeUndefined();
    });

    it('400: a profile that does not fit its sample is refused with the line and column of the issue', async () => {
      const name = `Misfit ${w.fixtures.unique()}`;
      const missingColumn = await save({ name, profile: { ...loggerProfile, columns: [...loggerProfile.columns, { source: 'strain_7', channel: 'Fz' }] } });
      expect(missingColumn.status).toBe(400);
      expect(missingColumn.body.title).toBe('Profile does not fit the sample');
      expect(missingColumn.body.errors[0].field).toBe('file');
      // The names row is line 2 of the sample, after the note.
      expect(missingColumn.body.errors[0].message).toMatch(/^line 2, column 1: .*"strain_7"/);
      // Without the decimal comma, "850,20" splits and the reader finds the row too long on line 3.
      const commaBlind = await save({ name, profile: { ...loggerProfile, decimalComma: false } });
      expect(commaBlind.status).toBe(400);
      expect(commaBlind.body.errors[0].message).toMatch(/^line 3, column \d+: /);
      expect(await ImportProfile.query(w.t.knex).findOne({ name })).toBeUndefined();
    });

    it('409: a name already used by the lab (any case)', async () => {
      const name = `Twice ${w.fixtures.unique()}`;
      expect((await save({ name, profile: loggerProfile })).status).toBe(201);
      const again = await save({ name: name.toUpperCase(), profile: loggerProfile });
      expect(again.status).toBe(409);
      expect(again.body.errors[0].field).toBe('name');
    });

    it('403: customers cannot save profiles', async () => {
      const response = await save({ name: `Customer ${w.fixtures.unique()}`, profile: loggerProfile }, sample(), w.customer);
      expect(response.status).toBe(403);
    });
  });

  describe('GET /', () => {
    it('200: staff see the unarchived profiles by name; customers get 403', async () => {
      const name = `Listed ${w.fixtures.unique()}`;
      const created = await save({ name, profile: loggerProfile });
      const list = await request(w.t.app).get('/api/import-profiles').set(auth(w.analyst));
      expect(list.status).toBe(200);
      expect(list.body.map((p: { id: string }) => p.id)).toContain(created.body.id);
      expect((await request(w.t.app).get('/api/import-profiles').set(auth(w.customer))).status).toBe(403);
    });
  });

  describe('PUT /:id', () => {
    it('200: replaces the profile after trying it, and audits before and after', async () => {
      const created = await save({ name: `Edit ${w.fixtures.unique()}`, profile: loggerProfile });
      const name = `Edited ${w.fixtures.unique()}`;
      const response = await request(w.t.app)
        .put(`/api/import-profiles/${created.body.id}`)
        .set(auth(w.analyst))
        .field('name', name)
        .field('description', 'second try')
        .field('profile', JSON.stringify({ ...loggerProfile, unmappedColumns: 'keep', skipLines: 0 }))
        .attach('file', sample(), 'sample.txt');
      expect(response.status, JSON.stringify(response.body)).toBe(200);
      expect(response.body).toMatchObject({ id: created.body.id, name, description: 'second try' });
      const audit = await AuditEntry.query(w.t.knex).findOne({ entityId: created.body.id, action: 'import_profile.updated' });
      expect(audit).toMatchObject({ actorId: w.analyst.id, before: expect.objectContaining({ name: created.body.name }), after: expect.objectContaining({ name }) });
    });

    it('400: an edit that no longer fits its sample changes nothing', async () => {
      const created = await save({ name: `Keep ${w.fixtures.unique()}`, profile: loggerProfile });
      const response = await request(w.t.app)
        .put(`/api/import-profiles/${created.body.id}`)
        .set(auth(w.labManager))
        .field('name', created.body.name)
        .field('profile', JSON.stringify({ ...loggerProfile, unitsRow: true }))
        .attach('file', sample(), 'sample.txt');
      expect(response.status).toBe(400);
      // The first data row is taken for units, so the names row keeps "time [s]" cut at the decimal comma.
      expect(response.body.errors[0].message).toMatch(/^line 2, column 1: .*MISSING_UNIT/);
      expect((await ImportProfile.query(w.t.knex).findById(created.body.id))?.profile).toMatchObject({ unitsRow: false });
    });

    it('404: an unknown profile', async () => {
      const response = await request(w.t.app).put('/api/import-profiles/00000000-0000-4000-8000-000000000000').set(auth(w.analyst)).field('name', 'x').field('profile', JSON.stringify(loggerProfile)).attach('file', sample(), 'sample.txt');
      expect(response.status).toBe(404);
    });
  });

  describe('POST /:id/archive', () => {
    it('200: archives and audits; the profile is then neither listed nor usable', async () => {
      const created = await save({ name: `Retire ${w.fixtures.unique()}`, profile: loggerProfile });
      const response = await request(w.t.app).post(`/api/import-profiles/${created.body.id}/archive`).set(auth(w.labManager));
      expect(response.status).toBe(200);
      expect(response.body.archived).toBe(true);
      expect(await AuditEntry.query(w.t.knex).findOne({ entityId: created.body.id, action: 'import_profile.archived' })).toBeDefined();
      const list = await request(w.t.app).get('/api/import-profiles').set(auth(w.analyst));
      expect(list.body.map((p: { id: string }) => p.id)).not.toContain(created.body.id);
      const withArchived = await request(w.t.app).get('/api/import-profiles?archived=true').set(auth(w.analyst));
      expect(withArchived.body.map((p: { id: string }) => p.id)).toContain(created.body.id);
      const upload = await request(w.t.app).post(`/api/runs/${await w.newRun()}/files`).set(auth(w.technician)).field('profileId', created.body.id).attach('file', sample(), 'late.txt');
      expect(upload.status).toBe(400);
      expect(upload.body.errors[0].field).toBe('profileId');
    });

    it('403: customers cannot archive', async () => {
      const created = await save({ name: `Kept ${w.fixtures.unique()}`, profile: loggerProfile });
      expect((await request(w.t.app).post(`/api/import-profiles/${created.body.id}/archive`).set(auth(w.customer))).status).toBe(403);
    });
  });

  describe('a saved profile at preview and upload', () => {
    it('previews a logger export through a saved profile by id', async () => {
      const created = await save({ name: `Preview ${w.fixtures.unique()}`, profile: loggerProfile });
      const response = await request(w.t.app).post('/api/runs/preview').set(auth(w.technician)).field('profileId', created.body.id).attach('file', sample(), 'logger.txt');
      expect(response.status).toBe(200);
      expect(response.body).toMatchObject({ valid: true, sampleCount: 6, pointCount: 2 });
    });

    it('an upload through the profile gives the same points as the canonical file, keeps the raw bytes and records the profile', async () => {
      const created = await save({ name: `Upload ${w.fixtures.unique()}`, profile: loggerProfile });
      const canonical = Buffer.from(canonicalFile(4, 5, 'same rows'));
      const logger = Buffer.from(loggerExport(canonical.toString('utf8')));
      const testId = await w.newTest();
      const [runA, runB] = [await w.newRun(testId), await w.newRun(testId)];
      const plain = await w.upload(runA, canonical, 'canonical.csv');
      const viaProfile = await request(w.t.app).post(`/api/runs/${runB}/files`).set(auth(w.technician)).field('profileId', created.body.id).attach('file', logger, 'logger.txt');
      expect([plain.status, viaProfile.status], JSON.stringify(viaProfile.body)).toEqual([202, 202]);
      const [a, b] = await Promise.all([w.settle(plain.body.reduction.id), w.settle(viaProfile.body.reduction.id)]);
      expect([a.state, b.state], b.errorMessage ?? '').toEqual(['done', 'done']);

      expect(b.config['importProfile']).toEqual({ id: created.body.id, name: created.body.name, profile: created.body.profile });
      expect(a.config['importProfile']).toBeUndefined();
      expect(b.inputSha256).toBe(sha256(logger));
      expect(viaProfile.body.rawFile.sha256).toBe(sha256(logger));
      const raw = await request(w.t.app).get(`/api/runs/${runB}/raw`).set(auth(w.analyst)).buffer(true).parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
      expect(Buffer.compare(raw.body as Buffer, logger)).toBe(0);

      const columns = ['pointNumber', 'sampleCount', 'yaw', 'pitch', 'dynamicPressure', 'cdUncorrected', 'cdCorrected', 'clCorrected', 'csCorrected', 'dragCounts'];
      const [pointsA, pointsB] = await Promise.all([a, b].map((r) => ReductionPoint.query(w.t.knex).where('reductionId', r.id).orderBy('index').select(columns)));
      expect(pointsA).toHaveLength(4);
      expect(pointsB.map((p) => p.toJSON())).toEqual(pointsA.map((p) => p.toJSON()));
    });

    it('a reduction again reads the raw file through the recorded profile', async () => {
      const created = await save({ name: `Again ${w.fixtures.unique()}`, profile: loggerProfile });
      const runId = await w.newRun();
      const logger = Buffer.from(loggerExport(canonicalFile(3, 4, 'again')));
      const first = await request(w.t.app).post(`/api/runs/${runId}/files`).set(auth(w.technician)).field('profileId', created.body.id).attach('file', logger, 'logger.txt');
      expect(first.status).toBe(202);
      await w.settle(first.body.reduction.id);
      const again = await request(w.t.app).post(`/api/runs/${runId}/reductions`).set(auth(w.analyst)).send({ corrections: { solidBlockage: 'none' } });
      expect(again.status).toBe(202);
      const reduced = await w.settle(again.body.id);
      expect(reduced.state, reduced.errorMessage ?? '').toBe('done');
      expect(reduced.config['importProfile']).toMatchObject({ id: created.body.id });
      expect(await ReductionPoint.query(w.t.knex).where('reductionId', reduced.id).resultSize()).toBe(3);
    });
  });
});
