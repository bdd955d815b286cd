import { Balance, BalanceCalibration, createKnex, Organisation, TestArticle, TestRecord, Tunnel, User } from '@tunnelwright/db';
import { demoCustomers } from '../../../../scripts/seed/demo-users';
import { databaseUrl } from './api-server';
import { demoUser } from './sign-in';

/** What sets one browser test's record apart from another's; all of it invented. */
export interface DemoTestRecord {
  title: string;
  articleName: string;
  balanceIdentifier: string;
  configuration: { label: string; description: string };
  /** The balance's only calibration; by default made in January 2026 and due far ahead, so uploads are reduced. */
  calibration?: { calibratedOn: string; dueOn: string };
}

/**
 * Opens a running test of the first demo customer in the closed-section tunnel, for a 1:4 road-vehicle model, on a
 * new balance with an identity calibration (due far ahead unless `record.calibration` says otherwise); its id.
 */
export async function openDemoTest(record: DemoTestRecord): Promise<string> {
  const knex = createKnex(databaseUrl);
  try {
    const customer = await Organisation.query(knex).findOne({ name: demoCustomers.quillfen });
    const manager = await User.query(knex).findOne({ email: demoUser('lab_manager').email });
    const tunnel = await Tunnel.query(knex).findOne({ kind: 'closed' });
    if (!customer || !manager || !tunnel) throw new Error('The demo seed lacks the customer, lab manager or closed tunnel');
    const article = await TestArticle.query(knex).insert({
      organisationId: customer.id,
      name: record.articleName,
      description: '',
      kind: 'road_vehicle',
      conditionOnReceipt: 'as new',
      referenceArea: 0.14,
      referenceAreaKind: 'frontal',
      referenceLength: 0.7,
      volume: 0.1,
      frontalArea: null,
      momentCentreX: 0,
      momentCentreY: 0,
      momentCentreZ: 0,
      scale: 4,
    });
    const balance = await Balance.query(knex).insert({ identifier: record.balanceIdentifier, description: 'Invented six-component balance', capacities: [400, 400, 1200, 120, 200, 120] });
    const identity = [0, 1, 2, 3, 4, 5].map((i) => [0, 1, 2, 3, 4, 5].map((j) => (i === j ? 1 : 0)));
    const { calibratedOn, dueOn } = record.calibration ?? { calibratedOn: '2026-01-10', dueOn: '2099-01-10' };
    await BalanceCalibration.query(knex).insert({ balanceId: balance.id, version: 1, matrices: { linear: identity }, calibratedOn, dueOn, enteredBy: manager.id });
    const test = await TestRecord.query(knex).insert({
      organisationId: customer.id,
      articleId: article.id,
      tunnelId: tunnel.id,
      balanceId: balance.id,
      bookingId: null,
      title: record.title,
      state: 'running',
      configurations: [record.configuration],
      reductionSettings: { minimumSamplesPerPoint: 2, corrections: { solidBlockage: 'frontal-area', wakeBlockage: 'none' } },
      createdBy: manager.id,
    });
    return test.id;
  } finally {
    await knex.destroy();
  }
}
