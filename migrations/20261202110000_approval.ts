import type { Knex } from 'knex';

/**
 * Review, approval and issue of certified result sheets.
 *
 * - `signing_rights`: who may approve results and sign sheets; granted and removed by lab managers, history kept.
 * - `point_exclusions`: points an analyst leaves out of the result, each with a written reason.
 * - `submissions`: a test's chosen reductions (one per run) put forward for approval; approved or sent back.
 * - `result_sheets`: issued PDF sheets with their SHA-256; a correction issues a new revision and marks the
 *   old one superseded. Nothing here is ever deleted.
 *
 * Approval freezes data in the database itself: once a reduction carries `approved_at`, triggers reject any
 * UPDATE or DELETE of the reduction, of its points, and any change to its point exclusions.
 */
export async function up(knex: Knex): Promise<void> {
  const id = (t: Knex.CreateTableBuilder) => t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
  const stamps = (t: Knex.CreateTableBuilder) => {
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  };

  await knex.schema.createTable('signing_rights', (t) => {
    id(t);
    t.uuid('user_id').notNullable().references('users.id').onDelete('RESTRICT');
    t.uuid('granted_by').notNullable().references('users.id').onDelete('RESTRICT');
    t.text('scope_note').notNullable().defaultTo('').comment('what the right covers, in the lab manager’s words');
    t.timestamp('revoked_at', { useTz: true });
    t.uuid('revoked_by').references('users.id').onDelete('RESTRICT');
    t.text('revoked_reason');
    stamps(t);
  });
  await knex.raw('CREATE UNIQUE INDEX signing_rights_one_current ON signing_rights (user_id) WHERE revoked_at IS NULL');
  await knex.raw('ALTER TABLE signing_rights ADD CONSTRAINT signing_rights_revocation_complete CHECK ((revoked_at IS NULL) = (revoked_by IS NULL))');

  await knex.schema.alterTable('reductions', (t) => {
    t.timestamp('approved_at', { useTz: true }).comment('set once, when a submission naming this reduction is approved');
  });

  await knex.schema.createTable('point_exclusions', (t) => {
    id(t);
    t.uuid('reduction_id').notNullable().references('reductions.id').onDelete('RESTRICT');
    t.integer('point_index').notNullable().comment('reduction_points.index of the excluded point');
    t.text('reason').notNullable();
    t.uuid('excluded_by').notNullable().references('users.id').onDelete('RESTRICT');
    stamps(t);
    t.unique(['reduction_id', 'point_index']);
  });
  await knex.raw('ALTER TABLE point_exclusions ADD CONSTRAINT point_exclusions_reason_given CHECK (length(btrim(reason)) >= 10)');

  await knex.schema.createTable('submissions', (t) => {
    id(t);
    t.uuid('test_id').notNullable().references('tests.id').onDelete('RESTRICT');
    t.integer('sequence').notNullable().comment('1, 2, … within the test');
    t.text('state').notNullable().defaultTo('awaiting_approval').checkIn(['awaiting_approval', 'sent_back', 'approved'], 'submissions_state_check');
    t.text('note').notNullable().defaultTo('');
    t.uuid('submitted_by').notNullable().references('users.id').onDelete('RESTRICT');
    t.uuid('decided_by').references('users.id').onDelete('RESTRICT');
    t.timestamp('decided_at', { useTz: true });
    t.text('decision_reason');
    stamps(t);
    t.unique(['test_id', 'sequence']);
  });
  await knex.raw("CREATE UNIQUE INDEX submissions_one_open_per_test ON submissions (test_id) WHERE state = 'awaiting_approval'");
  await knex.raw(
    "ALTER TABLE submissions ADD CONSTRAINT submissions_decision_complete CHECK ((state = 'awaiting_approval') = (decided_by IS NULL) AND (decided_by IS NULL) = (decided_at IS NULL))",
  );
  await knex.raw("ALTER TABLE submissions ADD CONSTRAINT submissions_sent_back_reason CHECK (state <> 'sent_back' OR length(btrim(coalesce(decision_reason, ''))) >= 10)");

  await knex.schema.createTable('submission_reductions', (t) => {
    t.uuid('submission_id').notNullable().references('submissions.id').onDelete('RESTRICT');
    t.uuid('reduction_id').notNullable().references('reductions.id').onDelete('RESTRICT');
    t.uuid('run_id').notNullable().references('runs.id').onDelete('RESTRICT');
    t.primary(['submission_id', 'reduction_id']);
    t.unique(['submission_id', 'run_id']);
  });

  await knex.schema.createTable('report_number_counters', (t) => {
    t.integer('year').primary();
    t.integer('last').notNullable();
  });

  await knex.schema.createTable('result_sheets', (t) => {
    id(t);
    t.uuid('test_id').notNullable().references('tests.id').onDelete('RESTRICT');
    t.uuid('submission_id').notNullable().unique().references('submissions.id').onDelete('RESTRICT');
    t.text('series').notNullable().comment('number shared by every revision, e.g. BAL-2026-0007');
    t.integer('revision').notNullable();
    t.text('report_number').notNullable().unique().comment('series and revision, e.g. BAL-2026-0007-R2; what the verify page looks up');
    t.text('state').notNullable().defaultTo('valid').checkIn(['valid', 'superseded'], 'result_sheets_state_check');
    t.text('revision_reason').comment('why this revision replaces the previous one');
    t.uuid('supersedes_id').unique().references('result_sheets.id').onDelete('RESTRICT');
    t.uuid('superseded_by_id').references('result_sheets.id').onDelete('RESTRICT');
    t.timestamp('superseded_at', { useTz: true });
    t.date('issue_date').notNullable().comment("the issue date in the laboratory's time zone");
    t.uuid('issued_by').notNullable().references('users.id').onDelete('RESTRICT');
    t.uuid('authorised_by').notNullable().references('users.id').onDelete('RESTRICT');
    t.specificType('sha256', 'char(64)').notNullable();
    t.integer('size').notNullable();
    t.binary('pdf').notNullable();
    t.integer('page_count').notNullable();
    t.jsonb('data').notNullable().comment('everything the sheet states, as rendered');
    stamps(t);
    t.unique(['series', 'revision']);
    t.index(['test_id']);
  });
  await knex.raw(
    "ALTER TABLE result_sheets ADD CONSTRAINT result_sheets_supersession_complete CHECK ((state = 'superseded') = (superseded_by_id IS NOT NULL) AND (superseded_by_id IS NULL) = (superseded_at IS NULL))",
  );
  await knex.raw('ALTER TABLE result_sheets ADD CONSTRAINT result_sheets_revision_reason CHECK (revision = 1 OR length(btrim(coalesce(revision_reason, \'\'))) >= 10)');

  // Approved reductions and everything they rest on cannot change.
  await knex.raw(`
    CREATE FUNCTION reductions_frozen() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF OLD.approved_at IS NOT NULL THEN
        RAISE EXCEPTION 'reduction % is approved and frozen: it cannot be %', OLD.id, lower(TG_OP) USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      IF TG_OP = 'DELETE' THEN RETURN OLD; END IF;
      RETURN NEW;
    END $$`);
  await knex.raw('CREATE TRIGGER reductions_frozen BEFORE UPDATE OR DELETE ON reductions FOR EACH ROW EXECUTE FUNCTION reductions_frozen()');

  await knex.raw(`
    CREATE FUNCTION reduction_children_frozen() RETURNS trigger LANGUAGE plpgsql AS $$
    DECLARE
      target uuid;
    BEGIN
      IF TG_OP = 'INSERT' THEN target := NEW.reduction_id; ELSE target := OLD.reduction_id; END IF;
      IF EXISTS (SELECT 1 FROM reductions WHERE id = target AND approved_at IS NOT NULL) THEN
        RAISE EXCEPTION 'reduction % is approved and frozen: its % cannot be %', target, TG_TABLE_NAME, lower(TG_OP) USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      IF TG_OP = 'UPDATE' AND NEW.reduction_id IS DISTINCT FROM OLD.reduction_id
         AND EXISTS (SELECT 1 FROM reductions WHERE id = NEW.reduction_id AND approved_at IS NOT NULL) THEN
        RAISE EXCEPTION 'reduction % is approved and frozen: rows cannot be moved into it', NEW.reduction_id USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      IF TG_OP = 'DELETE' THEN RETURN OLD; END IF;
      RETURN NEW;
    END $$`);
  await knex.raw('CREATE TRIGGER reduction_points_frozen BEFORE INSERT OR UPDATE OR DELETE ON reduction_points FOR EACH ROW EXECUTE FUNCTION reduction_children_frozen()');
  await knex.raw('CREATE TRIGGER point_exclusions_frozen BEFORE INSERT OR UPDATE OR DELETE ON point_exclusions FOR EACH ROW EXECUTE FUNCTION reduction_children_frozen()');

  // Submissions are decided once; their chosen reductions never change after submission.
  await knex.raw(`
    CREATE FUNCTION submissions_decided_once() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_OP = 'DELETE' THEN
        RAISE EXCEPTION 'submission % is part of the record and cannot be deleted', OLD.id USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      IF OLD.state <> 'awaiting_approval' THEN
        RAISE EXCEPTION 'submission % was already decided (%) and cannot change', OLD.id, OLD.state USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      IF NEW.test_id IS DISTINCT FROM OLD.test_id OR NEW.sequence IS DISTINCT FROM OLD.sequence OR NEW.submitted_by IS DISTINCT FROM OLD.submitted_by THEN
        RAISE EXCEPTION 'submission %: only the decision can be recorded', OLD.id USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      RETURN NEW;
    END $$`);
  await knex.raw('CREATE TRIGGER submissions_decided_once BEFORE UPDATE OR DELETE ON submissions FOR EACH ROW EXECUTE FUNCTION submissions_decided_once()');
  await knex.raw(`
    CREATE FUNCTION submission_reductions_fixed() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      RAISE EXCEPTION 'the reductions of a submission are fixed when it is submitted' USING ERRCODE = 'integrity_constraint_violation';
    END $$`);
  await knex.raw('CREATE TRIGGER submission_reductions_fixed BEFORE UPDATE OR DELETE ON submission_reductions FOR EACH ROW EXECUTE FUNCTION submission_reductions_fixed()');

  // An issued sheet never changes, except to be marked superseded once.
  await knex.raw(`
    CREATE FUNCTION result_sheets_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_OP = 'DELETE' THEN
        RAISE EXCEPTION 'result sheet % was issued and cannot be deleted', OLD.id USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      IF OLD.state = 'superseded' OR NEW.state <> 'superseded' THEN
        RAISE EXCEPTION 'result sheet % was issued: it can only be marked superseded, once', OLD.id USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      IF NEW.pdf IS DISTINCT FROM OLD.pdf OR NEW.sha256 IS DISTINCT FROM OLD.sha256 OR NEW.report_number IS DISTINCT FROM OLD.report_number
         OR NEW.data IS DISTINCT FROM OLD.data OR NEW.issue_date IS DISTINCT FROM OLD.issue_date OR NEW.revision IS DISTINCT FROM OLD.revision
         OR NEW.series IS DISTINCT FROM OLD.series OR NEW.submission_id IS DISTINCT FROM OLD.submission_id OR NEW.test_id IS DISTINCT FROM OLD.test_id
         OR NEW.authorised_by IS DISTINCT FROM OLD.authorised_by OR NEW.issued_by IS DISTINCT FROM OLD.issued_by THEN
        RAISE EXCEPTION 'result sheet % was issued: its content cannot change', OLD.id USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      RETURN NEW;
    END $$`);
  await knex.raw('CREATE TRIGGER result_sheets_immutable BEFORE UPDATE OR DELETE ON result_sheets FOR EACH ROW EXECUTE FUNCTION result_sheets_immutable()');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('result_sheets');
  await knex.raw('DROP FUNCTION IF EXISTS result_sheets_immutable()');
  await knex.schema.dropTableIfExists('report_number_counters');
  await knex.schema.dropTableIfExists('submission_reductions');
  await knex.raw('DROP FUNCTION IF EXISTS submission_reductions_fixed()');
  await knex.schema.dropTableIfExists('submissions');
  await knex.raw('DROP FUNCTION IF EXISTS submissions_decided_once()');
  await knex.raw('DROP TRIGGER IF EXISTS point_exclusions_frozen ON point_exclusions');
  await knex.schema.dropTableIfExists('point_exclusions');
  await knex.raw('DROP TRIGGER IF EXISTS reduction_points_frozen ON reduction_points');
  await knex.raw('DROP FUNCTION IF EXISTS reduction_children_frozen()');
  await knex.raw('DROP TRIGGER IF EXISTS reductions_frozen ON reductions');
  await knex.raw('DROP FUNCTION IF EXISTS reductions_frozen()');
  await knex.schema.alterTable('reductions', (t) => {
    t.dropColumn('approved_at');
  });
  await knex.schema.dropTableIfExists('signing_rights');
}
