import type { Knex } from 'knex';

/**
 * Revisions of a formulation. content_json follows src/lib/formulations/content.ts; predicted_json
 * is the spectral core's evaluation at save time (core_version names the core that computed it);
 * content_sha256 is the SHA-256 of the canonical content JSON, the value an e-signature binds to.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('formulation_revisions', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('formulation_id').unsigned().notNullable().references('id').inTable('formulations').onDelete('RESTRICT');
    t.integer('revision_no').unsigned().notNullable();
    t.enu('state', ['draft', 'submitted', 'approved', 'returned', 'superseded', 'withdrawn']).notNullable().defaultTo('draft');
    t.text('content_json', 'mediumtext').notNullable();
    t.text('predicted_json', 'mediumtext').notNullable();
    t.string('core_version', 60).notNullable();
    t.specificType('content_sha256', 'CHAR(64)').notNullable();
    t.integer('version').unsigned().notNullable().defaultTo(1).comment('optimistic-lock counter');
    t.integer('created_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('submitted_at', { precision: 3 }).nullable();
    t.integer('submitted_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('decided_at', { precision: 3 }).nullable().comment('approved, returned or withdrawn (UTC)');
    t.integer('decided_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('superseded_at', { precision: 3 }).nullable();
    t.integer('supersedes_revision_id').unsigned().nullable().references('id').inTable('formulation_revisions').onDelete('RESTRICT')
      .comment('the approved revision this one replaced on approval');
    t.integer('based_on_revision_id').unsigned().nullable().references('id').inTable('formulation_revisions').onDelete('RESTRICT')
      .comment('the revision this draft was started from');
    t.integer('source_batch_id').unsigned().nullable().comment('batch a correction draft was made from');
    t.text('return_reason').nullable();
    t.text('withdraw_reason').nullable();
    t.unique(['formulation_id', 'revision_no']);
    t.index(['state']);
    t.index(['created_by']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('formulation_revisions');
}
