import type { Knex } from 'knex';

/**
 * Test plans: one row per plan of a customer organisation, and an immutable version row for every save.
 * `booking_id` is created as a plain uuid (written while bookings were still being built); its foreign key is added
 * by 20261202090000_plans_booking_link. The certified-results link is a measured drag area (m²) with
 * the reference it comes from, both set or both empty.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('plans', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('RESTRICT');
    t.text('name').notNullable();
    t.integer('current_version').notNullable().defaultTo(1);
    t.uuid('booking_id').comment('booking the plan is attached to; foreign key added by the bookings migration');
    t.double('measured_drag_area').comment('certified measured C_D·A, m²');
    t.text('measured_source').comment('reference of the certified results the measured value comes from');
    t.uuid('created_by').notNullable().references('users.id').onDelete('RESTRICT');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organisation_id', 'updated_at']);
  });
  await knex.raw(
    'ALTER TABLE plans ADD CONSTRAINT plans_measured_complete CHECK ((measured_drag_area IS NULL) = (measured_source IS NULL) AND (measured_drag_area IS NULL OR measured_drag_area > 0))',
  );
  await knex.raw('ALTER TABLE plans ADD CONSTRAINT plans_current_version_positive CHECK (current_version >= 1)');

  await knex.schema.createTable('plan_versions', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('plan_id').notNullable().references('plans.id').onDelete('CASCADE');
    t.integer('version').notNullable();
    t.jsonb('input').notNullable().comment('the validated planner input, SI units');
    t.text('note').notNullable().defaultTo('');
    t.uuid('created_by').notNullable().references('users.id').onDelete('RESTRICT');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['plan_id', 'version']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('plan_versions');
  await knex.schema.dropTableIfExists('plans');
}
