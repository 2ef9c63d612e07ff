import type { Knex } from 'knex';

/**
 * A batch's parts are read in upload and column order; with 100,000 parts a sort of the rows (each with its
 * metrics JSON) took seconds. The upload index becomes (upload_id, column_no), which gives them in that
 * order and still serves the foreign key — no extra index to keep up on insert.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('part_measurements', (t) => {
    t.index(['upload_id', 'column_no'], 'part_measurements_upload_column_index');
  });
  await knex.schema.alterTable('part_measurements', (t) => {
    t.dropIndex(['upload_id'], 'part_measurements_upload_id_index');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('part_measurements', (t) => {
    t.index(['upload_id'], 'part_measurements_upload_id_index');
  });
  await knex.schema.alterTable('part_measurements', (t) => {
    t.dropIndex(['upload_id', 'column_no'], 'part_measurements_upload_column_index');
  });
}
