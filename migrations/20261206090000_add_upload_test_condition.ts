import type { Knex } from 'knex';

/**
 * The condition a measurement file was taken at: test temperature (junction or solder point) and
 * drive current. Null temperature = the bench (25 °C, current not stated), as every earlier upload.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measurement_uploads', (t) => {
    t.enu('test_reference', ['junction', 'solderPoint']).nullable().comment('which temperature is stated');
    t.decimal('test_temperature_c', 5, 1).nullable().comment('°C; null = bench 25 °C');
    t.decimal('test_current_ma', 8, 1).nullable().comment('mA; null = not stated');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measurement_uploads', (t) => {
    t.dropColumn('test_current_ma');
    t.dropColumn('test_temperature_c');
    t.dropColumn('test_reference');
  });
}
