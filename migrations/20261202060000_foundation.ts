import type { Knex } from 'knex';

/**
 * Foundation schema: organisations, users, sign-in tokens, the tunnel and service catalogue, and the audit trail.
 * Units: every physical quantity is SI (m, m², m/s, Pa/m); money is integer minor units plus an ISO 4217 code.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw('CREATE EXTENSION IF NOT EXISTS citext');
  await knex.raw('CREATE EXTENSION IF NOT EXISTS btree_gist');
  await knex.raw('CREATE EXTENSION IF NOT EXISTS pgcrypto');

  const id = (t: Knex.CreateTableBuilder) => t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
  const stamps = (t: Knex.CreateTableBuilder) => {
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  };

  await knex.schema.createTable('organisations', (t) => {
    id(t);
    t.text('name').notNullable().unique();
    t.text('kind').notNullable().checkIn(['lab', 'customer'], 'organisations_kind_check');
    // IANA zone name used to display times, e.g. Europe/London.
    t.text('time_zone');
    t.jsonb('settings').notNullable().defaultTo('{}');
    stamps(t);
  });
  // Exactly one laboratory organisation.
  await knex.raw("CREATE UNIQUE INDEX organisations_one_lab ON organisations (kind) WHERE kind = 'lab'");

  await knex.schema.createTable('users', (t) => {
    id(t);
    t.specificType('email', 'citext').notNullable().unique();
    t.text('name').notNullable();
    t.text('role').notNullable().checkIn(['customer', 'technician', 'analyst', 'lab_manager'], 'users_role_check');
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('RESTRICT');
    // argon2id hash; null until the invitation is accepted.
    t.text('password_hash');
    t.boolean('active').notNullable().defaultTo(true);
    stamps(t);
    t.index(['organisation_id']);
  });

  await knex.schema.createTable('refresh_tokens', (t) => {
    id(t);
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    // SHA-256 of the token, hex.
    t.text('token_hash').notNullable().unique();
    t.uuid('family_id').notNullable();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('rotated_at', { useTz: true });
    t.timestamp('revoked_at', { useTz: true });
    stamps(t);
    t.index(['family_id']);
    t.index(['user_id']);
  });

  await knex.schema.createTable('user_tokens', (t) => {
    id(t);
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.text('purpose').notNullable().checkIn(['invitation', 'password_reset'], 'user_tokens_purpose_check');
    // SHA-256 of the token, hex.
    t.text('token_hash').notNullable().unique();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('used_at', { useTz: true });
    stamps(t);
    t.index(['user_id', 'purpose']);
  });

  await knex.schema.createTable('tunnels', (t) => {
    id(t);
    t.text('name').notNullable().unique();
    t.text('kind').notNullable().checkIn(['closed', 'open_jet'], 'tunnels_kind_check');
    t.text('description').notNullable().defaultTo('');
    t.double('width').notNullable().comment('test-section or nozzle width, m');
    t.double('height').notNullable().comment('test-section or nozzle height, m');
    t.double('area').notNullable().comment('cross-section area C, m² (after corner fillets)');
    t.double('length').notNullable().comment('test-section length, m');
    t.double('min_speed').notNullable().defaultTo(0).comment('minimum test speed, m/s');
    t.double('max_speed').notNullable().comment('maximum test speed, m/s');
    t.double('pressure_gradient').notNullable().defaultTo(0).comment('empty-section static-pressure gradient dp/dx, Pa/m');
    t.double('shape_factor').notNullable().defaultTo(0.86).comment('tunnel-shape factor τ1, dimensionless');
    t.jsonb('open_jet_constants').notNullable().defaultTo('{}').comment('open-jet correction constants, dimensionless');
    t.jsonb('capabilities').notNullable().defaultTo('{}').comment('yawRange in degrees, turbulenceIntensity as a fraction');
    t.timestamp('archived_at', { useTz: true });
    stamps(t);
  });
  await knex.raw(
    'ALTER TABLE tunnels ADD CONSTRAINT tunnels_dimensions_positive CHECK (width > 0 AND height > 0 AND area > 0 AND length > 0 AND max_speed > 0 AND min_speed >= 0 AND min_speed <= max_speed AND shape_factor > 0)',
  );

  await knex.schema.createTable('services', (t) => {
    id(t);
    t.text('name').notNullable().unique();
    t.text('description').notNullable().defaultTo('');
    t.text('unit').notNullable().checkIn(['hour', 'half_day', 'day', 'item'], 'services_unit_check');
    t.bigInteger('rate').notNullable().comment('price per unit in minor units of currency');
    t.specificType('currency', 'char(3)').notNullable();
    t.uuid('tunnel_id').references('tunnels.id').onDelete('RESTRICT');
    t.timestamp('archived_at', { useTz: true });
    stamps(t);
  });
  await knex.raw('ALTER TABLE services ADD CONSTRAINT services_rate_not_negative CHECK (rate >= 0)');

  await knex.schema.createTable('audit_entries', (t) => {
    id(t);
    t.uuid('actor_id').references('users.id').onDelete('SET NULL');
    t.text('action').notNullable();
    t.text('entity').notNullable();
    t.text('entity_id');
    t.jsonb('before');
    t.jsonb('after');
    stamps(t);
    t.index(['entity', 'entity_id']);
    t.index(['created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('audit_entries');
  await knex.schema.dropTableIfExists('services');
  await knex.schema.dropTableIfExists('tunnels');
  await knex.schema.dropTableIfExists('user_tokens');
  await knex.schema.dropTableIfExists('refresh_tokens');
  await knex.schema.dropTableIfExists('users');
  await knex.schema.dropTableIfExists('organisations');
}
