/**
 * Test stand-in for the materials library: inserts the invented demo pumps and phosphors
 * (src/lib/blend/demo-components.ts) with their emission spectra when a code is missing, so
 * formulation tests run before (and independently of) the materials seed. Code = the part of the
 * demo name before the first space, as the materials seed does.
 */
import type { Knex } from 'knex';
import { DEMO_PHOSPHORS, DEMO_PUMPS } from '../../src/lib/blend/demo-components';
import { pumpGrid } from '../../src/lib/blend/basis';
import { gridToSpd } from '../../src/lib/blend/grid';
import type { Spd } from '../../src/lib/blend/types';

async function insertMaterial(
  knex: Knex,
  kind: 'pump' | 'phosphor',
  name: string,
  emission: Spd,
  extra: Record<string, unknown>
): Promise<number> {
  const code = name.split(' ')[0];
  const found = await knex('materials').where({ code }).first('id');
  if (found) return found.id;
  return knex.transaction(async (trx) => {
    const [id] = await trx('materials').insert({ kind, code, name, ...extra });
    const [spectrumId] = await trx('material_spectra').insert({
      material_id: id,
      kind: 'emission',
      wavelengths_json: JSON.stringify(emission.wavelengths),
      values_json: JSON.stringify(emission.values),
      points: emission.wavelengths.length,
      min_nm: emission.wavelengths[0],
      max_nm: emission.wavelengths.at(-1),
      origin: 'generated'
    });
    await trx('materials').where({ id }).update({ emission_spectrum_id: spectrumId });
    return id;
  });
}

/** Material ids by code, after making sure every demo component exists. */
export async function ensureDemoMaterials(knex: Knex): Promise<Map<string, number>> {
  const ids = new Map<string, number>();
  for (const p of DEMO_PUMPS) {
    const spd = gridToSpd(pumpGrid(p));
    ids.set(
      p.name.split(' ')[0],
      await insertMaterial(
        knex,
        'pump',
        p.name,
        { wavelengths: spd.wavelengths, values: spd.values.map((v) => Number(v.toPrecision(5))) },
        {}
      )
    );
  }
  for (const p of DEMO_PHOSPHORS) {
    ids.set(
      p.name.split(' ')[0],
      await insertMaterial(knex, 'phosphor', p.name, p.emission, {
        family: p.family,
        iqe: p.iqe,
        absorption_per_wt_pct_mm: p.absorptionPerWtPctMm,
        absorption_reference_nm: p.absorptionReferenceNm,
        density_g_cm3: p.densityGPerCm3,
        cost_per_kg: p.costPerKg,
        peak_nm: p.nominalPeakNm,
        fwhm_nm: p.nominalFwhmNm,
        hazards: /fluoride/i.test(p.family ?? '') ? 'hydrogenFluoride' : ''
      })
    );
  }
  return ids;
}
