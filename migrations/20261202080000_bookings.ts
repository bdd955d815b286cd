import type { Knex } from 'knex';

/**
 * Booking schema: bookings of tunnel time, their quotes and quote lines, customer attachments, maintenance
 * blocks, and `tunnel_occupancy`, the one table that PostgreSQL keeps free of overlaps.
 *
 * Double booking is impossible by construction: every booking in a state that holds a slot and every
 * maintenance block owns exactly one `tunnel_occupancy` row, kept by triggers in the same statement, and
 * that table carries `EXCLUDE USING gist (tunnel_id WITH =, period WITH &&)`. Periods are '[)' ranges, so
 * back-to-back periods do not overlap. A clash raises SQLSTATE 23P01 wherever it comes from.
 * Money is integer minor units plus an ISO 4217 code.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw('CREATE EXTENSION IF NOT EXISTS btree_gist');
  const id = (t: Knex.CreateTableBuilder) => t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
  const stamps = (t: Knex.CreateTableBuilder) => {
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  };

  await knex.schema.createTable('bookings', (t) => {
    id(t);
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('RESTRICT');
    t.uuid('tunnel_id').notNullable().references('tunnels.id').onDelete('RESTRICT');
    t.uuid('service_id').references('services.id').onDelete('RESTRICT');
    t.uuid('requested_by').notNullable().references('users.id').onDelete('RESTRICT');
    t.specificType('period', 'tstzrange').notNullable();
    t.text('state')
      .notNullable()
      .checkIn(['requested', 'quoted', 'counter_proposed', 'confirmed', 'in_test', 'completed', 'declined', 'rejected', 'cancelled', 'expired'], 'bookings_state_check');
    // Until when a provisional hold (requested, quoted, counter_proposed) keeps its slot.
    t.timestamp('hold_expires_at', { useTz: true });
    t.uuid('technician_id').references('users.id').onDelete('RESTRICT');
    t.jsonb('test_plan').notNullable().defaultTo('{}').comment('speeds m/s, yaw range degrees, configurations');
    t.jsonb('articles').notNullable().defaultTo('[]').comment('articles to test with the reference-area kind wanted');
    t.text('customer_note').notNullable().defaultTo('');
    t.text('decline_reason');
    t.specificType('counter_period', 'tstzrange');
    t.text('counter_note');
    t.timestamp('cancelled_at', { useTz: true });
    t.uuid('cancelled_by').references('users.id').onDelete('RESTRICT');
    t.text('cancellation_reason');
    t.bigInteger('cancellation_fee_minor').comment('late-cancellation fee, minor units of the quote currency');
    // Calendar identity: the UID never changes; SEQUENCE goes up with each change sent out.
    t.text('ics_uid').notNullable().unique();
    t.integer('ics_sequence').notNullable().defaultTo(0);
    t.uuid('test_id').references('tests.id').onDelete('SET NULL');
    stamps(t);
    t.index(['organisation_id']);
    t.index(['tunnel_id', 'state']);
  });
  await knex.raw(
    'ALTER TABLE bookings ADD CONSTRAINT bookings_period_bounded CHECK (NOT isempty(period) AND NOT lower_inf(period) AND NOT upper_inf(period))',
  );
  await knex.raw(
    'ALTER TABLE bookings ADD CONSTRAINT bookings_counter_period_bounded CHECK (counter_period IS NULL OR (NOT isempty(counter_period) AND NOT lower_inf(counter_period) AND NOT upper_inf(counter_period)))',
  );
  await knex.raw('ALTER TABLE bookings ADD CONSTRAINT bookings_fee_not_negative CHECK (cancellation_fee_minor IS NULL OR cancellation_fee_minor >= 0)');

  await knex.schema.createTable('quotes', (t) => {
    id(t);
    t.uuid('booking_id').notNullable().references('bookings.id').onDelete('CASCADE');
    t.text('state').notNullable().checkIn(['offered', 'accepted', 'rejected', 'withdrawn'], 'quotes_state_check');
    t.specificType('currency', 'char(3)').notNullable();
    t.bigInteger('total_minor').notNullable().comment('sum of line totals, minor units');
    t.text('note').notNullable().defaultTo('');
    t.uuid('created_by').notNullable().references('users.id').onDelete('RESTRICT');
    stamps(t);
  });
  await knex.raw('ALTER TABLE quotes ADD CONSTRAINT quotes_total_not_negative CHECK (total_minor >= 0)');
  // At most one live quote per booking.
  await knex.raw("CREATE UNIQUE INDEX quotes_one_live_per_booking ON quotes (booking_id) WHERE state IN ('offered', 'accepted')");

  await knex.schema.createTable('quote_lines', (t) => {
    id(t);
    t.uuid('quote_id').notNullable().references('quotes.id').onDelete('CASCADE');
    t.integer('position').notNullable();
    t.text('kind').notNullable().checkIn(['tunnel_hours', 'setup', 'staff', 'extra'], 'quote_lines_kind_check');
    t.text('description').notNullable().defaultTo('');
    t.integer('quantity').notNullable();
    t.bigInteger('unit_price_minor').notNullable();
    t.bigInteger('line_total_minor').notNullable();
    stamps(t);
    t.unique(['quote_id', 'position']);
  });
  await knex.raw(
    'ALTER TABLE quote_lines ADD CONSTRAINT quote_lines_amounts CHECK (quantity > 0 AND unit_price_minor >= 0 AND line_total_minor = quantity * unit_price_minor)',
  );

  await knex.schema.createTable('booking_attachments', (t) => {
    id(t);
    t.uuid('booking_id').notNullable().references('bookings.id').onDelete('CASCADE');
    t.text('filename').notNullable();
    t.text('content_type').notNullable();
    t.bigInteger('size_bytes').notNullable();
    // SHA-256 hex of the content; the file lives at <attachment dir>/<sha256>.
    t.text('sha256').notNullable();
    t.uuid('uploaded_by').notNullable().references('users.id').onDelete('RESTRICT');
    stamps(t);
    t.index(['booking_id']);
  });

  await knex.schema.createTable('maintenance_blocks', (t) => {
    id(t);
    t.uuid('tunnel_id').notNullable().references('tunnels.id').onDelete('RESTRICT');
    t.specificType('period', 'tstzrange').notNullable();
    t.text('reason').notNullable();
    t.uuid('created_by').notNullable().references('users.id').onDelete('RESTRICT');
    stamps(t);
  });
  await knex.raw(
    'ALTER TABLE maintenance_blocks ADD CONSTRAINT maintenance_blocks_period_bounded CHECK (NOT isempty(period) AND NOT lower_inf(period) AND NOT upper_inf(period))',
  );

  await knex.schema.createTable('tunnel_occupancy', (t) => {
    id(t);
    t.uuid('tunnel_id').notNullable().references('tunnels.id').onDelete('RESTRICT');
    t.specificType('period', 'tstzrange').notNullable();
    t.uuid('booking_id').unique().references('bookings.id').onDelete('CASCADE');
    t.uuid('maintenance_block_id').unique().references('maintenance_blocks.id').onDelete('CASCADE');
  });
  await knex.raw('ALTER TABLE tunnel_occupancy ADD CONSTRAINT tunnel_occupancy_one_owner CHECK (num_nonnulls(booking_id, maintenance_block_id) = 1)');
  await knex.raw('ALTER TABLE tunnel_occupancy ADD CONSTRAINT tunnel_occupancy_no_overlap EXCLUDE USING gist (tunnel_id WITH =, period WITH &&)');

  // A booking holds its slot while requested, quoted, confirmed or in test; a counter-proposal holds the proposed period.
  await knex.raw(`
    CREATE FUNCTION bookings_sync_occupancy() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      DELETE FROM tunnel_occupancy WHERE booking_id = NEW.id;
      IF NEW.state IN ('requested', 'quoted', 'confirmed', 'in_test') THEN
        INSERT INTO tunnel_occupancy (tunnel_id, period, booking_id) VALUES (NEW.tunnel_id, NEW.period, NEW.id);
      ELSIF NEW.state = 'counter_proposed' THEN
        INSERT INTO tunnel_occupancy (tunnel_id, period, booking_id) VALUES (NEW.tunnel_id, NEW.counter_period, NEW.id);
      END IF;
      RETURN NULL;
    END $$`);
  await knex.raw(
    'CREATE TRIGGER bookings_occupancy AFTER INSERT OR UPDATE OF state, period, counter_period, tunnel_id ON bookings FOR EACH ROW EXECUTE FUNCTION bookings_sync_occupancy()',
  );
  await knex.raw(`
    CREATE FUNCTION maintenance_blocks_sync_occupancy() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      DELETE FROM tunnel_occupancy WHERE maintenance_block_id = NEW.id;
      INSERT INTO tunnel_occupancy (tunnel_id, period, maintenance_block_id) VALUES (NEW.tunnel_id, NEW.period, NEW.id);
      RETURN NULL;
    END $$`);
  await knex.raw(
    'CREATE TRIGGER maintenance_blocks_occupancy AFTER INSERT OR UPDATE OF period, tunnel_id ON maintenance_blocks FOR EACH ROW EXECUTE FUNCTION maintenance_blocks_sync_occupancy()',
  );

  // The column was reserved by the ingest schema; now the bookings exist it gets its foreign key.
  await knex.raw('ALTER TABLE tests ADD CONSTRAINT tests_booking_id_foreign FOREIGN KEY (booking_id) REFERENCES bookings (id) ON DELETE SET NULL');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('ALTER TABLE tests DROP CONSTRAINT IF EXISTS tests_booking_id_foreign');
  await knex.schema.dropTableIfExists('tunnel_occupancy');
  await knex.raw('DROP TRIGGER IF EXISTS maintenance_blocks_occupancy ON maintenance_blocks');
  await knex.raw('DROP TRIGGER IF EXISTS bookings_occupancy ON bookings');
  await knex.raw('DROP FUNCTION IF EXISTS maintenance_blocks_sync_occupancy()');
  await knex.raw('DROP FUNCTION IF EXISTS bookings_sync_occupancy()');
  await knex.schema.dropTableIfExists('maintenance_blocks');
  await knex.schema.dropTableIfExists('booking_attachments');
  await knex.schema.dropTableIfExists('quote_lines');
  await knex.schema.dropTableIfExists('quotes');
  await knex.schema.dropTableIfExists('bookings');
}
