import type { Knex } from 'knex';

/**
 * Blend corrections computed from a measured batch: the draft revision they created, the measured
 * mean used, the share of the step applied and the colour point predicted for the corrected ratios
 * (model + measured bias). The draft itself lives in formulation_revisions (source_batch_id).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('batch_corrections', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('batch_id').unsigned().notNullable().references('id').inTable('batches').onDelete('RESTRICT');
    t.integer('revision_id').unsigned().notNullable().references('id').inTable('formulation_revisions').onDelete('RESTRICT');
    t.decimal('step_fraction', 4, 3).notNullable().comment('share of the full correction applied, 0–1');
    t.double('measured_x').notNullable().comment('CIE 1931 2° mean of the parts');
    t.double('measured_y').notNullable();
    t.integer('parts_count').unsigned().notNullable();
    t.double('predicted_x').notNullable().comment('model point of the corrected ratios + measured bias');
    t.double('predicted_y').notNullable();
    t.double('predicted_cct_k').notNullable();
    t.double('predicted_duv').notNullable();
    t.text('detail_json').notNullable().comment('recipe kind, multipliers, bias, errors before/after');
    t.integer('created_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['batch_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('batch_corrections');
}
