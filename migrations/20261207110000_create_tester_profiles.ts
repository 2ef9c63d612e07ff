import type { Knex } from 'knex';

/**
 * Tester tables: named profiles of inline testers' per-part exports (column mapping, units, decimal mark,
 * header lines, chromaticity space); an upload says whether it held spectra or a tester table and which
 * profile read it; a part read from a table has no spectrum, so its LER may be unknown.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('tester_profiles', (t) => {
    t.increments('id').unsigned().primary();
    t.string('name', 80).notNullable().unique();
    t.text('profile_json').notNullable().comment('tester profile (zod-validated)');
    t.integer('version').unsigned().notNullable();
    t.integer('created_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.integer('updated_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });
  await knex.schema.alterTable('measurement_uploads', (t) => {
    t.enu('source_kind', ['spectra', 'table']).notNullable().defaultTo('spectra').comment('spectra, or a tester per-part table');
    t.integer('tester_profile_id').unsigned().nullable().references('id').inTable('tester_profiles').onDelete('RESTRICT');
    t.integer('tester_profile_version').unsigned().nullable().comment('the profile version that read the table');
  });
  await knex.schema.alterTable('part_measurements', (t) => {
    t.double('ler_lm_per_w').nullable().comment('lm/W; null for a part read from a tester table').alter();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex('part_measurements').whereNull('ler_lm_per_w').update({ ler_lm_per_w: 0 });
  await knex.schema.alterTable('part_measurements', (t) => {
    t.double('ler_lm_per_w').notNullable().comment('lm/W').alter();
  });
  await knex.schema.alterTable('measurement_uploads', (t) => {
    t.dropForeign(['tester_profile_id']);
    t.dropColumn('tester_profile_version');
    t.dropColumn('tester_profile_id');
    t.dropColumn('source_kind');
  });
  await knex.schema.dropTable('tester_profiles');
}
