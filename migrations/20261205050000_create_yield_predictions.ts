import type { Knex } from 'knex';

/**
 * Predicted production yield of a formulation revision: the variation model, seed and part count of a
 * Monte Carlo run and its figures (shares inside the ANSI quadrangle, step ellipses and tolerance, CCT,
 * Duv, LER, Ra, R9 distributions, variance breakdown). Kept beside the revision, never in its signed content.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('yield_predictions', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('revision_id').unsigned().notNullable().references('id').inTable('formulation_revisions').onDelete('RESTRICT');
    t.text('model_json').notNullable().comment('variation model (zod-validated)');
    t.integer('seed').unsigned().notNullable();
    t.integer('parts').unsigned().notNullable();
    t.text('figures_json', 'mediumtext').notNullable().comment('yield figures, rendering subsample and variance breakdown');
    t.string('source', 20).notNullable().defaultTo('predicted').comment('predicted, or fitted to a measured batch');
    t.integer('computed_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('computed_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['revision_id', 'computed_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('yield_predictions');
}
