import type { Knex } from 'knex';

/**
 * A plan's measured drag area now comes from an issued result sheet instead of a typed number. The plan keeps the
 * sheet, the configuration and yaw of the point taken, the value and U (k = 2) as printed (model scale) with the
 * article's scale, the full-scale value in `measured_drag_area`, and who linked it when. Sheets are never deleted, so
 * the foreign key restricts. Values typed in before this keep their row, with no sheet.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('plans', (t) => {
    t.uuid('measured_sheet_id').references('result_sheets.id').onDelete('RESTRICT').comment('issued result sheet the measured value is taken from');
    t.text('measured_configuration_code').comment('code of the configuration on that sheet, e.g. A');
    t.text('measured_configuration_label');
    t.double('measured_yaw').comment('yaw of the point taken (nearest 0°), deg');
    t.double('measured_sheet_drag_area').comment('C_D·S as printed on the sheet, model scale, m²');
    t.double('measured_sheet_uncertainty').comment('U (k = 2) of C_D·S as printed, m²');
    t.double('measured_scale').comment('full-scale to model length ratio of the sheet article');
    t.double('measured_expanded_uncertainty').comment('U (k = 2) of the full-scale measured C_D·A, m²');
    t.uuid('measured_linked_by').references('users.id').onDelete('RESTRICT');
    t.timestamp('measured_linked_at', { useTz: true });
    t.index(['measured_sheet_id']);
  });
  await knex.raw(`
    ALTER TABLE plans ADD CONSTRAINT plans_certified_link_complete CHECK (
      num_nulls(measured_sheet_id, measured_configuration_code, measured_configuration_label, measured_yaw, measured_sheet_drag_area,
                measured_sheet_uncertainty, measured_scale, measured_expanded_uncertainty, measured_linked_by, measured_linked_at) IN (0, 10)
      AND (measured_sheet_id IS NULL OR measured_drag_area IS NOT NULL)
      AND (measured_scale IS NULL OR measured_scale > 0)
      AND (measured_expanded_uncertainty IS NULL OR measured_expanded_uncertainty >= 0)
    )`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('ALTER TABLE plans DROP CONSTRAINT plans_certified_link_complete');
  await knex.schema.alterTable('plans', (t) => {
    t.dropIndex(['measured_sheet_id']);
    t.dropColumns(
      'measured_sheet_id',
      'measured_configuration_code',
      'measured_configuration_label',
      'measured_yaw',
      'measured_sheet_drag_area',
      'measured_sheet_uncertainty',
      'measured_scale',
      'measured_expanded_uncertainty',
      'measured_linked_by',
      'measured_linked_at',
    );
  });
}
