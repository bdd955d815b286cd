import type { Knex } from 'knex';

/**
 * The day the laboratory received a test article, which a certified sheet states (ISO/IEC 17025:2017 §7.8.2.1 i).
 * Articles recorded before this keep no date; their sheets say the receipt date was not recorded instead of
 * presenting the day the record was made as the day of receipt.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('test_articles', (t) => {
    t.date('received_on').comment('day the laboratory received the item');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('test_articles', (t) => {
    t.dropColumn('received_on');
  });
}
