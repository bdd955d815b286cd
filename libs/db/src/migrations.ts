import { fileURLToPath } from 'node:url';
import type { Knex } from 'knex';

/** Absolute path of the repository's `migrations/` folder. */
export const migrationsDirectory = fileURLToPath(new URL('../../../migrations', import.meta.url));

/** Migrator options shared by `scripts/migrate.ts` and the integration-test setup. */
export const migrationConfig: Knex.MigratorConfig = {
  directory: migrationsDirectory,
  loadExtensions: ['.ts'],
  tableName: 'knex_migrations',
};
