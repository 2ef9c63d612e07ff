/**
 * Demo chip bins of Kestrel Hollow Lighting's blue pump: four 2.5 nm peak-wavelength bins (common
 * practice for blue chips) with an invented share of supply. A pump that already has bins is left alone.
 */
import type { Knex } from 'knex';
import { pumpBinSetSchema } from '../src/lib/pump-bins/schema';

/** Also put back by browser tests that need the demo bins (tests/e2e/support/chip-bins.ts). */
export const B450_CHIP_BINS = pumpBinSetSchema.parse({
  basis: 'peak',
  bins: [
    { code: 'B3', fromNm: 445, toNm: 447.5, sharePct: 15 },
    { code: 'B4', fromNm: 447.5, toNm: 450, sharePct: 35 },
    { code: 'B5', fromNm: 450, toNm: 452.5, sharePct: 35 },
    { code: 'B6', fromNm: 452.5, toNm: 455, sharePct: 15 }
  ]
});

export async function seed(knex: Knex): Promise<void> {
  if (!(await knex.schema.hasTable('pump_bin_sets'))) return;
  const pump = await knex('materials').where({ code: 'B-450', kind: 'pump' }).first('id');
  if (!pump) return;
  if (await knex('pump_bin_sets').where({ material_id: pump.id }).first('material_id')) return;
  await knex('pump_bin_sets').insert({ material_id: pump.id, set_json: JSON.stringify(B450_CHIP_BINS), version: 1 });
  console.log('seed 08_pump_bins: B-450 chip bins B3–B6 (445–455 nm, peak).');
}
