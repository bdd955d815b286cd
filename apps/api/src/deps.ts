import type { Knex } from 'knex';
import type { Redis } from 'ioredis';
import type { AppConfig } from './config';
import type { Mailer } from './mail/mailer';

/** What `createApp` needs from outside; tests pass their own, pointing at the test database. */
export interface AppDeps {
  config: AppConfig;
  knex: Knex;
  redis: Redis;
  mailer: Mailer;
  /** Prefix for rate-limit keys in Redis, so separate apps (e.g. test files) never share counters. */
  rateLimitPrefix?: string;
}
