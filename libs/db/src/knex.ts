import knexFactory, { type Knex } from 'knex';
import { knexSnakeCaseMappers } from 'objection';

/** Where the demo database lives when `DATABASE_URL` is not set. */
export const defaultDatabaseUrl = 'postgres://postgres@127.0.0.1:54329/tunnelwright';

/** Builds the knex options for a connection string, with snake_case columns mapped to camelCase properties. */
export function knexConfig(url: string = process.env.DATABASE_URL ?? defaultDatabaseUrl): Knex.Config {
  return {
    client: 'pg',
    connection: url,
    pool: { min: 0, max: 10 },
    ...knexSnakeCaseMappers(),
  };
}

/** Opens a knex instance for `url` (default `DATABASE_URL`, then the local demo database). */
export function createKnex(url?: string): Knex {
  return knexFactory(knexConfig(url));
}
