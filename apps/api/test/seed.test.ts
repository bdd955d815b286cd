import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPassword, demoUsers } from '../../../scripts/seed/demo-users';
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
    }, 60_000);
  });
});
