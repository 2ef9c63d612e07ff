import type { Knex } from 'knex';

/**
 * Measurement files uploaded for a batch (integrating sphere + spectrometer exports). The raw file
 * stays in object storage (stored_files); an upload is never deleted, only withdrawn with a reason,
 * so the record keeps what was measured and who took it out.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('measurement_uploads', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('batch_id').unsigned().notNullable().references('id').inTable('batches').onDelete('RESTRICT');
    t.integer('stored_file_id').unsigned().notNullable().references('id').inTable('stored_files').onDelete('RESTRICT');
    t.string('original_name', 255).notNullable();
    t.integer('parts_count').unsigned().notNullable();
    t.text('wavelengths_json', 'mediumtext').notNullable().comment('nm, shared by every part of the file');
    t.text('warnings_json').nullable().comment('parser notes: dialect, skipped comment lines');
    t.string('core_version', 80).notNullable().comment('spectral core that computed the metrics');
    t.integer('uploaded_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('withdrawn_at', { precision: 3 }).nullable();
    t.integer('withdrawn_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.string('withdraw_reason', 500).nullable();
    t.index(['batch_id', 'withdrawn_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('measurement_uploads');
}
