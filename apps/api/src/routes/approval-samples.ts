import { readFileSync } from 'node:fs';
import { Readable } from 'node:stream';
import { fileURLToPath } from 'node:url';
import { parseReductionConfig, reduceRun, type ReductionResult } from '@tunnelwright/aero';
import { createRawStore, Organisation, RawFile, Reduction, Run, SigningRight, Submission, User } from '@tunnelwright/db';
import { issueSheet } from '../approval/workflow';
import { storeEngineReduction } from './engine-reduction-samples';
import type { SampleFixtures } from './route';
import { sampleTestId } from './ingest-samples';

/**
 * Records the role × route matrix (and the approval tests) need for the approval and result-sheet routes: a test
 * with a data run really reduced by the engine from the closed-section example shipped with libs/aero, uploaded by a
 * technician, so no matrix principal is its uploader.
 */

const EXAMPLES = new URL('../../../../libs/aero/examples/', import.meta.url);
let example: Promise<ReductionResult> | undefined;

/** The example yaw sweep reduced once per process. */
export function exampleReduction(): Promise<ReductionResult> {
  example ??= (async () => {
    const config = parseReductionConfig(JSON.parse(readFileSync(fileURLToPath(new URL('closed-car-yaw-sweep.config.json', EXAMPLES)), 'utf8')));
    const text = readFileSync(fileURLToPath(new URL('closed-car-yaw-sweep.csv', EXAMPLES)));
    return reduceRun(Readable.from([text]), config, { fileName: 'closed-car-yaw-sweep.csv' });
  })();
  return example;
}

async function labUser(f: SampleFixtures, role: 'technician' | 'analyst' | 'lab_manager'): Promise<User> {
  const lab = await Organisation.query().findOne({ kind: 'lab' });
  if (!lab) throw new Error('the samples need the lab organisation');
  return User.query().insert({ email: `approval-${role.replace('_', '-')}-${f.unique()}@example.com`, name: `Sample ${role}`, role, organisationId: lab.id, passwordHash: null, active: true });
}

export interface ReducedSample {
  testId: string;
  runId: string;
  reductionId: string;
  uploaderId: string;
}

/** A customer test with one data run, its raw file uploaded by a fresh technician, and a finished reduction of it. */
export async function sampleReducedRun(f: SampleFixtures, testId?: string, uploader?: User): Promise<ReducedSample> {
  const technician = uploader ?? (await labUser(f, 'technician'));
  const test = testId ?? (await sampleTestId(f));
  const latest = (await Run.query().where('testId', test).max('runNumber as runNumber').first()) as unknown as { runNumber: number | null } | undefined;
  const run = await Run.query().insert({ testId: test, runNumber: (latest?.runNumber ?? 0) + 1, kind: 'data', configurationLabel: 'Baseline', notes: '', createdBy: technician.id });
  const bytes = Buffer.concat([Buffer.from(`# sample ${f.unique()}\n`), readFileSync(fileURLToPath(new URL('closed-car-yaw-sweep.csv', EXAMPLES)))]);
  const stored = await createRawStore().put([bytes]);
  const file = await RawFile.query().insert({ runId: run.id, originalName: 'closed-car-yaw-sweep.csv', size: stored.size, sha256: stored.sha256, storageKey: stored.key, uploadedBy: technician.id });
  const result = await exampleReduction();
  const reduction = await storeEngineReduction({ runId: run.id, rawFileId: file.id, inputSha256: stored.sha256, createdBy: technician.id }, result);
  return { testId: test, runId: run.id, reductionId: reduction.id, uploaderId: technician.id };
}

/** Gives every analyst of the lab a current signing right, so any matrix analyst may decide. */
export async function grantEveryAnalyst(f: SampleFixtures): Promise<void> {
  const manager = await labUser(f, 'lab_manager');
  const analysts = await User.query().where({ role: 'analyst', active: true }).whereNotExists(SigningRight.query().whereColumn('signingRights.userId', 'users.id').whereNull('revokedAt'));
  if (analysts.length > 0) await SigningRight.query().insert(analysts.map((a) => ({ userId: a.id, grantedBy: manager.id, scopeNote: 'matrix' })));
}

/** A submission of a fresh reduced run, awaiting approval or already approved by a fresh signatory. */
export async function sampleSubmission(f: SampleFixtures, state: 'awaiting_approval' | 'approved' = 'awaiting_approval', testId?: string): Promise<{ submissionId: string } & ReducedSample> {
  const reduced = await sampleReducedRun(f, testId);
  const latest = (await Submission.query().where('testId', reduced.testId).max('sequence as sequence').first()) as unknown as { sequence: number | null } | undefined;
  const submission = await Submission.query().insert({ testId: reduced.testId, sequence: (latest?.sequence ?? 0) + 1, state: 'awaiting_approval', note: '', submittedBy: reduced.uploaderId });
  await Submission.knex()('submissionReductions').insert({ submissionId: submission.id, reductionId: reduced.reductionId, runId: reduced.runId });
  if (state === 'approved') {
    const analyst = await labUser(f, 'analyst');
    await SigningRight.query().insert({ userId: analyst.id, grantedBy: reduced.uploaderId, scopeNote: '' });
    const now = new Date();
    await Submission.query().patchAndFetchById(submission.id, { state: 'approved', decidedBy: analyst.id, decidedAt: now, decisionReason: null });
    await Reduction.query().findById(reduced.reductionId).patch({ approvedAt: now });
  }
  return { submissionId: submission.id, ...reduced };
}

const issued = new Map<string, Promise<{ sheetId: string; reportNumber: string }>>();

/** One issued sheet of the matrix customer's organisation, made once per process and organisation. */
export function sampleIssuedSheet(f: SampleFixtures): Promise<{ sheetId: string; reportNumber: string }> {
  return f.customerOrganisationId().then((organisationId) => {
    let sheet = issued.get(organisationId);
    if (!sheet) {
      sheet = (async () => {
        const { submissionId } = await sampleSubmission(f, 'approved');
        const manager = await labUser(f, 'lab_manager');
        const { sheet: made } = await issueSheet(Submission.knex(), submissionId, '', manager, 'http://localhost:3000');
        return { sheetId: made.id, reportNumber: made.reportNumber };
      })();
      issued.set(organisationId, sheet);
    }
    return sheet;
  });
}
