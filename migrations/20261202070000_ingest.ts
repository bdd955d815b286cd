import type { Knex } from 'knex';

/**
 * Ingest schema: test articles, balances and their calibrations, tests, runs, immutable raw files,
 * versioned reductions with their points, and the outbox that hands reductions to the job queue.
 * Units: every physical quantity is SI (m, m², m³); angles in points are degrees, as the engine reports them.
 */
export async function up(knex: Knex): Promise<void> {
  const id = (t: Knex.CreateTableBuilder) => t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
  const stamps = (t: Knex.CreateTableBuilder) => {
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  };

  await knex.schema.createTable('test_articles', (t) => {
    id(t);
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('RESTRICT');
    t.text('name').notNullable();
    t.text('description').notNullable().defaultTo('');
    t.text('kind')
      .notNullable()
      .checkIn(['road_vehicle', 'building', 'sports_equipment', 'aircraft_component', 'sphere', 'other'], 'test_articles_kind_check');
    t.text('condition_on_receipt').notNullable().defaultTo('');
    t.double('reference_area').notNullable().comment('reference area S, m²');
    t.text('reference_area_kind').notNullable().checkIn(['frontal', 'planform', 'wetted', 'other'], 'test_articles_reference_area_kind_check');
    t.double('reference_length').notNullable().comment('reference length L, m');
    t.double('volume').notNullable().defaultTo(0).comment('model volume, m³');
    t.double('frontal_area').comment('frontal area, m² (blockage); defaults to S when S is frontal');
    t.double('moment_centre_x').notNullable().defaultTo(0).comment('moment reference centre, body axes, m');
    t.double('moment_centre_y').notNullable().defaultTo(0).comment('moment reference centre, body axes, m');
    t.double('moment_centre_z').notNullable().defaultTo(0).comment('moment reference centre, body axes, m');
    t.double('scale').notNullable().defaultTo(1).comment('full-scale length / model length');
    stamps(t);
    t.unique(['organisation_id', 'name']);
  });
  await knex.raw(
    'ALTER TABLE test_articles ADD CONSTRAINT test_articles_dimensions_positive CHECK (reference_area > 0 AND reference_length > 0 AND volume >= 0 AND scale > 0 AND (frontal_area IS NULL OR frontal_area > 0))',
  );

  await knex.schema.createTable('balances', (t) => {
    id(t);
    t.text('identifier').notNullable().unique();
    t.text('description').notNullable().defaultTo('');
    t.jsonb('capacities').notNullable().comment('six capacities Fx, Fy, Fz (N), Mx, My, Mz (N·m)');
    stamps(t);
  });

  await knex.schema.createTable('balance_calibrations', (t) => {
    id(t);
    t.uuid('balance_id').notNullable().references('balances.id').onDelete('RESTRICT');
    t.integer('version').notNullable();
    t.jsonb('matrices').notNullable().comment('linear 6×6 (mV/V per N or N·m) and optional interaction 6×21');
    t.date('calibrated_on').notNullable();
    t.date('due_on').notNullable();
    t.uuid('entered_by').notNullable().references('users.id').onDelete('RESTRICT');
    stamps(t);
    t.unique(['balance_id', 'version']);
  });
  await knex.raw('ALTER TABLE balance_calibrations ADD CONSTRAINT balance_calibrations_due_after CHECK (due_on >= calibrated_on)');

  await knex.schema.createTable('tests', (t) => {
    id(t);
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('RESTRICT');
    t.uuid('article_id').notNullable().references('test_articles.id').onDelete('RESTRICT');
    t.uuid('tunnel_id').notNullable().references('tunnels.id').onDelete('RESTRICT');
    t.uuid('balance_id').references('balances.id').onDelete('RESTRICT');
    // Filled once bookings exist; no foreign key yet.
    t.uuid('booking_id');
    t.text('title').notNullable();
    t.text('state').notNullable().defaultTo('planned').checkIn(['planned', 'running', 'complete', 'cancelled'], 'tests_state_check');
    t.jsonb('configurations').notNullable().defaultTo('[]').comment('named model configurations: [{ label, description }]');
    t.jsonb('reduction_settings').notNullable().defaultTo('{}').comment('corrections, density model, zeros, uncertainty for reductions');
    t.uuid('created_by').notNullable().references('users.id').onDelete('RESTRICT');
    stamps(t);
    t.index(['organisation_id']);
  });

  await knex.schema.createTable('calibration_overrides', (t) => {
    id(t);
    t.uuid('test_id').notNullable().references('tests.id').onDelete('RESTRICT');
    t.uuid('calibration_id').notNullable().references('balance_calibrations.id').onDelete('RESTRICT');
    t.uuid('granted_by').notNullable().references('users.id').onDelete('RESTRICT');
    t.text('reason').notNullable();
    stamps(t);
    t.unique(['test_id', 'calibration_id']);
  });
  await knex.raw("ALTER TABLE calibration_overrides ADD CONSTRAINT calibration_overrides_reason_given CHECK (length(btrim(reason)) >= 10)");

  await knex.schema.createTable('runs', (t) => {
    id(t);
    t.uuid('test_id').notNullable().references('tests.id').onDelete('RESTRICT');
    t.integer('run_number').notNullable();
    t.text('kind').notNullable().checkIn(['data', 'wind_off_zero', 'weight_tare', 'sphere_calibration'], 'runs_kind_check');
    t.text('configuration_label').notNullable().defaultTo('');
    t.text('notes').notNullable().defaultTo('');
    t.uuid('created_by').notNullable().references('users.id').onDelete('RESTRICT');
    stamps(t);
    t.unique(['test_id', 'run_number']);
  });
  await knex.raw('ALTER TABLE runs ADD CONSTRAINT runs_number_positive CHECK (run_number > 0)');

  await knex.schema.createTable('raw_files', (t) => {
    id(t);
    t.uuid('run_id').notNullable().references('runs.id').onDelete('RESTRICT');
    t.text('original_name').notNullable();
    t.bigInteger('size').notNullable().comment('bytes');
    t.specificType('sha256', 'char(64)').notNullable();
    t.text('storage_key').notNullable();
    t.uuid('uploaded_by').notNullable().references('users.id').onDelete('RESTRICT');
    stamps(t);
    t.unique(['run_id', 'sha256']);
  });
  // Raw files are evidence: their bytes, hash and location never change and the row is never deleted.
  await knex.raw(`
    CREATE FUNCTION raw_files_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_OP = 'DELETE' THEN
        RAISE EXCEPTION 'raw files are immutable: % cannot be deleted', OLD.id USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      IF NEW.sha256 IS DISTINCT FROM OLD.sha256 OR NEW.storage_key IS DISTINCT FROM OLD.storage_key OR NEW.size IS DISTINCT FROM OLD.size OR NEW.run_id IS DISTINCT FROM OLD.run_id THEN
        RAISE EXCEPTION 'raw files are immutable: the hash, size, storage key and run of % cannot change', OLD.id USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      RETURN NEW;
    END $$`);
  await knex.raw('CREATE TRIGGER raw_files_immutable BEFORE UPDATE OR DELETE ON raw_files FOR EACH ROW EXECUTE FUNCTION raw_files_immutable()');

  await knex.schema.createTable('reductions', (t) => {
    id(t);
    t.uuid('run_id').notNullable().references('runs.id').onDelete('RESTRICT');
    t.uuid('raw_file_id').notNullable().references('raw_files.id').onDelete('RESTRICT');
    t.integer('version').notNullable();
    t.text('engine_version').notNullable();
    t.jsonb('config').notNullable().comment('the full reduction configuration, defaults filled in');
    t.uuid('calibration_id').references('balance_calibrations.id').onDelete('RESTRICT');
    t.uuid('override_id').references('calibration_overrides.id').onDelete('RESTRICT');
    t.text('state').notNullable().defaultTo('queued').checkIn(['queued', 'running', 'done', 'failed'], 'reductions_state_check');
    t.double('progress').notNullable().defaultTo(0);
    t.text('error_code');
    t.text('error_message');
    t.integer('error_line');
    t.integer('error_column');
    t.specificType('input_sha256', 'char(64)').notNullable();
    t.jsonb('warnings').notNullable().defaultTo('[]');
    t.jsonb('summary').comment('sample count, metadata, load and pressure kinds, wind-averaged drag, caution');
    t.uuid('created_by').notNullable().references('users.id').onDelete('RESTRICT');
    t.timestamp('started_at', { useTz: true });
    t.timestamp('finished_at', { useTz: true });
    stamps(t);
    t.unique(['run_id', 'version']);
    t.index(['raw_file_id']);
  });
  await knex.raw('ALTER TABLE reductions ADD CONSTRAINT reductions_progress_fraction CHECK (progress >= 0 AND progress <= 1)');

  await knex.schema.createTable('reduction_points', (t) => {
    id(t);
    t.uuid('reduction_id').notNullable().references('reductions.id').onDelete('RESTRICT');
    t.integer('index').notNullable();
    t.integer('point_number').notNullable();
    t.integer('sample_count').notNullable();
    t.double('yaw').notNullable().comment('mean yaw, deg');
    t.double('pitch').notNullable().comment('mean pitch, deg');
    t.double('dynamic_pressure').comment('corrected q, Pa');
    t.double('speed').comment('corrected speed, m/s');
    t.double('reynolds_number');
    t.double('cd_uncorrected');
    t.double('cd_corrected');
    t.double('cl_corrected');
    t.double('cs_corrected');
    t.double('drag_counts');
    t.jsonb('setpoints').notNullable().comment('yaw and pitch set for the point, deg');
    t.jsonb('result').notNullable().comment('everything the engine reports for the point');
    stamps(t);
    t.unique(['reduction_id', 'index']);
  });

  await knex.schema.createTable('outbox', (t) => {
    id(t);
    t.text('queue').notNullable();
    t.text('job_name').notNullable();
    t.text('job_id').notNullable();
    t.jsonb('payload').notNullable();
    t.timestamp('dispatched_at', { useTz: true });
    stamps(t);
  });
  await knex.raw('CREATE INDEX outbox_undispatched ON outbox (created_at) WHERE dispatched_at IS NULL');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('outbox');
  await knex.schema.dropTableIfExists('reduction_points');
  await knex.schema.dropTableIfExists('reductions');
  await knex.schema.dropTableIfExists('raw_files');
  await knex.raw('DROP FUNCTION IF EXISTS raw_files_immutable()');
  await knex.schema.dropTableIfExists('runs');
  await knex.schema.dropTableIfExists('calibration_overrides');
  await knex.schema.dropTableIfExists('tests');
  await knex.schema.dropTableIfExists('balance_calibrations');
  await knex.schema.dropTableIfExists('balances');
  await knex.schema.dropTableIfExists('test_articles');
}
