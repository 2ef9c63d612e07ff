import type { Knex } from 'knex';

/** Files attached to a revision (data sheets, test reports); the bytes live in object storage. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('revision_attachments', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('revision_id').unsigned().notNullable().references('id').inTable('formulation_revisions').onDelete('RESTRICT');
    t.integer('stored_file_id').unsigned().notNullable().references('id').inTable('stored_files').onDelete('RESTRICT');
    t.string('label', 200).notNullable();
    t.integer('created_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['revision_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('revision_attachments');
}
