/**
 * Demo material library of Kestrel Hollow Lighting: the invented pumps and phosphors of
 * src/lib/blend/demo-components.ts (code = the part of the name before the first space),
 * spectra generated from their analytic shapes, invented suppliers and 2–3 lots each.
 * Nominal peak/FWHM values are typical for the generic family [from memory, see demo-components.ts];
 * d50 sizes follow the usual 10–25 µm [common practice]; everything else is invented.
 * Idempotent: materials whose code already exists are left alone.
 */
import type { Knex } from 'knex';
import { DEMO_PHOSPHORS, DEMO_PUMPS } from '../src/lib/blend/demo-components';
import { gridToSpd } from '../src/lib/blend/grid';
import { splitGaussian } from '../src/lib/blend/shapes/splitGaussian';
import { resampleToGrid } from '../src/lib/spectral/resample';
import { spectralShape } from '../src/lib/spectral/metrics/spectral-shape';
import type { Spd } from '../src/lib/spectral/types';

const PHOSPHOR_SUPPLIERS = ['Larkspur Luminescent Materials', 'Tidewater Phosphor Works', 'Corriebrae Phosphors'];
const PUMP_SUPPLIERS = ['Quillmere Optoelectronics', 'Fernhollow Semiconductor'];
const POWDER =
  'Fine powder: weigh under local exhaust or in an enclosure, avoid raising dust, ' +
  'wear gloves and eye protection (FFP2/N95 where dust is possible). Follow the ' +
  'supplier safety data sheet.';
const SAFETY: Record<string, string> = {
  fluoride: `${POWDER} Fluoride phosphor: keep dry and away from acids (may release HF/fluoride); follow the site fluoride first-aid plan.`,
  nitride: `${POWDER} Nitride: may release ammonia with strong acids or bases.`,
  default: POWDER
};
const PUMP_SAFETY =
  'Blue/violet emitter: do not look into the powered chip; photobiological ' +
  '(blue-light) risk group needs measurement per IEC 62471. Near-UV chips: check ' +
  'UV emission too.';

const codeOf = (name: string) => name.split(' ')[0];
const roundSpd = (s: Spd): Spd => ({ wavelengths: s.wavelengths, values: s.values.map((v) => Number(v.toPrecision(5))) });

function safetyFor(family: string): string {
  if (/fluoride/i.test(family)) return SAFETY.fluoride;
  if (/nitride/i.test(family)) return SAFETY.nitride;
  return SAFETY.default;
}

async function insertSpectrum(
  trx: Knex.Transaction,
  materialId: number,
  kind: 'emission' | 'excitation',
  spd: Spd,
  by: number | null
): Promise<number> {
  const [id] = await trx('material_spectra').insert({
    material_id: materialId,
    kind,
    wavelengths_json: JSON.stringify(spd.wavelengths),
    values_json: JSON.stringify(spd.values),
    points: spd.wavelengths.length,
    min_nm: spd.wavelengths[0],
    max_nm: spd.wavelengths[spd.wavelengths.length - 1],
    source_file_id: null,
    origin: 'generated',
    created_by: by
  });
  return id;
}

interface SeedMaterial {
  kind: 'pump' | 'phosphor';
  name: string;
  family: string;
  emission: Spd;
  excitation?: Spd;
  nominal: string;
  fields: Record<string, unknown>;
}

function materials(): SeedMaterial[] {
  const pumps: SeedMaterial[] = DEMO_PUMPS.map((p) => {
    const { peakNm, fwhmNm, asymmetry } = p.parametric!;
    return {
      kind: 'pump',
      name: p.name,
      family: 'InGaN LED chip',
      emission: roundSpd(gridToSpd(splitGaussian(peakNm, fwhmNm, asymmetry ?? 0))),
      nominal: `Nominal peak ${peakNm} nm, FWHM ${fwhmNm} nm (typical InGaN chip values, from memory).`,
      fields: { cost_per_kg: null, safety_note: PUMP_SAFETY }
    };
  });
  const phosphors: SeedMaterial[] = DEMO_PHOSPHORS.map((p, i) => ({
    kind: 'phosphor',
    name: p.name,
    family: p.family ?? '',
    emission: p.emission,
    excitation: p.excitation,
    nominal: `Nominal peak ${p.nominalPeakNm} nm, FWHM ${p.nominalFwhmNm} nm (typical of the family, ${p.source}).`,
    fields: {
      iqe: p.iqe,
      density_g_cm3: p.densityGPerCm3,
      absorption_per_wt_pct_mm: p.absorptionPerWtPctMm,
      absorption_reference_nm: p.absorptionReferenceNm,
      cost_per_kg: p.costPerKg,
      d50_um: 12 + ((i * 7) % 12),
      safety_note: safetyFor(p.family ?? ''),
      hazards: /fluoride/i.test(p.family ?? '') ? 'hydrogenFluoride' : ''
    }
  }));
  return [...pumps, ...phosphors];
}

export async function seed(knex: Knex): Promise<void> {
  const author = await knex('users').where({ email: 'rhea.okafor@kestrelhollow.example' }).first('id', 'email');
  const by: number | null = author?.id ?? null;
  let n = 0;
  for (const m of materials()) {
    const code = codeOf(m.name);
    if (await knex('materials').where({ code }).first('id')) continue;
    const suppliers = m.kind === 'pump' ? PUMP_SUPPLIERS : PHOSPHOR_SUPPLIERS;
    const supplier = suppliers[n++ % suppliers.length];
    const shape = spectralShape(resampleToGrid(m.emission));
    await knex.transaction(async (trx) => {
      const [id] = await trx('materials').insert({
        kind: m.kind,
        code,
        name: m.name,
        family: m.family,
        supplier,
        peak_nm: Number(shape.peakNm.toFixed(2)),
        fwhm_nm: Number(shape.fwhmNm.toFixed(2)),
        notes: `${m.nominal} Demo spectrum generated from an analytic band shape.`,
        created_by: by,
        updated_by: by,
        ...m.fields
      });
      const emissionId = await insertSpectrum(trx, id, 'emission', m.emission, by);
      const excitationId = m.excitation ? await insertSpectrum(trx, id, 'excitation', m.excitation, by) : null;
      await trx('materials').where({ id }).update({ emission_spectrum_id: emissionId, excitation_spectrum_id: excitationId });
      const lots = 2 + (n % 2);
      for (let k = 0; k < lots; k++) {
        await trx('material_lots').insert({
          material_id: id,
          lot_number:
            `${supplier.split(' ')[0].slice(0, 3).toUpperCase()}-` +
            `${code.replace(/[^A-Z0-9]/g, '')}-26${String(k * 4 + 1).padStart(2, '0')}`,
          supplier,
          received_on: `2026-${String(k * 4 + 1).padStart(2, '0')}-1${k}`,
          expires_on: `2028-${String(k * 4 + 1).padStart(2, '0')}-1${k}`,
          notes: k === lots - 1 ? 'Current lot.' : null,
          created_by: by
        });
      }
      await trx('audit_events').insert({
        actor_id: by,
        actor_email: author?.email ?? null,
        entity_type: 'material',
        entity_id: String(id),
        action: 'create',
        after_json: JSON.stringify({ code, name: m.name, kind: m.kind, source: 'demo seed' })
      });
    });
  }
}
