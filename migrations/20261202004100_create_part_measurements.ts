import type { Knex } from 'knex';

/**
 * One measured part of a batch: its spectrum (values on the upload's wavelengths) and the metrics
 * the spectral core computed at upload. Key metrics have their own columns for queries.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('part_measurements', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('upload_id').unsigned().notNullable().references('id').inTable('measurement_uploads').onDelete('RESTRICT');
    t.integer('batch_id').unsigned().notNullable().references('id').inTable('batches').onDelete('RESTRICT');
    t.string('part_label', 80).notNullable().comment('column header or file name of the part');
    t.integer('column_no').unsigned().notNullable().comment('1-based column in the file (wavelength = 1)');
    t.text('values_json', 'mediumtext').notNullable().comment('relative spectral power on the upload wavelengths');
    t.text('metrics_json').notNullable().comment('every core metric of the part');
    t.double('x').notNullable().comment('CIE 1931 2°');
    t.double('y').notNullable();
    t.double('cct_k').notNullable().comment('K, Ohno 2014');
    t.double('duv').notNullable();
    t.double('ra').nullable().comment('CIE 13.3');
    t.double('r9').nullable();
    t.double('ler_lm_per_w').notNullable().comment('lm/W');
    t.integer('ansi_bin').unsigned().nullable().comment('nominal CCT of the ANSI C78.377 Table 1 bin; null = none');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['batch_id', 'part_label']);
    t.index(['upload_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('part_measurements');
}
