import type { Knex } from 'knex';
import { BalanceCalibration, createRawStore, Organisation, RawFile, recordAudit, Reduction, ResultSheet, Run, SigningRight, Submission, TestRecord, User } from '@tunnelwright/db';
import { buildReductionConfig } from '../../apps/api/src/ingest/build-reduction-config';
import { queueReduction } from '../../apps/api/src/ingest/queue-reduction';
import { approveSubmission, issueSheet, submitForApproval } from '../../apps/api/src/approval/workflow';
import { runReduction } from '../../apps/worker/src/reductions/run-reduction';
import { demoCustomers } from './demo-users';

/** What the demo lab prints on its sheets. Invented: the address is made up and the number is in a range set aside for drama. */
const labReport = {
  addressLines: ['Unit 4, Moss Lane Research Park', 'Brackenmoor BK3 9WT', 'United Kingdom'],
  phone: '+44 1632 960 257',
  email: 'results@brackenmoor.example',
  site: 'Moss Lane site',
  reportPrefix: 'BAL',
  documentedMethod: 'BAL-M-02 issue 2: six-component force and moment testing of road-vehicle and structure models',
};

const customerAddresses: Record<string, string[]> = {
  [demoCustomers.quillfen]: ['2 Ferry Wharf', 'Quillfen QF1 4AA', 'United Kingdom'],
  [demoCustomers.tarnwick]: ['Building 9, Tarn Road', 'Tarnwick TW8 2PL', 'United Kingdom'],
};

export const certifiedTitle = 'Estate car yaw sweep, baseline and mirrors off';
const pendingTitle = 'Delivery van drag at yaw, open jet';

async function byEmail(knex: Knex, email: string): Promise<User> {
  const user = await User.query(knex).findOne({ email });
  if (!user) throw new Error(`the approval demo needs ${email}`);
  return user;
}

async function demoTest(knex: Knex, customer: string, title: string): Promise<TestRecord | undefined> {
  const organisation = await Organisation.query(knex).findOne({ name: customer });
  return organisation ? TestRecord.query(knex).findOne({ organisationId: organisation.id, title }) : undefined;
}

/** The finished reduction of run 1 of a test, version `version`, if there is one. */
async function reductionOf(knex: Knex, testId: string, version: number): Promise<Reduction | undefined> {
  const run = await Run.query(knex).findOne({ testId, runNumber: 1 });
  return run ? Reduction.query(knex).findOne({ runId: run.id, version, state: 'done' }) : undefined;
}

/**
 * Seeds the approval story: the lab's sheet details and customers' addresses, the demo analyst's right to sign,
 * Quillfen's estate-car test certified twice (revision 1, then revision 2 after the wake blockage was re-evaluated
 * with Maskell's method, so revision 1 is superseded), and Tarnwick's van test submitted and awaiting approval, for
 * the analyst to approve and issue by hand. Idempotent: each step is skipped when its record exists.
 */
