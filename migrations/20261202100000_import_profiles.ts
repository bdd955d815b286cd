import type { Knex } from 'knex';

/**
 * Saved import profiles of the lab: how files of another layout map onto the canonical run-file format.
 * A deployment serves one lab (see `organisations_one_lab`), so a name is unique across the table; an
 * archived profile keeps its name, so old reductions that name it still read unambiguously.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('import_profiles', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('name').notNullable();
    t.text('description').notNullable().defaultTo('');
    t.jsonb('profile').notNullable().comment('an ImportProfile of libs/aero, validated before every write');
    t.uuid('created_by').notNullable().references('users.id').onDelete('RESTRICT');
    t.boolean('archived').notNullable().defaultTo(false);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['name'], { indexName: 'import_profiles_name_unique' });
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('import_profiles');
}
