import type { Knex } from 'knex';

/**
 * Thermal data of a material (one row per material): the phosphor's relative emission vs
 * temperature (with optional peak shift and width change) or the pump's peak drift and relative
 * output, as JSON checked by the thermal schema (src/lib/blend/thermal/schema.ts). No row = not
 * characterised. `version` is the optimistic lock of edits.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('material_thermal', (t) => {
    t.integer('material_id').unsigned().primary().references('id').inTable('materials').onDelete('CASCADE');
    t.text('data_json').notNullable().comment('thermal data, materialThermalSchema');
    t.string('source', 200).nullable().comment('where the data come from: datasheet, lab report, file name');
    t.integer('version').unsigned().notNullable().defaultTo(1);
    t.integer('updated_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('material_thermal');
}
