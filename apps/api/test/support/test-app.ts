import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import { Redis } from 'ioredis';
import type { Knex } from 'knex';
import { createKnex, migrationConfigWithLoader } from '@tunnelwright/db';
import { createApp } from '../../src/app';
import { loadConfig, type AppConfig } from '../../src/config';
import type { AppDeps } from '../../src/deps';
import { createSmtpMailer } from '../../src/mail/mailer';

/** The test database: TEST_DATABASE_URL, else a DATABASE_URL that names a test database, else the local one. */
export function testDatabaseUrl(): string {
  const fromEnv = process.env.TEST_DATABASE_URL ?? (process.env.DATABASE_URL?.includes('test') ? process.env.DATABASE_URL : undefined);
  return fromEnv ?? 'postgres://postgres@127.0.0.1:54329/tunnelwright_test';
}

export interface TestApp {
  app: Express;
  deps: AppDeps;
  config: AppConfig;
  knex: Knex;
  close(): Promise<void>;
}

/**
 * Builds the real app against the real test database, Redis and SMTP fake, migrating the database to the
 * latest schema first so one file can run on its own. Rate-limit counters get a prefix of their own.
 * A second app in the same file must pass `shared.knex`: Objection binds its models to one knex globally.
 */
export async function createTestApp(overrides: Partial<AppConfig> = {}, shared?: { knex: Knex }): Promise<TestApp> {
  const config: AppConfig = {
    ...loadConfig({
      ...process.env,
      DATABASE_URL: testDatabaseUrl(),
      JWT_SECRET: randomBytes(32).toString('hex'),
      DEMO_MODE: 'true',
      LOG_LEVEL: 'silent',
      PUBLIC_URL: 'http://localhost:3000',
    }),
    ...overrides,
  };
  const knex = shared?.knex ?? createKnex(config.databaseUrl);
  // Loaded through the test runner's own import, which understands TypeScript.
  await knex.migrate.latest(migrationConfigWithLoader((path) => import(/* @vite-ignore */ path)));
  const redis = new Redis(config.redisUrl, { maxRetriesPerRequest: 2 });
  const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
  const deps: AppDeps = { config, knex, redis, mailer, rateLimitPrefix: `tw:test:${randomBytes(6).toString('hex')}:` };
  const app = createApp(deps);
  return {
    app,
    deps,
    config,
    knex,
    async close() {
      const keys = await redis.keys(`${deps.rateLimitPrefix}*`);
      if (keys.length > 0) await redis.del(...keys);
      mailer.close();
      await redis.quit();
      if (!shared) await knex.destroy();
    },
  };
}
