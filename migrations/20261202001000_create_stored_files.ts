import type { Knex } from 'knex';

/** Files kept in object storage (S3 API): original spectrum exports, data sheets, certificates, PDFs. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('stored_files', (t) => {
    t.increments('id').unsigned().primary();
    t.string('storage_key', 300).notNullable().unique().comment('object key in the bucket');
    t.string('original_name', 255).notNullable();
    t.string('content_type', 120).notNullable();
    t.integer('bytes').unsigned().notNullable();
    t.string('sha256', 64).notNullable();
    t.string('purpose', 40).notNullable().comment('spectrum-source, safety-data-sheet, certificate, ticket, batch-record, measurement, attachment');
    t.string('entity_type', 40).nullable();
    t.string('entity_id', 40).nullable();
    t.integer('uploaded_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['entity_type', 'entity_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('stored_files');
}
