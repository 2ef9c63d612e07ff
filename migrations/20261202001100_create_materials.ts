import type { Knex } from 'knex';

/**
 * Pumps and phosphors of the library. Spectra are stored in material_spectra (append-only history);
 * the material points at its current emission and excitation spectrum. `version` is the
 * optimistic-lock counter: an update must name the version it read.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('materials', (t) => {
    t.increments('id').unsigned().primary();
    t.enu('kind', ['pump', 'phosphor']).notNullable();
    t.string('code', 40).notNullable().unique().comment('short code used on tickets, e.g. YL-568');
    t.string('name', 200).notNullable();
    t.string('family', 200).nullable().comment('generic chemistry, e.g. garnet, Ce-activated');
    t.string('supplier', 200).nullable();
    t.decimal('peak_nm', 7, 2).nullable().comment('computed from the emission spectrum');
    t.decimal('fwhm_nm', 7, 2).nullable().comment('computed from the emission spectrum');
    t.decimal('density_g_cm3', 7, 3).nullable();
    t.decimal('iqe', 6, 4).nullable().comment('internal quantum efficiency, 0–1');
    t.double('absorption_per_wt_pct_mm').nullable().comment('absorption coefficient at the pump, 1/(wt %·mm)');
    t.decimal('absorption_reference_nm', 7, 2).nullable();
    t.decimal('cost_per_kg', 12, 2).nullable();
    t.decimal('d50_um', 8, 2).nullable().comment('median particle size');
    t.text('notes').nullable();
    t.text('safety_note').nullable();
    t.integer('emission_spectrum_id').unsigned().nullable();
    t.integer('excitation_spectrum_id').unsigned().nullable();
    t.timestamp('archived_at', { precision: 3 }).nullable();
    t.integer('version').unsigned().notNullable().defaultTo(1);
    t.integer('created_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.integer('updated_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['kind', 'archived_at']);
  });
  await knex.schema.createTable('material_spectra', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('material_id').unsigned().notNullable().references('id').inTable('materials').onDelete('CASCADE');
    t.enu('kind', ['emission', 'excitation']).notNullable();
    t.text('wavelengths_json', 'mediumtext').notNullable();
    t.text('values_json', 'mediumtext').notNullable();
    t.integer('points').unsigned().notNullable();
    t.decimal('min_nm', 7, 2).notNullable();
    t.decimal('max_nm', 7, 2).notNullable();
    t.integer('source_file_id').unsigned().nullable().references('id').inTable('stored_files').onDelete('RESTRICT');
    t.string('origin', 40).notNullable().defaultTo('upload').comment('upload, api, generated');
    t.integer('created_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['material_id', 'kind']);
  });
  await knex.schema.alterTable('materials', (t) => {
    t.foreign('emission_spectrum_id').references('id').inTable('material_spectra').onDelete('RESTRICT');
    t.foreign('excitation_spectrum_id').references('id').inTable('material_spectra').onDelete('RESTRICT');
  });
  await knex.schema.createTable('material_lots', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('material_id').unsigned().notNullable().references('id').inTable('materials').onDelete('RESTRICT');
    t.string('lot_number', 80).notNullable();
    t.string('supplier', 200).nullable();
    t.date('received_on').nullable();
    t.date('expires_on').nullable();
    t.integer('certificate_file_id').unsigned().nullable().references('id').inTable('stored_files').onDelete('RESTRICT');
    t.text('notes').nullable();
    t.integer('created_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.unique(['material_id', 'lot_number']);
    t.index(['lot_number']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('material_lots');
  await knex.schema.alterTable('materials', (t) => {
    t.dropForeign(['emission_spectrum_id']);
    t.dropForeign(['excitation_spectrum_id']);
  });
  await knex.schema.dropTable('material_spectra');
  await knex.schema.dropTable('materials');
}