export async function seedApproval(knex: Knex, created: string[], publicUrl: string): Promise<void> {
  const manager = await byEmail(knex, 'manager@brackenmoor.example');
  const analyst = await byEmail(knex, 'analyst@brackenmoor.example');
  const technician = await byEmail(knex, 'technician@brackenmoor.example');

  const lab = await Organisation.query(knex).findOne({ kind: 'lab' });
  if (lab && !lab.settings?.['report']) {
    await Organisation.query(knex).findById(lab.id).patch({ settings: { ...lab.settings, report: labReport } });
    created.push('sheet details of the laboratory');
  }
  for (const [name, addressLines] of Object.entries(customerAddresses)) {
    const organisation = await Organisation.query(knex).findOne({ name });
    if (organisation && !(organisation.settings as { addressLines?: string[] })?.addressLines) {
      await Organisation.query(knex).findById(organisation.id).patch({ settings: { ...organisation.settings, addressLines } });
      created.push(`address of ${name}`);
    }
  }

  if (!(await SigningRight.query(knex).findOne({ userId: analyst.id }))) {
    await knex.transaction(async (trx) => {
      const right = await SigningRight.query(trx).insert({ userId: analyst.id, grantedBy: manager.id, scopeNote: 'Force and moment tests in both tunnels' });
      await recordAudit(trx, { actorId: manager.id, action: 'signing_right.granted', entity: 'user', entityId: analyst.id, after: { signingRightId: right.id, scopeNote: right.scopeNote } });
    });
    created.push(`signing right of ${analyst.email}`);
  }

  const certified = await demoTest(knex, demoCustomers.quillfen, certifiedTitle);
  if (certified && (await ResultSheet.query(knex).where('testId', certified.id).resultSize()) === 0) {
    const first = await reductionOf(knex, certified.id, 1);
    if (!first) throw new Error('the approval demo needs the reduced run 1 of the estate-car test');
    const submitted = await submitForApproval(knex, certified.id, [first.id], 'Baseline yaw sweep as run.', technician);
    await approveSubmission(knex, submitted.id, 'Repeatability and balance loads within the method limits.', analyst);
    const r1 = await issueSheet(knex, submitted.id, '', analyst, publicUrl);
    created.push(`result sheet ${r1.sheet.reportNumber}`);

    // The correction: run 1 reduced again with Maskell's bluff-body wake blockage, then certified as revision 2.
    const second = (await reductionOf(knex, certified.id, 2)) ?? (await reduceAgainWithMaskell(knex, certified, first, technician));
    const point = await knex('reductionPoints').where({ reductionId: second.id }).orderBy('index', 'desc').first('index');
    if (point) {
      await knex('pointExclusions').insert({ reductionId: second.id, pointIndex: point.index, reason: 'Balance axial reading drifted during the point; measured but not reported', excludedBy: analyst.id });
    }
    const resubmitted = await submitForApproval(knex, certified.id, [second.id], "Run 1 reduced again with Maskell's wake blockage.", technician);
    await approveSubmission(knex, resubmitted.id, 'Maskell is the right wake model for this bluff body.', analyst);
    const r2 = await issueSheet(knex, resubmitted.id, "Wake blockage re-evaluated with Maskell's method for a bluff body; the last point excluded for balance drift", analyst, publicUrl);
    created.push(`result sheet ${r2.sheet.reportNumber}, superseding ${r1.sheet.reportNumber}`);
  }

  const pending = await demoTest(knex, demoCustomers.tarnwick, pendingTitle);
  if (pending && (await Submission.query(knex).where('testId', pending.id).resultSize()) === 0) {
    const reduction = await reductionOf(knex, pending.id, 1);
    if (reduction) {
      await submitForApproval(knex, pending.id, [reduction.id], 'Open-jet yaw sweep, ready for checking.', technician);
      created.push(`submission of "${pendingTitle}" awaiting approval`);
    }
  }
}

async function reduceAgainWithMaskell(knex: Knex, test: TestRecord, first: Reduction, technician: User): Promise<Reduction> {
  const full = await TestRecord.query(knex).findById(test.id).withGraphFetched('[article, tunnel, balance]').throwIfNotFound();
  const calibration = full.balanceId ? await BalanceCalibration.query(knex).where('balanceId', full.balanceId).orderBy('version', 'desc').first() : undefined;
  const config = buildReductionConfig(full, calibration, { corrections: { wakeBlockage: 'maskell' } });
  const rawFile = await RawFile.query(knex).findById(first.rawFileId).throwIfNotFound();
  const reductionId = await knex.transaction(async (trx) => {
    const queued = await queueReduction(trx, { runId: first.runId, rawFileId: rawFile.id, inputSha256: rawFile.sha256, config, calibration: { calibration, overrideId: null }, createdBy: technician.id });
    await trx('outbox').where('id', queued.outboxId).update({ dispatchedAt: new Date() });
    return queued.reduction.id;
  });
  await runReduction(knex, createRawStore(), reductionId, () => undefined);
  return Reduction.query(knex).findById(reductionId).throwIfNotFound();
}
