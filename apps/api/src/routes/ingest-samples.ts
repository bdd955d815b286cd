import { randomBytes } from 'node:crypto';
import {
  Balance,
  BalanceCalibration,
  createRawStore,
  ImportProfile,
  Organisation,
  RawFile,
  Reduction,
  ReductionPoint,
  Run,
  TestArticle,
  TestRecord,
  User,
} from '@tunnelwright/db';
import type { SampleFixtures } from './route';

/**
 * Records the role × route matrix needs for the ingest routes, made through the models (bound to the
 * app's database). Every record belongs to the matrix customer's organisation.
 */

const identity = [
  [1, 0, 0, 0, 0, 0],
  [0, 1, 0, 0, 0, 0],
  [0, 0, 1, 0, 0, 0],
  [0, 0, 0, 1, 0, 0],
  [0, 0, 0, 0, 1, 0],
  [0, 0, 0, 0, 0, 1],
];

/** A small valid run file (two points of two samples each), invented values. */
export const sampleRunFile =
  'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]\n' +
  '0.00, 1, 0.0, 0.0, 850.2, 1013.25, 20.5, 45, 12.5, -0.3, 150.2, 0.01, -2.5, 0.03\n' +
  '0.01, 1, 0.0, 0.0, 850.4, 1013.25, 20.5, 45, 12.6, -0.3, 150.1, 0.01, -2.5, 0.03\n' +
  '0.02, 2, 5.0, 0.0, 850.1, 1013.25, 20.5, 45, 12.9, 8.1, 150.4, 0.31, -2.4, 1.03\n' +
  '0.03, 2, 5.0, 0.0, 850.3, 1013.25, 20.5, 45, 12.8, 8.2, 150.3, 0.30, -2.4, 1.02\n';

async function staffUserId(f: SampleFixtures): Promise<string> {
  const lab = await Organisation.query().findOne({ kind: 'lab' });
  if (!lab) throw new Error('the matrix needs the lab organisation');
  const user = await User.query().insert({ email: `ingest-sample-${f.unique()}@example.com`, name: 'Sample analyst', role: 'analyst', organisationId: lab.id, passwordHash: null, active: true });
  return user.id;
}

/** A test article body for the customer organisation. */
export async function sampleArticleBody(f: SampleFixtures) {
  return { organisationId: await f.customerOrganisationId(), name: `Matrix article ${f.unique()}`, kind: 'road_vehicle', referenceArea: 0.14, referenceAreaKind: 'frontal', referenceLength: 0.7, volume: 0.1 };
}

export async function sampleArticleId(f: SampleFixtures): Promise<string> {
  const body = await sampleArticleBody(f);
  const article = await TestArticle.query().insert({ ...body, kind: 'road_vehicle', referenceAreaKind: 'frontal', description: '', conditionOnReceipt: '', frontalArea: null, momentCentreX: 0, momentCentreY: 0, momentCentreZ: 0, scale: 1 });
  return article.id;
}

export function sampleBalanceBody(f: SampleFixtures) {
  return { identifier: `MX-${f.unique()}`, capacities: [400, 400, 1200, 120, 200, 120] };
}

export function sampleCalibrationBody() {
  return { matrices: { linear: identity }, calibratedOn: '2026-01-05', dueOn: '2099-01-05' };
}

/** A balance with one calibration, overdue if asked. */
export async function sampleBalanceId(f: SampleFixtures, overdue = false): Promise<string> {
  const balance = await Balance.query().insert({ ...sampleBalanceBody(f), description: '' });
  await BalanceCalibration.query().insert({ balanceId: balance.id, version: 1, matrices: { linear: identity }, calibratedOn: '2025-01-05', dueOn: overdue ? '2025-06-05' : '2099-01-05', enteredBy: await staffUserId(f) });
  return balance.id;
}

export async function sampleTestBody(f: SampleFixtures) {
  return { organisationId: await f.customerOrganisationId(), articleId: await sampleArticleId(f), tunnelId: await f.tunnelId(), balanceId: await sampleBalanceId(f), title: `Matrix test ${f.unique()}` };
}

export async function sampleTestId(f: SampleFixtures, overdue = false): Promise<string> {
  const body = await sampleTestBody(f);
  if (overdue) body.balanceId = await sampleBalanceId(f, true);
  const test = await TestRecord.query().insert({ ...body, state: 'running', configurations: [], reductionSettings: {}, bookingId: null, createdBy: await staffUserId(f) });
  return test.id;
}

/** A data run of a customer test, with the sample run file stored and recorded. */
export async function sampleRunId(f: SampleFixtures): Promise<string> {
  const createdBy = await staffUserId(f);
  const run = await Run.query().insert({ testId: await sampleTestId(f), runNumber: 1, kind: 'data', configurationLabel: '', notes: '', createdBy });
  const stored = await createRawStore().put([Buffer.from(`# sample: ${randomBytes(6).toString('hex')}\n${sampleRunFile}`)]);
  await RawFile.query().insert({ runId: run.id, originalName: 'sample.csv', size: stored.size, sha256: stored.sha256, storageKey: stored.key, uploadedBy: createdBy });
  return run.id;
}

/** A finished reduction (with two points) of a sample run, version `version`. */
async function doneReduction(runId: string, version: number, dragCounts: number): Promise<string> {
  const run = await Run.query().findById(runId);
  const rawFile = await RawFile.query().findOne({ runId });
  if (!run || !rawFile) throw new Error('sample run missing');
  const reduction = await Reduction.query().insert({
    runId,
    rawFileId: rawFile.id,
    version,
    engineVersion: 'sample',
    config: {},
    calibrationId: null,
    overrideId: null,
    state: 'done',
    progress: 1,
    inputSha256: rawFile.sha256,
    warnings: [],
    summary: { sampleCount: 4 },
    createdBy: run.createdBy,
    startedAt: new Date(),
    finishedAt: new Date(),
  });
  for (const index of [0, 1]) {
    await ReductionPoint.query().insert({
      reductionId: reduction.id,
      index,
      pointNumber: index + 1,
      sampleCount: 2,
      yaw: index * 5,
      pitch: 0,
      dynamicPressure: 850,
      speed: 37,
      reynoldsNumber: 1.7e6,
      cdUncorrected: dragCounts / 1e4,
      cdCorrected: dragCounts / 1e4,
      clCorrected: 0,
      csCorrected: 0,
      dragCounts,
      setpoints: { yaw: index * 5, pitch: 0 },
      result: {},
    });
  }
  return reduction.id;
}

export async function sampleReductionId(f: SampleFixtures): Promise<string> {
  return doneReduction(await sampleRunId(f), 1, 3000);
}

/** A run with two finished reduction versions, 1 and 2. */
export async function sampleComparedRunId(f: SampleFixtures): Promise<string> {
  const runId = await sampleRunId(f);
  await doneReduction(runId, 1, 3000);
  await doneReduction(runId, 2, 2950);
  return runId;
}

/** A saved import profile of the lab, for the profile routes of the matrix. */
export async function sampleImportProfileId(f: SampleFixtures): Promise<string> {
  const profile = await ImportProfile.query().insert({
    name: `Matrix profile ${f.unique()}`,
    description: 'semicolon export with decimal comma',
    profile: { name: 'matrix', delimiter: ';', decimalComma: true, skipLines: 0, unitsRow: false, columns: [], unmappedColumns: 'keep' },
    createdBy: await staffUserId(f),
    archived: false,
  });
  return profile.id;
}
