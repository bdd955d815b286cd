import { readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Knex } from 'knex';

/** Absolute path of the repository's `migrations/` folder. */
export const migrationsDirectory = fileURLToPath(new URL('../../../migrations', import.meta.url));

/** Migrator options for `scripts/migrate.ts`, which runs under tsx and so can load `.ts` files itself. */
export const migrationConfig: Knex.MigratorConfig = {
  directory: migrationsDirectory,
  loadExtensions: ['.ts'],
  tableName: 'knex_migrations',
};

/** Whether a file name is a migration: `YYYYMMDDHHMMSS_name.ts`. */
const migrationFile = /^\d{14}_[\w-]+\.ts$/;

/**
 * Migrator options that load each migration through `load`, for runtimes whose module loader is not
 * Node's own (the test runner transforms TypeScript itself). Names match the file names, so a database
 * migrated by `scripts/migrate.ts` is recognised.
 */
export function migrationConfigWithLoader(load: (path: string) => Promise<Knex.Migration>): Knex.MigratorConfig {
  const source: Knex.MigrationSource<string> = {
    getMigrations: async () => (await readdir(migrationsDirectory)).filter((name) => migrationFile.test(name)).sort(),
    getMigrationName: (name) => name,
    getMigration: (name) => load(join(migrationsDirectory, name)),
  };
  return { migrationSource: source, tableName: migrationConfig.tableName };
}
