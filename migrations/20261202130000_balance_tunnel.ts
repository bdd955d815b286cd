import type { Knex } from 'knex';

/**
 * A balance can be listed as installed in one tunnel, so the catalogue shows each tunnel's balance capacities and the
 * planner can check a model against them. Balances move between tunnels: the link is optional and set null when the
 * tunnel row goes (tunnels are archived, not deleted, so that should not happen in use).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('balances', (t) => {
    t.uuid('tunnel_id').references('tunnels.id').onDelete('SET NULL').comment('tunnel the balance is installed in, if any');
    t.index(['tunnel_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('balances', (t) => {
    t.dropIndex(['tunnel_id']);
    t.dropColumn('tunnel_id');
  });
}
