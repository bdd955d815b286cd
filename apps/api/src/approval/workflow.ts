import { Organisation, recordAudit, Reduction, ResultSheet, Run, SigningRight, Submission, TestRecord, User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { HttpError } from '../errors/http-error';
import { sha256Hex } from '../reports/issued-file-hash';
import { renderResultSheet } from '../reports/render-result-sheet';
import { buildSheetData, dateInZone, reportSettings } from './sheet-data';

/** A 409 for a step the record's current state does not allow, saying what the state is. */
export function illegal(title: string, detail: string): HttpError {
  return new HttpError(409, title, detail);
}

const stateWords: Record<Submission['state'], string> = {
  awaiting_approval: 'awaiting approval',
  sent_back: 'sent back',
  approved: 'approved',
};

/** The caller's current signing right, if any. */
export async function currentSigningRight(knex: Knex, userId: string): Promise<SigningRight | undefined> {
  return SigningRight.query(knex).where({ userId }).whereNull('revokedAt').first();
}

/** Throws 403 unless `user` holds a current signing right. */
export async function requireSigningRight(knex: Knex, user: User, action: string): Promise<SigningRight> {
  const right = await currentSigningRight(knex, user.id);
  if (!right) throw new HttpError(403, 'No signing right', `You cannot ${action}: you do not hold the right to sign. A lab manager grants it.`);
  return right;
}

/** The submission locked for the rest of the transaction, or 404. */
async function lockedSubmission(trx: Knex.Transaction, id: string): Promise<Submission> {
  const submission = await Submission.query(trx).findById(id).forUpdate();
  if (!submission) throw HttpError.notFound('The submission');
  return submission;
}

/**
 * Puts a test's chosen reductions forward for approval: each must be a finished reduction of a different run of
 * this test. Only one submission of a test can await approval at a time.
 */
export async function submitForApproval(knex: Knex, testId: string, reductionIds: string[], note: string, caller: User): Promise<Submission> {
  return knex.transaction(async (trx) => {
    const test = await TestRecord.query(trx).findById(testId).forUpdate();
    if (!test) throw HttpError.notFound('The test');
    if (test.state === 'cancelled') throw illegal('Test cancelled', 'A cancelled test cannot be submitted for approval.');
    const unique = [...new Set(reductionIds)];
    const reductions = await Reduction.query(trx).whereIn('id', unique);
    const runs = await Run.query(trx).whereIn('id', reductions.map((r) => r.runId));
    unique.forEach((id, i) => {
      const reduction = reductions.find((r) => r.id === id);
      const run = reduction && runs.find((r) => r.id === reduction.runId);
      if (!reduction || !run || run.testId !== test.id) throw HttpError.field(`reductionIds.${i}`, 'This reduction does not belong to a run of this test');
      if (reduction.state !== 'done') throw HttpError.field(`reductionIds.${i}`, `Run ${run.runNumber} version ${reduction.version} is ${reduction.state}, not finished; only finished reductions can be submitted`);
    });
    const perRun = new Map<string, number>();
    for (const r of reductions) perRun.set(r.runId, (perRun.get(r.runId) ?? 0) + 1);
    const doubled = runs.find((run) => (perRun.get(run.id) ?? 0) > 1);
    if (doubled) throw HttpError.field('reductionIds', `Choose one version per run; run ${doubled.runNumber} has more than one`);
    if (!runs.some((r) => r.kind === 'data')) throw HttpError.field('reductionIds', 'Choose at least one data run; calibration runs alone make no result');

    const open = await Submission.query(trx).findOne({ testId: test.id, state: 'awaiting_approval' });
    if (open) throw illegal('Already awaiting approval', `Submission ${open.sequence} of this test is awaiting approval; it must be approved or sent back first.`);
    const latest = (await Submission.query(trx).where('testId', test.id).max('sequence as sequence').first()) as unknown as { sequence: number | null } | undefined;
    const submission = await Submission.query(trx)
      .insert({ testId: test.id, sequence: (latest?.sequence ?? 0) + 1, state: 'awaiting_approval', note, submittedBy: caller.id })
      .returning('*');
    await trx('submissionReductions').insert(reductions.map((r) => ({ submissionId: submission.id, reductionId: r.id, runId: r.runId })));
    await recordAudit(trx, {
      actorId: caller.id,
      action: 'submission.submitted',
      entity: 'test',
      entityId: test.id,
      after: { submissionId: submission.id, sequence: submission.sequence, reductions: reductions.map((r) => ({ reductionId: r.id, runNumber: runs.find((x) => x.id === r.runId)?.runNumber, version: r.version })), note },
    });
    return submission;
  });
}

/** Everyone who uploaded a raw file reduced by the submission's reductions. */
async function uploaders(trx: Knex.Transaction, submissionId: string): Promise<Set<string>> {
  const rows = (await trx('submissionReductions')
    .join('reductions', 'reductions.id', 'submissionReductions.reductionId')
    .join('rawFiles', 'rawFiles.id', 'reductions.rawFileId')
    .where('submissionReductions.submissionId', submissionId)
    .distinct('rawFiles.uploadedBy')) as { uploadedBy: string }[];
  return new Set(rows.map((r) => r.uploadedBy));
}

/** Four-eyes: whoever uploaded a run's file or submitted the results may not also decide on them. */
async function requireSecondPerson(trx: Knex.Transaction, submission: Submission, caller: User, action: string): Promise<void> {
  if ((await uploaders(trx, submission.id)).has(caller.id)) {
    throw new HttpError(403, 'Second person needed', `You cannot ${action}: you uploaded a run file of this submission, and results are checked by someone other than who measured them.`);
  }
  if (submission.submittedBy === caller.id) {
    throw new HttpError(403, 'Second person needed', `You cannot ${action}: you submitted it, and results are checked by someone other than who put them forward.`);
  }
}

/** Approves a submission and freezes its reductions; from here on the database refuses to change them. */
export async function approveSubmission(knex: Knex, id: string, comment: string, caller: User): Promise<Submission> {
  return knex.transaction(async (trx) => {
    const submission = await lockedSubmission(trx, id);
    if (submission.state !== 'awaiting_approval') throw illegal('Not awaiting approval', `This submission is ${stateWords[submission.state]}; only one awaiting approval can be approved.`);
    await requireSigningRight(trx, caller, 'approve results');
    await requireSecondPerson(trx, submission, caller, 'approve this submission');
    const now = new Date();
    const after = await Submission.query(trx).patchAndFetchById(submission.id, { state: 'approved', decidedBy: caller.id, decidedAt: now, decisionReason: comment || null });
    const reductionIds = ((await trx('submissionReductions').where('submissionId', submission.id)) as { reductionId: string }[]).map((r) => r.reductionId);
    await Reduction.query(trx).whereIn('id', reductionIds).whereNull('approvedAt').patch({ approvedAt: now });
    await recordAudit(trx, {
      actorId: caller.id,
      action: 'submission.approved',
      entity: 'test',
      entityId: submission.testId,
      before: { state: submission.state },
      after: { submissionId: submission.id, sequence: submission.sequence, state: 'approved', reductionIds, comment },
    });
    return after;
  });
}

/** Sends a submission back with the reason; its reductions stay open to exclusions and re-reduction. */
export async function sendBackSubmission(knex: Knex, id: string, reason: string, caller: User): Promise<Submission> {
  return knex.transaction(async (trx) => {
    const submission = await lockedSubmission(trx, id);
    if (submission.state !== 'awaiting_approval') throw illegal('Not awaiting approval', `This submission is ${stateWords[submission.state]}; only one awaiting approval can be sent back.`);
    await requireSigningRight(trx, caller, 'send results back');
    await requireSecondPerson(trx, submission, caller, 'send this submission back');
    const after = await Submission.query(trx).patchAndFetchById(submission.id, { state: 'sent_back', decidedBy: caller.id, decidedAt: new Date(), decisionReason: reason });
    await recordAudit(trx, {
      actorId: caller.id,
      action: 'submission.sent_back',
      entity: 'test',
      entityId: submission.testId,
      before: { state: submission.state },
      after: { submissionId: submission.id, sequence: submission.sequence, state: 'sent_back', reason },
    });
    return after;
  });
}

/** Counts the pages of a PDF written by pdfkit (page objects are not compressed). */
export function pdfPageCount(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-zA-Z])/g) ?? []).length;
}

