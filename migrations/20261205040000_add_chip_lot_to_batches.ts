import type { Knex } from 'knex';

/**
 * The chip lot a batch is built with and, for a revision with a recipe per pump bin, the bin whose
 * recipe is weighed (picked by code or by the lot's measured wavelength, which is kept too).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('batches', (t) => {
    t.string('chip_lot', 80).nullable().comment('lot number of the LED chips (pump) built with');
    t.string('chip_bin_code', 20).nullable().comment("pump bin whose recipe is weighed (the revision's recipe matrix)");
    t.decimal('chip_wavelength_nm', 6, 2).nullable().comment("chip lot's measured wavelength, nm, on the bins' basis (peak or dominant)");
    t.index(['chip_lot'], 'batches_chip_lot_index');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('batches', (t) => {
    t.dropIndex(['chip_lot'], 'batches_chip_lot_index');
    t.dropColumn('chip_wavelength_nm');
    t.dropColumn('chip_bin_code');
    t.dropColumn('chip_lot');
  });
}
