import { createKnex } from '@tunnelwright/db';

/**
 * Creates the browser tests' own database if it is missing, and empties it, so the demo seed starts
 * from a known state. It is a database of its own, not the integration suite's, because that suite
 * may be running at the same moment and leaves its own laboratory behind (there may be only one).
 * Refuses any database whose name does not end in `_e2e` or `_test`.
 */
export async function resetTestDatabase(databaseUrl: string): Promise<void> {
  const url = new URL(databaseUrl);
  const name = url.pathname.replace(/^\//, '');
  if (!/^[a-z0-9_]+_(e2e|test)$/.test(name)) {
    throw new Error(`resetTestDatabase only empties a database named *_e2e or *_test, not "${name}"`);
  }
  url.pathname = '/postgres';
  const server = createKnex(url.toString());
  try {
    const found = await server.raw('SELECT 1 FROM pg_database WHERE datname = ?', [name]);
    if ((found as { rowCount: number }).rowCount === 0) {
      await server.raw(`CREATE DATABASE ${name}`);
    }
  } finally {
    await server.destroy();
  }
  const knex = createKnex(databaseUrl);
  try {
    await knex.raw('DROP SCHEMA IF EXISTS public CASCADE');
    await knex.raw('CREATE SCHEMA public');
  } finally {
    await knex.destroy();
  }
}
