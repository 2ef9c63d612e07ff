import type { Knex } from 'knex';

/** Two-part silicone systems a revision can name (mix ratio A:B by weight, pot life, cure, handling). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('silicone_systems', (t) => {
    t.increments('id').unsigned().primary();
    t.string('name', 200).notNullable().unique();
    t.string('supplier', 200).nullable();
    t.decimal('ratio_a', 6, 2).notNullable().comment('parts by weight of part A');
    t.decimal('ratio_b', 6, 2).notNullable().comment('parts by weight of part B');
    t.integer('pot_life_min').unsigned().notNullable().comment('working life after mixing at 25 °C, minutes');
    t.string('cure', 300).notNullable().comment('cure schedule, e.g. 1 h at 80 °C then 2 h at 150 °C');
    t.text('degas_notes').nullable();
    t.decimal('density_g_cm3', 6, 3).nullable().comment('mixed density, g/cm³');
    t.decimal('refractive_index', 5, 3).nullable();
    t.text('safety_note').notNullable();
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('silicone_systems');
}
