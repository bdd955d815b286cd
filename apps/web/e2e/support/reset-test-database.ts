import pg from 'pg';

/**
 * Empties the browser tests' database so the demo seed starts from a known state (the integration
 * suite leaves its own laboratory behind, and there may be only one). Refuses anything but a `_test` database.
 */
export async function resetTestDatabase(databaseUrl: string): Promise<void> {
  const name = new URL(databaseUrl).pathname.replace(/^\//, '');
  if (!name.endsWith('_test')) {
    throw new Error(`resetTestDatabase only empties a database whose name ends in _test, not "${name}"`);
  }
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    await client.query('DROP SCHEMA public CASCADE');
    await client.query('CREATE SCHEMA public');
  } finally {
    await client.end();
  }
}
