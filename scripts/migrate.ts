/**
 * Applies or undoes database migrations.
 *   node --import tsx scripts/migrate.ts            # latest (default)
 *   node --import tsx scripts/migrate.ts rollback   # undo the last batch
 *   node --import tsx scripts/migrate.ts rollback --all
 * Uses DATABASE_URL (default: the local demo database).
 */
import { createKnex, migrationConfig } from '@tunnelwright/db';

const [command = 'latest', ...flags] = process.argv.slice(2);
const knex = createKnex();

try {
  if (command === 'latest') {
    const [batch, applied] = (await knex.migrate.latest(migrationConfig)) as [number, string[]];
    console.log(applied.length === 0 ? 'Already up to date.' : `Batch ${batch} applied:\n  ${applied.join('\n  ')}`);
  } else if (command === 'rollback') {
    const [batch, undone] = (await knex.migrate.rollback(migrationConfig, flags.includes('--all'))) as [number, string[]];
    console.log(undone.length === 0 ? 'Nothing to roll back.' : `Batch ${batch} rolled back:\n  ${undone.join('\n  ')}`);
  } else {
    console.error(`Unknown command "${command}". Use: latest | rollback [--all]`);
    process.exitCode = 2;
  }
} catch (error) {
  console.error('Migration failed:', error instanceof Error ? error.message : error);
  process.exitCode = 1;
} finally {
  await knex.destroy();
}