/** Allocates the next report series of `year`, e.g. BAL-2026-0007, in the transaction. */
async function nextSeries(trx: Knex.Transaction, prefix: string, year: number): Promise<string> {
  const row = (await trx.raw('INSERT INTO report_number_counters (year, last) VALUES (?, 1) ON CONFLICT (year) DO UPDATE SET last = report_number_counters.last + 1 RETURNING last', [year])) as { rows: { last: number }[] };
  return `${prefix}-${year}-${String(row.rows[0]!.last).padStart(4, '0')}`;
}

export interface IssuedSheet {
  sheet: ResultSheet;
  superseded: ResultSheet | undefined;
}

/**
 * Issues the certified sheet of an approved submission: renders the PDF, records its SHA-256, publishes it to the
 * customer and, when the test already has a valid sheet, makes this the next revision and marks that one superseded.
 * Everything commits together or not at all.
 */
export async function issueSheet(knex: Knex, submissionId: string, revisionReason: string, caller: User, publicUrl: string, now: Date = new Date()): Promise<IssuedSheet> {
  return knex.transaction(async (trx) => {
    const submission = await lockedSubmission(trx, submissionId);
    if (submission.state !== 'approved') throw illegal('Not approved', `This submission is ${stateWords[submission.state]}; only approved results can be issued.`);
    const test = await TestRecord.query(trx).findById(submission.testId).forUpdate().throwIfNotFound();
    if (await ResultSheet.query(trx).select('id').findOne({ submissionId: submission.id })) {
      throw illegal('Already issued', 'A sheet has already been issued from this submission; correct it by submitting and approving new results, then issue a revision.');
    }
    // Results approved later replace these: issuing the older ones now would supersede the newer results with them.
    const later = await Submission.query(trx).select('sequence').where('testId', submission.testId).where('state', 'approved').where('sequence', '>', submission.sequence).orderBy('sequence').first();
    if (later) {
      throw illegal('Newer results approved', `Submission ${later.sequence} of this test was approved after this one (${submission.sequence}); issue from the newest approved results.`);
    }
    if (caller.role !== 'lab_manager') await requireSigningRight(trx, caller, 'issue result sheets');
    const previous = await ResultSheet.query(trx).select('id', 'series', 'revision', 'reportNumber').where({ testId: submission.testId, state: 'valid' }).forUpdate().first();
    if (previous && revisionReason.trim().length < 10) {
      throw HttpError.field('revisionReason', `This test already has sheet ${previous.reportNumber}; say in at least 10 characters why the new revision replaces it`);
    }
    const lab = await Organisation.query(trx).findOne({ kind: 'lab' }).throwIfNotFound();
    const issueDate = dateInZone(now, lab.timeZone ?? 'UTC');
    const series = previous ? previous.series : await nextSeries(trx, reportSettings(lab).reportPrefix ?? 'TW', Number(issueDate.slice(0, 4)));
    const revision = previous ? previous.revision + 1 : 1;
    const reportNumber = `${series}-R${revision}`;
    const approver = await User.query(trx).findById(submission.decidedBy!).throwIfNotFound();

    const data = await buildSheetData(trx, submission, {
      reportNumber,
      revision,
      issueDate,
      publicUrl,
      authorisedBy: approver,
      ...(previous ? { replaces: { number: previous.reportNumber, revision: previous.revision, reason: revisionReason.trim() } } : {}),
    });
    const pdf = await renderResultSheet(data);
    const sheet = await ResultSheet.query(trx)
      .insert({
        testId: submission.testId,
        submissionId: submission.id,
        series,
        revision,
        reportNumber,
        state: 'valid',
        revisionReason: previous ? revisionReason.trim() : null,
        supersedesId: previous?.id ?? null,
        supersededById: null,
        supersededAt: null,
        issueDate,
        issuedBy: caller.id,
        authorisedBy: approver.id,
        sha256: sha256Hex(pdf),
        size: pdf.length,
        pdf,
        pageCount: pdfPageCount(pdf),
        data: data as unknown as Record<string, unknown>,
      })
      .returning(['id', 'testId', 'submissionId', 'series', 'revision', 'reportNumber', 'state', 'revisionReason', 'supersedesId', 'supersededById', 'supersededAt', 'issueDate', 'issuedBy', 'authorisedBy', 'sha256', 'size', 'pageCount', 'createdAt', 'updatedAt']);
    let superseded: ResultSheet | undefined;
    if (previous) {
      superseded = await ResultSheet.query(trx)
        .patchAndFetchById(previous.id, { state: 'superseded', supersededById: sheet.id, supersededAt: now })
        .select('id', 'reportNumber', 'state', 'supersededById');
      await recordAudit(trx, { actorId: caller.id, action: 'sheet.superseded', entity: 'test', entityId: submission.testId, after: { sheetId: previous.id, reportNumber: previous.reportNumber, successorId: sheet.id, successor: reportNumber, reason: revisionReason.trim() } });
    }
    await recordAudit(trx, {
      actorId: caller.id,
      action: 'sheet.issued',
      entity: 'test',
      entityId: submission.testId,
      after: { sheetId: sheet.id, reportNumber, revision, submissionId: submission.id, sha256: sheet.sha256, size: pdf.length, authorisedBy: approver.id, ...(previous ? { replaces: previous.reportNumber, reason: revisionReason.trim() } : {}) },
    });
    // A certified sheet ends the tunnel work of a planned or running test; a revision leaves its state alone.
    if (test.state === 'planned' || test.state === 'running') {
      await TestRecord.query(trx).patch({ state: 'complete' }).where({ id: test.id });
      await recordAudit(trx, { actorId: caller.id, action: 'test.completed', entity: 'test', entityId: test.id, before: { state: test.state }, after: { state: 'complete', reportNumber } });
    }
    return { sheet, superseded };
  });
}

/** The customer users a sheet is published to: the active customer accounts of the test's organisation. */
export async function sheetRecipients(knex: Knex, testId: string): Promise<User[]> {
  const test = await TestRecord.query(knex).findById(testId).throwIfNotFound();
  return User.query(knex).where({ organisationId: test.organisationId, role: 'customer', active: true }).orderBy('email');
}
