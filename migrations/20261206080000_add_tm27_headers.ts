import type { Knex } from 'knex';

/**
 * The IES TM-27-14 document header (and each spectral distribution's quantity and bandwidth) kept
 * beside a spectrum read from such a file, so the maker's and laboratory's fields travel on when
 * the spectrum is exported again. Null for CSV/TXT uploads and generated spectra.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('material_spectra', (t) => {
    t.text('tm27_json').nullable().comment('IES TM-27 header and distribution fields of the source file');
  });
  await knex.schema.alterTable('measurement_uploads', (t) => {
    t.text('tm27_json').nullable().comment('IES TM-27 header and distribution fields of the source file');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measurement_uploads', (t) => {
    t.dropColumn('tm27_json');
  });
  await knex.schema.alterTable('material_spectra', (t) => {
    t.dropColumn('tm27_json');
  });
}
