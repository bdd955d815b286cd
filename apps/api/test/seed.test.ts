import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PLANNER_CAUTION } from '@tunnelwright/aero';
import { demoCustomers, demoPassword, demoUsers } from '../../../scripts/seed/demo-users';
import type { ResultSheetData } from '../src/reports/result-sheet-data';
import { createTestApp, testDatabaseUrl, type TestApp } from './support/test-app';

const run = promisify(execFile);

async function seed(): Promise<string> {
  const { stdout } = await run(process.execPath, ['--import', 'tsx', 'scripts/seed.ts'], { env: { ...process.env, SEED_DATABASE_URL: testDatabaseUrl() } });
  return stdout;
}

async function counts(t: TestApp): Promise<Record<string, unknown>> {
  const tables = ['organisations', 'users', 'tunnels', 'services', 'audit_entries'];
  const rows = await Promise.all(tables.map((table) => t.knex(table).count({ n: '*' }).first()));
  return Object.fromEntries(tables.map((table, i) => [table, rows[i]?.n]));
}

describe('scripts/seed.ts', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t?.close());

  describe('run twice', () => {
    it('the second run changes nothing, and every demo user signs in with the demo password', async () => {
      await seed();
      const after1 = await counts(t);
      const output = await seed();
      expect(output).toMatch(/nothing changed/);
      expect(await counts(t)).toEqual(after1);
      for (const person of demoUsers) {
        const login = await request(t.app).post('/api/auth/login').send({ email: person.email, password: demoPassword });
        expect(login.status, person.email).toBe(200);
        expect(login.body.user.role).toBe(person.role);
      }
      const tunnels = await t.knex('tunnels').whereIn('kind', ['closed', 'open_jet']).select('kind');
      expect(new Set(tunnels.map((row: { kind: string }) => row.kind))).toEqual(new Set(['closed', 'open_jet']));
      // One issued sheet that is current and the revision it superseded, and a submission left for the analyst.
      const sheets = (await t.knex('resultSheets').join('tests', 'tests.id', 'resultSheets.testId').where('tests.title', 'Estate car yaw sweep, baseline and mirrors off').orderBy('revision').select('resultSheets.reportNumber', 'resultSheets.state', 'resultSheets.supersededById', 'resultSheets.id')) as { reportNumber: string; state: string; supersededById: string | null; id: string }[];
      expect(sheets.map((s) => [s.reportNumber.replace(/^BAL-\d{4}-\d{4}-/, ''), s.state])).toEqual([['R1', 'superseded'], ['R2', 'valid']]);
      expect(sheets[0]!.supersededById).toBe(sheets[1]!.id);
      const waiting = await t.knex('submissions').join('tests', 'tests.id', 'submissions.testId').where({ 'tests.title': 'Delivery van drag at yaw, open jet', 'submissions.state': 'awaiting_approval' }).count({ n: '*' }).first();
      expect(Number(waiting?.n)).toBe(1);

      // Quillfen's demo plan is compared with the valid revision, R2, not the superseded R1.
      const r2 = sheets[1]!;
      const plan = await t.knex('plans').join('organisations', 'organisations.id', 'plans.organisationId').where({ 'organisations.name': demoCustomers.quillfen, 'plans.name': 'Estate car, full-size estimate' }).first('plans.*');
      expect(plan.measuredSheetId).toBe(r2.id);
      expect(plan.measuredConfigurationCode).toBe('A');
      // Read back from what the sheet states: configuration A's point nearest 0° yaw, C_D·S × scale² (similar figures, definition).
      const data = (await t.knex('resultSheets').where('id', r2.id).first('data')).data as ResultSheetData;
      const configuration = data.configurations.find((c) => c.code === 'A')!;
      const nearest = configuration.points.reduce((best, p) => (Math.abs(p.yaw) < Math.abs(best.yaw) ? p : best));
      expect(plan.measuredYaw).toBe(nearest.yaw);
      expect(Math.abs(plan.measuredDragArea - nearest.dragArea.value * data.article.scale ** 2)).toBeLessThanOrEqual(1e-12);
      expect(Math.abs(plan.measuredExpandedUncertainty - nearest.dragArea.expandedUncertainty * data.article.scale ** 2)).toBeLessThanOrEqual(1e-12);
      const links = await t.knex('auditEntries').where({ entity: 'plan', entityId: plan.id, action: 'plan.certified_result_linked' });
      expect(links).toHaveLength(1);

      // The Quillfen customer sees the comparison on the plan, with the caution.
      const quillfen = demoUsers.find((person) => person.organisation === demoCustomers.quillfen && person.role === 'customer')!;
      const login = await request(t.app).post('/api/auth/login').send({ email: quillfen.email, password: demoPassword });
      const seen = await request(t.app).get(`/api/plans/${plan.id}`).set('Authorization', `Bearer ${login.body.accessToken}`);
      expect(seen.status).toBe(200);
      expect(seen.body.measured.certified).toMatchObject({ reportNumber: r2.reportNumber, sheetState: 'valid', configurationCode: 'A' });
      expect(seen.body.evaluation.measured.source).toBe(plan.measuredSource);
      expect(seen.body.caution).toBe(PLANNER_CAUTION);
    }, 60_000);
  });
});
