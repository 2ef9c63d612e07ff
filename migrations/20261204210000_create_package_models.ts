import type { Knex } from 'knex';

/**
 * Package models: the loading model of one package type calibrated from measured builds
 * (absorption per phosphor, pump escape, IQE scale, each with its stated uncertainty). Versions
 * are immutable: a new fit of the same model name is a new row with the next version.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('package_models', (t) => {
    t.increments('id').unsigned().primary();
    t.string('name', 120).notNullable();
    t.integer('version').unsigned().notNullable().comment('1, 2, … per name; a new fit is a new version');
    t.string('package_type', 80).notNullable().comment('e.g. a mid-power SMD outline');
    t.enu('dispense_geometry', ['fixedMass', 'fixedVolume']).notNullable().defaultTo('fixedMass');
    t.double('path_length_mm').notNullable().comment('effective optical path at the reference dispense mass, mm');
    t.double('dispense_mass_mg').nullable().comment('reference slurry mass per package, mg');
    t.integer('pump_material_id').unsigned().notNullable().references('id').inTable('materials').onDelete('RESTRICT');
    t.text('phosphors_json').notNullable().comment('[{ materialId, code }] in fit order');
    t.boolean('cascade').notNullable().defaultTo(false).comment('first-order re-absorption in the model');
    t.text('parameters_json', 'mediumtext').notNullable().comment('fitted parameters and their one-sigma uncertainty');
    t.text('fit_json', 'mediumtext').notNullable().comment('convergence, per-build residuals (MacAdam steps), bootstrap');
    t.text('builds_json', 'mediumtext').notNullable().comment('the measured builds the fit used');
    t.double('rms_steps').notNullable().comment('RMS colour residual over the builds, MacAdam steps');
    t.double('max_steps').notNullable().comment('largest colour residual, MacAdam steps');
    t.integer('created_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.unique(['name', 'version']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('package_models');
}
