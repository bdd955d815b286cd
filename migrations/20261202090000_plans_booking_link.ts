import type { Knex } from 'knex';

/**
 * Now that bookings exist, a plan's `booking_id` names a real booking. Deleting a booking only unlinks its plan;
 * the plan and its versions stay with the customer.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('plans', (t) => {
    t.foreign('booking_id', 'plans_booking_id_foreign').references('bookings.id').onDelete('SET NULL');
    t.index(['booking_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('plans', (t) => {
    t.dropIndex(['booking_id']);
    t.dropForeign(['booking_id'], 'plans_booking_id_foreign');
  });
}
