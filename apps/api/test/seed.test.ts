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
    }, 60_000);
  });
});
