import type { Knex } from 'knex';

/**
 * The colour acceptance quality chose for a batch (when it differs from the revision's tolerance):
 * an n-step ellipse and whether the target ANSI bin is required. `version` guards stale edits.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('batch_acceptance', (t) => {
    t.integer('batch_id').unsigned().primary().references('id').inTable('batches').onDelete('RESTRICT');
    t.enu('mode', ['revision', 'steps']).notNullable();
    t.decimal('steps', 4, 1).nullable().comment('MacAdam-type steps when mode = steps');
    t.boolean('require_target_bin').notNullable().defaultTo(true);
    t.integer('version').unsigned().notNullable().defaultTo(1);
    t.integer('updated_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('batch_acceptance');
}
