import { createReadStream, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { Knex } from 'knex';
import { Balance, BalanceCalibration, createRawStore, Organisation, RawFile, recordAudit, Run, TestArticle, TestRecord, Tunnel, User } from '@tunnelwright/db';
import { buildReductionConfig } from '../../apps/api/src/ingest/build-reduction-config';
import { queueReduction } from '../../apps/api/src/ingest/queue-reduction';
import { runReduction } from '../../apps/worker/src/reductions/run-reduction';
import { demoTunnels } from './catalogue';
import { demoCustomers } from './demo-users';

const examples = fileURLToPath(new URL('../../libs/aero/examples/', import.meta.url));
const example = (name: string) => JSON.parse(readFileSync(`${examples}${name}.config.json`, 'utf8')) as Record<string, Record<string, unknown>>;

/** The demo balance; its current calibration is the one of the open-jet example (invented matrices). */
const demoBalance = { identifier: 'SIX-COMPONENT 01', description: 'Six-component strain-gauge balance under the turntable (invented).' };

interface DemoRun {
  customer: string;
  tunnel: string;
  article: Omit<TestArticle, 'id' | 'organisationId' | 'createdAt' | 'updatedAt' | '$id'> & Record<string, unknown>;
  title: string;
  example: string;
  runNumber: number;
  configurationLabel: string;
  settings: TestRecord['reductionSettings'];
}

function demoRuns(): DemoRun[] {
  const closed = example('closed-car-yaw-sweep');
  const open = example('open-jet-bridges');
  return [
    {
      customer: demoCustomers.quillfen,
      tunnel: 'Tunnel 1 — closed section',
      article: { name: 'Estate car model, 1:4', description: 'Quarter-scale estate car with detailed underbody (invented).', kind: 'road_vehicle', conditionOnReceipt: 'Good; one mirror cap loose, refitted.', referenceArea: 0.1375, referenceAreaKind: 'frontal', referenceLength: 0.72, volume: 0.105, frontalArea: 0.1375, momentCentreX: 0, momentCentreY: 0, momentCentreZ: 0, scale: 4 },
      title: 'Estate car yaw sweep, baseline and mirrors off',
      example: 'closed-car-yaw-sweep',
      runNumber: 1,
      configurationLabel: 'baseline',
      settings: { zeros: closed.zeros, corrections: closed.corrections, densityModel: closed.densityModel, fullScale: closed.fullScale, windAveraging: closed.windAveraging, uncertainty: closed.uncertainty, minimumSamplesPerPoint: closed.minimumSamplesPerPoint },
    },
    {
      customer: demoCustomers.tarnwick,
      tunnel: 'Tunnel 2 — open jet',
      article: { name: 'Delivery van model, 40 %', description: '40 % scale panel van (invented).', kind: 'road_vehicle', conditionOnReceipt: 'As new.', referenceArea: 0.352, referenceAreaKind: 'frontal', referenceLength: 1.16, volume: 0.46, frontalArea: null, momentCentreX: 0, momentCentreY: 0, momentCentreZ: 0, scale: 2.5 },
      title: 'Delivery van drag at yaw, open jet',
      example: 'open-jet-bridges',
      runNumber: 1,
      configurationLabel: 'baseline',
      settings: { zeros: open.zeros, corrections: open.corrections, densityModel: open.densityModel, fullScale: open.fullScale, windAveraging: open.windAveraging, uncertainty: open.uncertainty, minimumSamplesPerPoint: open.minimumSamplesPerPoint, centreOffset: (open.balance as { centreOffset?: number[] }).centreOffset },
    },
  ] as unknown as DemoRun[];
}

/**
 * Seeds test articles for both invented customers, a balance with a current calibration, one test each,
 * and run 1 of each uploaded from `libs/aero/examples/` and reduced at once with the worker's own code.
 * Idempotent: records are found by their natural keys and left alone if present.
 */
export async function seedIngest(knex: Knex, created: string[]): Promise<void> {
  const store = createRawStore();
  const manager = await User.query(knex).findOne({ role: 'lab_manager' });
  const technician = (await User.query(knex).findOne({ role: 'technician' })) ?? manager;
  if (!manager || !technician) throw new Error('the ingest demo needs the demo lab manager and technician');

  let balance = await Balance.query(knex).findOne({ identifier: demoBalance.identifier });
  if (!balance) {
    const open = example('open-jet-bridges');
    const calibration = (open.balance as { capacities: number[]; calibration: { linear: number[][]; interaction?: number[][] } });
    // Installed under the turntable of the closed-section tunnel; the catalogue shows its capacities there.
    const turntable = await Tunnel.query(knex).findOne({ name: demoTunnels[0]!.name });
    balance = await knex.transaction(async (trx) => {
      const b = await Balance.query(trx).insert({ ...demoBalance, capacities: calibration.capacities, tunnelId: turntable?.id ?? null });
      await BalanceCalibration.query(trx).insert({ balanceId: b.id, version: 1, matrices: { linear: calibration.calibration.linear, interaction: calibration.calibration.interaction }, calibratedOn: '2026-06-15', dueOn: '2027-06-15', enteredBy: manager.id });
      await recordAudit(trx, { actorId: manager.id, action: 'balance.created', entity: 'balance', entityId: b.id, after: { identifier: b.identifier } });
      return b;
    });
    created.push(`balance ${demoBalance.identifier} with calibration version 1`);
  }

  for (const demo of demoRuns()) {
    const organisation = await Organisation.query(knex).findOne({ name: demo.customer });
    const tunnel = await Tunnel.query(knex).findOne({ name: demo.tunnel });
    if (!organisation || !tunnel) throw new Error(`the ingest demo needs ${demo.customer} and ${demo.tunnel}`);
    let article = await TestArticle.query(knex).findOne({ organisationId: organisation.id, name: demo.article.name });
    if (!article) {
      // Logged in by the lab three days before its runs, which the seed makes today.
      const receivedOn = new Date(Date.now() - 3 * 86_400_000).toISOString().slice(0, 10);
      article = await TestArticle.query(knex).insert({ ...demo.article, organisationId: organisation.id, receivedOn });
      created.push(`test article ${demo.article.name}`);
    }
    let test = await TestRecord.query(knex).findOne({ organisationId: organisation.id, title: demo.title });
    if (!test) {
      test = await TestRecord.query(knex).insert({
        organisationId: organisation.id,
        articleId: article.id,
        tunnelId: tunnel.id,
        balanceId: balance.id,
        bookingId: null,
        title: demo.title,
        state: 'running',
        configurations: [{ label: 'baseline', description: 'As delivered' }],
        reductionSettings: demo.settings,
        createdBy: manager.id,
      });
      created.push(`test ${demo.title}`);
    }
    let run = await Run.query(knex).findOne({ testId: test.id, runNumber: demo.runNumber });
    if (!run) {
      run = await Run.query(knex).insert({ testId: test.id, runNumber: demo.runNumber, kind: 'data', configurationLabel: demo.configurationLabel, notes: 'Demo run from the example file.', createdBy: technician.id });
      created.push(`run ${demo.runNumber} of ${demo.title}`);
    }
    if (await RawFile.query(knex).findOne({ runId: run.id })) continue;

    const fileName = `${demo.example}.csv`;
    const stored = await store.put(createReadStream(`${examples}${fileName}`));
    const full = await TestRecord.query(knex).findById(test.id).withGraphFetched('[article, tunnel, balance]');
    if (!full) throw new Error('test vanished while seeding');
    const calibration = await BalanceCalibration.query(knex).where('balanceId', balance.id).orderBy('version', 'desc').first();
    const config = buildReductionConfig(full, calibration, {});
    const reductionId = await knex.transaction(async (trx) => {
      const rawFile = await RawFile.query(trx).insert({ runId: run.id, originalName: fileName, size: stored.size, sha256: stored.sha256, storageKey: stored.key, uploadedBy: technician.id });
      const queued = await queueReduction(trx, { runId: run.id, rawFileId: rawFile.id, inputSha256: stored.sha256, config, calibration: { calibration, overrideId: null }, createdBy: technician.id });
      // Reduced right here, so the outbox message is spent at once.
      await trx('outbox').where('id', queued.outboxId).update({ dispatchedAt: new Date() });
      return queued.reduction.id;
    });
    const outcome = await runReduction(knex, store, reductionId, () => undefined);
    created.push(`raw file ${fileName} (${stored.size} bytes) and reduction: ${outcome.kind === 'done' ? `${outcome.points} points` : outcome.kind === 'failed' ? `failed ${outcome.failure.code}` : outcome.state}`);
  }
}
