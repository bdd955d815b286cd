import type { Knex } from 'knex';
import { Organisation, Plan, ResultSheet, TestRecord, User } from '@tunnelwright/db';
import { linkCertifiedResult } from '../../apps/api/src/planner/certified-result';
import { certifiedTitle } from './approval';
import { demoCustomers } from './demo-users';
import { demoPlans } from './plans';

/** Quillfen's estate-car plan, compared with its own estate-car test's valid sheet. */
const linkedPlan = demoPlans.find((plan) => plan.organisation === demoCustomers.quillfen && plan.name === 'Estate car, full-size estimate');

/**
 * Links Quillfen's demo plan to the valid sheet of its estate-car test (revision 2, after revision 1 was
 * superseded), configuration A, as the demo analyst, with the audit row. Idempotent: nothing changes when the
 * plan is already linked to that sheet; a link to an older revision is moved to the valid one.
 */
export async function seedPlanCertifiedLink(knex: Knex, created: string[]): Promise<void> {
  if (!linkedPlan) throw new Error('the demo plans have none for Quillfen');
  const organisation = await Organisation.query(knex).findOne({ name: demoCustomers.quillfen });
  const analyst = await User.query(knex).findOne({ email: 'analyst@brackenmoor.example' });
  if (!organisation || !analyst) throw new Error('the certified link needs Quillfen and the demo analyst');
  const test = await TestRecord.query(knex).findOne({ organisationId: organisation.id, title: certifiedTitle });
  // Like the approval step, nothing to do where the estate-car test was not seeded.
  if (!test) return;
  const sheet = await ResultSheet.query(knex).select('id', 'reportNumber').findOne({ testId: test.id, state: 'valid' });
  if (!sheet) throw new Error(`the certified link needs a valid sheet of "${certifiedTitle}"`);

  await knex.transaction(async (trx) => {
    const plan = await Plan.query(trx).findOne({ organisationId: organisation.id, name: linkedPlan.name }).forUpdate();
    if (!plan) throw new Error(`the certified link needs the demo plan ${linkedPlan.name}`);
    if (plan.measuredSheetId === sheet.id) return;
    plan.organisation = organisation;
    await linkCertifiedResult(trx, plan, sheet.id, 'A', analyst.id);
    created.push(`plan ${plan.name} linked to ${sheet.reportNumber}`);
  });
}
