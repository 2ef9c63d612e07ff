/**
 * Materials state their own hazards (a comma-separated list of codes from the library's catalogue),
 * so a caution prints only where a material carries it. Existing fluoride and sulfide phosphors get
 * theirs from their chemistry description.
 */
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('materials', (t) => {
    t.string('hazards', 200).notNullable().defaultTo('');
  });
  await knex('materials').where('family', 'like', '%fluoride%').update({ hazards: 'hydrogenFluoride' });
  await knex('materials').where('family', 'like', '%sulfide%').update({ hazards: 'hydrogenSulfide' });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('materials', (t) => {
    t.dropColumn('hazards');
  });
}
