import { createKnex } from '@tunnelwright/db';

/**
 * Empties the browser tests' database so the demo seed starts from a known state (the integration
 * suite leaves its own laboratory behind, and there may be only one). Refuses anything but a `_test` database.
 */
export async function resetTestDatabase(databaseUrl: string): Promise<void> {
  const name = new URL(databaseUrl).pathname.replace(/^\//, '');
  if (!name.endsWith('_test')) {
    throw new Error(`resetTestDatabase only empties a database whose name ends in _test, not "${name}"`);
  }
  const knex = createKnex(databaseUrl);
  try {
    await knex.raw('DROP SCHEMA public CASCADE');
    await knex.raw('CREATE SCHEMA public');
  } finally {
    await knex.destroy();
  }
}
