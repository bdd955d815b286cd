import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createHash } from 'node:crypto';
import { Organisation, PointExclusion, Reduction, ReductionPoint, ResultSheet, SigningRight, TestRecord } from '@tunnelwright/db';
import { parse } from 'csv-parse/sync';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sampleReducedRun, sampleSubmission, type ReducedSample } from '../src/routes/approval-samples';
import { ITEMS_TESTED_STATEMENT, REPRODUCTION_STATEMENT } from '../src/reports/render-result-sheet';
import { formatDate } from '../src/reports/sheet-format';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { waitForMail } from './support/mailbox';
import { createTestApp, type TestApp } from './support/test-app';

const binary = (res: request.Response, done: (err: Error | null, body: unknown) => void) => {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
};

describe('approval workflow and certified sheets', () => {
  let t: TestApp;
  let f: FixtureBuilder;
  let technician: FixtureUser;
  let analyst: FixtureUser;
  let secondAnalyst: FixtureUser;
  let unsignedAnalyst: FixtureUser;
  let manager: FixtureUser;
  let customer: FixtureUser;
  let rival: FixtureUser;
  let world: ReducedSample;

  const as = (user: FixtureUser) => ({ Authorization: `Bearer ${user.token}` });
  const get = (user: FixtureUser, path: string) => request(t.app).get(path).set(as(user));
  const post = (user: FixtureUser, path: string, body: object = {}) => request(t.app).post(path).set(as(user)).send(body);
  const submit = (user: FixtureUser, reductionIds: string[], testId = world.testId) => post(user, `/api/tests/${testId}/submissions`, { reductionIds, note: 'Baseline sweep' });

  beforeAll(async () => {
    t = await createTestApp();
    f = new FixtureBuilder(t.knex, t.config.jwtSecret);
    technician = await f.user({ role: 'technician' });
    analyst = await f.user({ role: 'analyst' });
    secondAnalyst = await f.user({ role: 'analyst' });
    unsignedAnalyst = await f.user({ role: 'analyst' });
    manager = await f.user({ role: 'lab_manager' });
    customer = await f.user({ role: 'customer' });
    rival = await f.user({ role: 'customer', organisationId: (await f.customerOrganisation()).id });
    const { User } = await import('@tunnelwright/db');
    world = await sampleReducedRun(f, undefined, await User.query().findById(technician.id));
    // The day the lab logged the model in, which the sheet states.
    const { TestArticle } = await import('@tunnelwright/db');
    const test = await TestRecord.query().findById(world.testId).throwIfNotFound();
    await TestArticle.query().findById(test.articleId).patch({ receivedOn: '2026-11-20' });
  });
  afterAll(() => t?.close());

  describe('signing rights', () => {
    it('a lab manager grants the right to analysts; a technician cannot hold it; granting twice is 409', async () => {
      for (const user of [analyst, secondAnalyst]) {
        const granted = await post(manager, '/api/signing-rights', { userId: user.id, scopeNote: 'Force and moment tests' });
        expect(granted.status, JSON.stringify(granted.body)).toBe(201);
        expect(granted.body.user.id).toBe(user.id);
      }
      expect((await post(manager, '/api/signing-rights', { userId: analyst.id })).status).toBe(409);
      const technicianGrant = await post(manager, '/api/signing-rights', { userId: technician.id });
      expect(technicianGrant.status).toBe(400);
      expect(technicianGrant.body.errors[0].field).toBe('userId');
      expect((await post(analyst, '/api/signing-rights', { userId: unsignedAnalyst.id })).status).toBe(403);
      expect((await get(analyst, '/api/me/signing-right')).body.holds).toBe(true);
      expect((await get(unsignedAnalyst, '/api/me/signing-right')).body.holds).toBe(false);
    });

    it('removing a right needs a reason, keeps the history, and cannot be done twice', async () => {
      const extra = await f.user({ role: 'analyst' });
      const granted = await post(manager, '/api/signing-rights', { userId: extra.id });
      expect((await post(manager, `/api/signing-rights/${granted.body.id}/revoke`, { reason: 'short' })).status).toBe(400);
      const revoked = await post(manager, `/api/signing-rights/${granted.body.id}/revoke`, { reason: 'Moved to another section' });
      expect(revoked.status).toBe(200);
      expect(revoked.body.revokedReason).toBe('Moved to another section');
      expect((await post(manager, `/api/signing-rights/${granted.body.id}/revoke`, { reason: 'Moved to another section' })).status).toBe(409);
      expect(await SigningRight.query().where('userId', extra.id).resultSize()).toBe(1);
    });
  });

  describe('exclusions', () => {
    it('an analyst excludes a point only with a written reason, sees it listed, and can put it back', async () => {
      const path = `/api/reductions/${world.reductionId}/points/3/exclusion`;
      const noReason = await request(t.app).put(path).set(as(analyst)).send({ reason: 'noisy' });
      expect(noReason.status).toBe(400);
      expect(noReason.body.errors[0].field).toBe('reason');
      expect((await request(t.app).put(path).set(as(technician)).send({ reason: 'Model vibrated at this yaw' })).status).toBe(403);
      const saved = await request(t.app).put(path).set(as(analyst)).send({ reason: 'Model vibrated visibly at this yaw' });
      expect(saved.status, JSON.stringify(saved.body)).toBe(200);
      expect(saved.body).toMatchObject({ pointIndex: 3, reason: 'Model vibrated visibly at this yaw' });
      const listed = await get(technician, `/api/reductions/${world.reductionId}/exclusions`);
      expect(listed.body).toHaveLength(1);
      expect((await request(t.app).delete(path).set(as(analyst))).status).toBe(204);
      expect((await get(technician, `/api/reductions/${world.reductionId}/exclusions`)).body).toHaveLength(0);
      expect((await request(t.app).put(path).set(as(analyst)).send({ reason: 'Model vibrated visibly at this yaw' })).status).toBe(200);
      expect((await request(t.app).put(`/api/reductions/${world.reductionId}/points/999/exclusion`).set(as(analyst)).send({ reason: 'Model vibrated visibly' })).status).toBe(404);
    });
  });

  describe('submission, four-eyes and approval', () => {
    let submissionId: string;

    it('rejects reductions that are not of this test, and a customer cannot submit', async () => {
      const other = await sampleReducedRun(f);
      const wrong = await submit(technician, [other.reductionId]);
      expect(wrong.status).toBe(400);
      expect(wrong.body.errors[0].field).toBe('reductionIds.0');
      expect((await submit(customer, [world.reductionId])).status).toBe(403);
    });

    it('a technician submits; a second submission while one awaits approval is 409', async () => {
      const created = await submit(technician, [world.reductionId]);
      expect(created.status, JSON.stringify(created.body)).toBe(201);
      expect(created.body).toMatchObject({ state: 'awaiting_approval', sequence: 1 });
      expect(created.body.reductions[0]).toMatchObject({ reductionId: world.reductionId, uploadedBy: { id: technician.id }, excludedPoints: 1 });
      submissionId = created.body.id;
      expect((await submit(technician, [world.reductionId])).status).toBe(409);
    });

    it('a customer sees nothing of it: no submission, no points, no sheet', async () => {
      expect((await get(customer, `/api/submissions/${submissionId}`)).status).toBe(403);
      expect((await get(customer, `/api/tests/${world.testId}/submissions`)).status).toBe(403);
      // Before approval the reduction does not exist for the customer, whose test it is.
      expect((await get(customer, `/api/reductions/${world.reductionId}/points`)).status).toBe(404);
      expect((await get(customer, `/api/runs/${world.runId}/reductions`)).body).toEqual([]);
      expect((await get(customer, `/api/result-sheets?testId=${world.testId}`)).body).toEqual([]);
      expect((await get(customer, `/api/tests/${world.testId}`)).body.progress).toMatchObject({ customerStage: 'being_checked', approval: { state: 'awaiting_approval', sheetId: null } });
    });

    it('an analyst without a signing right cannot approve (403); the uploader cannot approve even with one (four-eyes)', async () => {
      const unsigned = await post(unsignedAnalyst, `/api/submissions/${submissionId}/approve`);
      expect(unsigned.status).toBe(403);
      expect(unsigned.body.detail).toMatch(/right to sign/);
      // The uploader is a technician here; make an analyst who uploads and submits his own run.
      const selfUploader = await f.user({ role: 'analyst' });
      await post(manager, '/api/signing-rights', { userId: selfUploader.id });
      const { User } = await import('@tunnelwright/db');
      const own = await sampleReducedRun(f, undefined, await User.query().findById(selfUploader.id));
      const ownSubmission = await submit(selfUploader, [own.reductionId], own.testId);
      expect(ownSubmission.status).toBe(201);
      const selfApproval = await post(selfUploader, `/api/submissions/${ownSubmission.body.id}/approve`);
      expect(selfApproval.status).toBe(403);
      expect(selfApproval.body.detail).toMatch(/uploaded a run file/);
      const selfSendBack = await post(selfUploader, `/api/submissions/${ownSubmission.body.id}/send-back`, { reason: 'Trying to decide my own work' });
      expect(selfSendBack.status).toBe(403);
    });

    it('issuing before approval is 409', async () => {
      expect((await post(manager, `/api/submissions/${submissionId}/issue`)).status).toBe(409);
    });

    it('a signatory who did not upload approves; the reductions are frozen; deciding again is 409', async () => {
      const approved = await post(analyst, `/api/submissions/${submissionId}/approve`, { comment: 'Repeat within 2 counts' });
      expect(approved.status, JSON.stringify(approved.body)).toBe(200);
      expect(approved.body).toMatchObject({ state: 'approved', decidedBy: { id: analyst.id } });
      expect((await Reduction.query().findById(world.reductionId))?.approvedAt).toBeInstanceOf(Date);
      expect((await post(secondAnalyst, `/api/submissions/${submissionId}/approve`)).status).toBe(409);
      expect((await post(secondAnalyst, `/api/submissions/${submissionId}/send-back`, { reason: 'Changed my mind entirely' })).status).toBe(409);
      const frozenExclusion = await request(t.app).put(`/api/reductions/${world.reductionId}/points/4/exclusion`).set(as(analyst)).send({ reason: 'Too late for this one' });
      expect(frozenExclusion.status).toBe(409);
      // Approved, the customer sees their own run's points; a customer of another organisation still sees nothing.
      const points = await get(customer, `/api/reductions/${world.reductionId}/points`);
      expect(points.status).toBe(200);
      expect(points.body.items.length).toBeGreaterThan(0);
      expect(points.body.caution).toMatch(/not design loads/);
      expect((await get(customer, `/api/runs/${world.runId}/reductions`)).body.map((r: { id: string }) => r.id)).toEqual([world.reductionId]);
      expect((await get(rival, `/api/reductions/${world.reductionId}/points`)).status).toBe(404);
      expect((await get(rival, `/api/runs/${world.runId}/reductions`)).status).toBe(404);
      expect((await request(t.app).delete(`/api/reductions/${world.reductionId}/points/3/exclusion`).set(as(analyst))).status).toBe(409);
    });

    it('the database itself refuses to change approved reductions, their points and exclusions', async () => {
      await expect(t.knex.raw('UPDATE reduction_points SET cd_corrected = 0.2 WHERE reduction_id = ?', [world.reductionId])).rejects.toThrow(/approved and frozen/);
      await expect(t.knex.raw('DELETE FROM reduction_points WHERE reduction_id = ?', [world.reductionId])).rejects.toThrow(/approved and frozen/);
      await expect(t.knex.raw("UPDATE reductions SET warnings = '[]' WHERE id = ?", [world.reductionId])).rejects.toThrow(/approved and frozen/);
      await expect(t.knex.raw('DELETE FROM reductions WHERE id = ?', [world.reductionId])).rejects.toThrow(/approved and frozen/);
      await expect(t.knex.raw("UPDATE point_exclusions SET reason = 'rewritten afterwards' WHERE reduction_id = ?", [world.reductionId])).rejects.toThrow(/approved and frozen/);
      await expect(
        t.knex.raw(
          "INSERT INTO reduction_points (reduction_id, index, point_number, sample_count, yaw, pitch, setpoints, result) VALUES (?, 999, 999, 1, 0, 0, '{}', '{}')",
          [world.reductionId],
        ),
      ).rejects.toThrow(/approved and frozen/);
      expect(await ReductionPoint.query().where('reductionId', world.reductionId).resultSize()).toBeGreaterThan(0);
      expect(await PointExclusion.query().where('reductionId', world.reductionId).resultSize()).toBe(1);
    });
  });

  describe('issue, publication, verification and revision', () => {
    let first: { id: string; reportNumber: string; sha256: string };
    let pdf: Buffer;

    it('a lab manager issues the sheet: the customer is e-mailed a link, and sees and downloads exactly the hashed file', async () => {
      const submissions = await get(manager, `/api/tests/${world.testId}/submissions`);
      const approved = submissions.body.find((s: { state: string }) => s.state === 'approved');
      const issued = await post(manager, `/api/submissions/${approved.id}/issue`);
      expect(issued.status, JSON.stringify(issued.body)).toBe(201);
      expect(issued.body).toMatchObject({ state: 'valid', revision: 1, testId: world.testId, authorisedBy: { name: analyst.name } });
      expect(issued.body.reportNumber).toMatch(/^[A-Z]+-\d{4}-\d{4}-R1$/);
      expect(issued.body.caution).toMatch(/not design loads/);
      first = issued.body;
      expect((await post(manager, `/api/submissions/${approved.id}/issue`)).status).toBe(409);
      // The certified sheet ends the tunnel work: the test is complete (common practice: a report closes the job).
      expect((await TestRecord.query().findById(world.testId))?.state).toBe('complete');

      const mail = await waitForMail(t.config.mailDir, customer.email, { subject: new RegExp(first.reportNumber) });
      expect(mail.links).toContain(`http://localhost:3000/documents/${first.id}`);
      expect(mail.links).toContain(`http://localhost:3000/verify/${first.reportNumber}`);
      expect(mail.text).toMatch(/not design loads/);

      const listed = await get(customer, '/api/result-sheets');
      expect(listed.body.map((s: { id: string }) => s.id)).toContain(first.id);
      const download = await get(customer, `/api/result-sheets/${first.id}/pdf`).buffer(true).parse(binary);
      expect(download.status).toBe(200);
      expect(download.headers['content-type']).toMatch(/application\/pdf/);
      pdf = download.body as Buffer;
      expect(createHash('sha256').update(pdf).digest('hex')).toBe(first.sha256);
      expect((await get(customer, `/api/tests/${world.testId}`)).body.progress).toMatchObject({ customerStage: 'certified', approval: { state: 'issued', sheetId: first.id } });
    });

    it('the sheet reads back with pdftotext: number on every page with page x of y, the exclusion with its reason, the signatory and the caution', () => {
      const dir = mkdtempSync(join(tmpdir(), 'tw-sheet-'));
      writeFileSync(join(dir, 'sheet.pdf'), pdf);
      const text = execFileSync('pdftotext', ['-layout', join(dir, 'sheet.pdf'), '-'], { encoding: 'utf8' });
      const pages = text.split('\f').filter((p) => p.trim() !== '');
      expect(pages.length).toBeGreaterThan(1);
      pages.forEach((page, i) => {
        expect(page).toContain(first.reportNumber);
        expect(page).toContain(`Page ${i + 1} of ${pages.length}`);
      });
      expect(text).toContain('Model vibrated visibly at this yaw');
      expect(text).toContain(analyst.name);
      expect(text).toMatch(/not design loads/i);
      expect(text).toMatch(/END OF REPORT/);
    });

    it('the sheet built from the records states each ISO/IEC 17025 §7.8.2.1 item of this test', async () => {
      const dir = mkdtempSync(join(tmpdir(), 'tw-sheet-'));
      writeFileSync(join(dir, 'sheet.pdf'), pdf);
      // One line of words: pdftotext -layout breaks long fields across lines and columns.
      const text = execFileSync('pdftotext', ['-layout', join(dir, 'sheet.pdf'), '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
      const test = await TestRecord.query().findById(world.testId).withGraphFetched('[article, tunnel, balance]').throwIfNotFound();
      const organisation = await Organisation.query().findById(test.organisationId).throwIfNotFound();
      const stored = await ResultSheet.query().findById(first.id).throwIfNotFound();
      const data = stored.data as { dates: { receipt: string | null; testDates: string[]; issue: string }; method: { correctionMethods: string[]; engineVersion: string } };
      expect(text).toContain('CERTIFIED RESULT SHEET'); // (a) title
      expect(text).toContain(test.tunnel!.name); // (b) where the tests were done
      expect(text).toContain(organisation.name); // (d) customer
      expect(text).toContain(test.article!.name); // (f) identification of the item
      expect(text).toContain(test.balance!.identifier); // (e) method: the balance
      for (const line of data.method.correctionMethods) expect(text).toContain(line); // (e) corrections
      expect(text).toContain(data.method.engineVersion); // (e) engine version
      expect(data.dates.issue).toBe(stored.issueDate); // (i) issue date, and the receipt and test dates, in the lab's zone
      expect(data.dates.receipt).toBe('2026-11-20'); // (h) the receipt date recorded on the article
      for (const date of ['2026-11-20', ...data.dates.testDates, data.dates.issue]) expect(text).toContain(formatDate(date));
      expect(text).toContain(ITEMS_TESTED_STATEMENT); // (k)
      expect(text).toContain(REPRODUCTION_STATEMENT); // (o)
      expect(text).toMatch(/U \(coverage factor k = 2/); // (n) results with their expanded uncertainty
    });

    it('a customer of another organisation sees nothing at all', async () => {
      expect((await get(rival, '/api/result-sheets')).body.map((s: { id: string }) => s.id)).not.toContain(first.id);
      expect((await get(rival, `/api/result-sheets/${first.id}`)).status).toBe(404);
      expect((await get(rival, `/api/result-sheets/${first.id}/pdf`)).status).toBe(404);
      expect((await get(rival, `/api/result-sheets/${first.id}/points.csv`)).status).toBe(404);
      expect((await get(rival, `/api/tests/${world.testId}`)).status).toBe(404);
    });

    it('the public page shows only number, date, state and hash; it accepts the issued file and rejects a one-byte change', async () => {
      const shown = await request(t.app).get(`/api/verify/${first.reportNumber}`);
      expect(shown.status).toBe(200);
      expect(Object.keys(shown.body).sort()).toEqual(['issueDate', 'reportNumber', 'sha256', 'state', 'successor']);
      expect(shown.body).toMatchObject({ reportNumber: first.reportNumber, state: 'valid', successor: null, sha256: first.sha256 });
      const same = await request(t.app).post(`/api/verify/${first.reportNumber}`).set('Content-Type', 'application/pdf').send(pdf);
      expect(same.status).toBe(200);
      expect(same.body.matches).toBe(true);
      const changed = Buffer.from(pdf);
      changed[Math.floor(changed.length / 2)] ^= 0x01;
      const tampered = await request(t.app).post(`/api/verify/${first.reportNumber}`).set('Content-Type', 'application/pdf').send(changed);
      expect(tampered.body.matches).toBe(false);
      expect(tampered.body.fileSize).toBe(pdf.length);
      expect((await request(t.app).get('/api/verify/TW-1999-0001-R1')).status).toBe(404);
    });

    it('the issued sheet cannot be edited or deleted, even in SQL', async () => {
      await expect(t.knex.raw("UPDATE result_sheets SET sha256 = repeat('0', 64) WHERE id = ?", [first.id])).rejects.toThrow(/issued/);
      await expect(t.knex.raw('DELETE FROM result_sheets WHERE id = ?', [first.id])).rejects.toThrow(/issued/);
    });

    it('a correction makes revision 2 (reason required); the first is superseded and points to it; nothing is deleted', async () => {
      const { User } = await import('@tunnelwright/db');
      const rerun = await sampleReducedRun(f, world.testId, await User.query().findById(technician.id));
      const submitted = await submit(technician, [world.reductionId, rerun.reductionId]);
      expect(submitted.status, JSON.stringify(submitted.body)).toBe(201);
      expect((await post(secondAnalyst, `/api/submissions/${submitted.body.id}/approve`)).status).toBe(200);
      const noReason = await post(analyst, `/api/submissions/${submitted.body.id}/issue`);
      expect(noReason.status).toBe(400);
      expect(noReason.body.errors[0].field).toBe('revisionReason');
      const second = await post(analyst, `/api/submissions/${submitted.body.id}/issue`, { revisionReason: 'Adds the repeat run of the baseline' });
      expect(second.status, JSON.stringify(second.body)).toBe(201);
      expect(second.body).toMatchObject({ revision: 2, reportNumber: first.reportNumber.replace(/-R1$/, '-R2'), supersedes: { id: first.id } });

      const old = await request(t.app).get(`/api/verify/${first.reportNumber}`);
      expect(old.body).toMatchObject({ state: 'superseded', successor: { reportNumber: second.body.reportNumber } });
      const oldSheet = await get(customer, `/api/result-sheets/${first.id}`);
      expect(oldSheet.body).toMatchObject({ state: 'superseded', supersededBy: { id: second.body.id } });
      expect(await ResultSheet.query().where('testId', world.testId).resultSize()).toBe(2);
      const still = await request(t.app).post(`/api/verify/${first.reportNumber}`).set('Content-Type', 'application/pdf').send(pdf);
      expect(still.body).toMatchObject({ matches: true, state: 'superseded' });
      await waitForMail(t.config.mailDir, customer.email, { subject: new RegExp(second.body.reportNumber) });
    });

    it('every transition is in the test audit trail with actor and reason, for lab managers', async () => {
      const audit = await get(manager, `/api/audit?entity=test&entityId=${world.testId}&pageSize=100`);
      const actions = audit.body.items.map((e: { action: string }) => e.action);
      for (const action of ['point.excluded', 'point.restored', 'submission.submitted', 'submission.approved', 'sheet.issued', 'sheet.superseded', 'test.completed']) expect(actions).toContain(action);
      // Completed once, by the first sheet; the revision left the state alone.
      expect(audit.body.items.filter((e: { action: string }) => e.action === 'test.completed')).toHaveLength(1);
      expect(audit.body.items.find((e: { action: string }) => e.action === 'test.completed').after).toMatchObject({ state: 'complete', reportNumber: first.reportNumber });
      const superseded = audit.body.items.find((e: { action: string }) => e.action === 'sheet.superseded');
      expect(superseded.after.reason).toBe('Adds the repeat run of the baseline');
      expect(superseded.actorName).toBe(analyst.name);
      expect((await get(analyst, `/api/audit?entity=test&entityId=${world.testId}`)).status).toBe(403);
    });

    it('a sent-back submission records the reason and frees the test for a new submission', async () => {
      const { User } = await import('@tunnelwright/db');
      const other = await sampleReducedRun(f, undefined, await User.query().findById(technician.id));
      const submitted = await submit(technician, [other.reductionId], other.testId);
      expect((await post(analyst, `/api/submissions/${submitted.body.id}/send-back`, { reason: 'too short' })).status).toBe(400);
      const back = await post(analyst, `/api/submissions/${submitted.body.id}/send-back`, { reason: 'Point 5 shows a capacity warning; re-run it' });
      expect(back.status).toBe(200);
      expect(back.body).toMatchObject({ state: 'sent_back', decisionReason: 'Point 5 shows a capacity warning; re-run it' });
      expect((await post(manager, `/api/submissions/${submitted.body.id}/issue`)).status).toBe(409);
      expect((await Reduction.query().findById(other.reductionId))?.approvedAt).toBeNull();
      expect((await submit(technician, [other.reductionId], other.testId)).status).toBe(201);
    });
  });

  describe('illegal transitions', () => {
    it('older approved results cannot be issued once newer ones are approved (409); the newest can', async () => {
      const older = await sampleSubmission(f, 'approved');
      const newer = await sampleSubmission(f, 'approved', older.testId);
      const refused = await post(manager, `/api/submissions/${older.submissionId}/issue`);
      expect(refused.status).toBe(409);
      expect(refused.body.detail).toMatch(/Submission 2 of this test was approved after this one \(1\)/);
      expect(await ResultSheet.query().where('testId', older.testId).resultSize()).toBe(0);
      expect((await post(manager, `/api/submissions/${newer.submissionId}/issue`)).status).toBe(201);
      expect((await post(manager, `/api/submissions/${older.submissionId}/issue`)).status).toBe(409);
    });

    it('a sent-back submission can be neither approved nor sent back again (409)', async () => {
      const { submissionId } = await sampleSubmission(f);
      expect((await post(analyst, `/api/submissions/${submissionId}/send-back`, { reason: 'Run 1 yaw offset not applied' })).status).toBe(200);
      const approve = await post(analyst, `/api/submissions/${submissionId}/approve`);
      expect(approve.status).toBe(409);
      expect(approve.body.detail).toMatch(/sent back/);
      expect((await post(secondAnalyst, `/api/submissions/${submissionId}/send-back`, { reason: 'Second thoughts on run 1' })).status).toBe(409);
    });

    it('a cancelled test cannot be submitted (409), and a point of an unfinished reduction cannot be left out (409)', async () => {
      const cancelled = await sampleReducedRun(f);
      await TestRecord.query().findById(cancelled.testId).patch({ state: 'cancelled' });
      const submitted = await submit(technician, [cancelled.reductionId], cancelled.testId);
      expect(submitted.status).toBe(409);
      expect(submitted.body.detail).toMatch(/cancelled test/);

      const unfinished = await sampleReducedRun(f);
      await Reduction.query().findById(unfinished.reductionId).patch({ state: 'running' });
      const excluded = await request(t.app).put(`/api/reductions/${unfinished.reductionId}/points/1/exclusion`).set(as(analyst)).send({ reason: 'Model vibrated visibly at this yaw' });
      expect(excluded.status).toBe(409);
      expect(excluded.body.detail).toMatch(/is running; points can be excluded once it has finished/);
    });
  });

  describe('points CSV', () => {
    it('neutralises cells that would start a formula, keeps numbers as numbers and marks excluded points', async () => {
      const { User, Run } = await import('@tunnelwright/db');
      const run = await sampleReducedRun(f, undefined, await User.query().findById(technician.id));
      await Run.query().findById(run.runId).patch({ configurationLabel: '=HYPERLINK("http://evil.example","x")' });
      await request(t.app).put(`/api/reductions/${run.reductionId}/points/0/exclusion`).set(as(analyst)).send({ reason: '+cmd|calc!A0 looked odd to me' });
      await request(t.app).put(`/api/reductions/${run.reductionId}/points/1/exclusion`).set(as(analyst)).send({ reason: '@SUM(1+1) then\ttabbed' });
      const csv = await get(technician, `/api/reductions/${run.reductionId}/points.csv`);
      expect(csv.status).toBe(200);
      expect(csv.headers['content-type']).toMatch(/text\/csv/);
      const rows = parse(csv.text as string, { relax_column_count: true }) as string[][];
      expect(rows[0]![0]).toMatch(/^# Run \d+, reduction version 1/);
      expect(rows[1]![0]).toMatch(/not design loads/);
      const header = rows[2]!;
      expect(header).toContain('cd_expanded_uncertainty_k2');
      const body = rows.slice(3);
      const col = (name: string) => header.indexOf(name);
      expect(body.every((r) => r[col('configuration')] === `'=HYPERLINK("http://evil.example","x")`)).toBe(true);
      expect(body[0]![col('exclusion_reason')]).toBe("'+cmd|calc!A0 looked odd to me");
      expect(body[1]![col('exclusion_reason')]).toBe("'@SUM(1+1) then\ttabbed");
      expect(body[0]![col('excluded')]).toBe('yes');
      expect(body[2]![col('excluded')]).toBe('no');
      // Text cells never start a formula; numbers stay plain numbers (negative yaw angles keep their sign).
      for (const row of body) {
        for (const [i, cell] of row.entries()) {
          if (Number.isNaN(Number(cell))) expect(cell, header[i]).not.toMatch(/^[=+\-@\t\r]/);
        }
      }
      expect(body.some((r) => Number(r[col('yaw_deg')]) < 0)).toBe(true);
      expect(Number(body[2]![col('cd')])).toBeGreaterThan(0.1);
      expect(Number(body[2]![col('cd_expanded_uncertainty_k2')])).toBeGreaterThanOrEqual(0);
    });
  });
});
