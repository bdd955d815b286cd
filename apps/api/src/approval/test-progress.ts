import type { TestProgress } from '@tunnelwright/contracts';
import { ResultSheet, Run, Submission, type TestRecord } from '@tunnelwright/db';
import type { Knex } from 'knex';

/**
 * Where each test stands: booked (nothing measured yet), in test (runs exist), being checked (results submitted, or
 * the test marked complete), certified (a valid sheet is issued); and the state of its latest submission.
 */
export async function testProgress(knex: Knex, tests: readonly TestRecord[]): Promise<Map<string, TestProgress>> {
  const ids = tests.map((t) => t.id);
  const result = new Map<string, TestProgress>();
  if (ids.length === 0) return result;
  const submissions = await Submission.query(knex).select('id', 'testId', 'sequence', 'state').whereIn('testId', ids).orderBy('sequence', 'desc');
  const sheets = await ResultSheet.query(knex).select('id', 'testId', 'submissionId', 'reportNumber', 'state').whereIn('testId', ids);
  const withRuns = new Set((await Run.query(knex).distinct('testId').whereIn('testId', ids)).map((r) => r.testId));
  for (const test of tests) {
    const latest = submissions.find((s) => s.testId === test.id);
    const valid = sheets.find((s) => s.testId === test.id && s.state === 'valid');
    const issuedFromLatest = latest ? sheets.some((s) => s.submissionId === latest.id) : false;
    const customerStage = valid ? 'certified' : latest || test.state === 'complete' ? 'being_checked' : withRuns.has(test.id) || test.state === 'running' ? 'in_test' : 'booked';
    result.set(test.id, {
      customerStage,
      approval: {
        state: !latest ? 'none' : issuedFromLatest ? 'issued' : latest.state,
        submissionId: latest?.id ?? null,
        sheetId: valid?.id ?? null,
        reportNumber: valid?.reportNumber ?? null,
      },
    });
  }
  return result;
}
