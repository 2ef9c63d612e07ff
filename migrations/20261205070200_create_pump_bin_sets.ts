import type { Knex } from 'knex';

/**
 * The wavelength bins a pump's chips are sorted into (one set per pump material): the basis (peak or
 * dominant wavelength) and the bins as JSON checked by the pump-bin schema (src/lib/pump-bins).
 * No row = no bins. `version` is the optimistic lock of edits.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('pump_bin_sets', (t) => {
    t.integer('material_id').unsigned().primary().references('id').inTable('materials').onDelete('CASCADE');
    t.text('set_json').notNullable().comment('pumpBinSetSchema');
    t.integer('version').unsigned().notNullable().defaultTo(1);
    t.integer('updated_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('pump_bin_sets');
}
