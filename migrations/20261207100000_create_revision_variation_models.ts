import type { Knex } from 'knex';

/**
 * The variation model a revision's yield forecasts use (chip wavelength spread, slurry mass CV, weighing,
 * phosphor lot variation, measurement noise). A forecast input, not signed content: it may change after
 * signing, by hand or fitted to a measured batch. No row = the defaults. `version` guards stale edits.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('revision_variation_models', (t) => {
    t.integer('revision_id').unsigned().primary().references('id').inTable('formulation_revisions').onDelete('RESTRICT');
    t.text('model_json').notNullable().comment('variation model (zod-validated)');
    t.string('source', 20).notNullable().comment('edited by hand, or fitted to a measured batch');
    t.integer('fitted_batch_id').unsigned().nullable().references('id').inTable('batches').onDelete('RESTRICT');
    t.integer('version').unsigned().notNullable();
    t.integer('updated_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('revision_variation_models');
}
