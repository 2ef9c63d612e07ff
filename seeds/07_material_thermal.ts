/**
 * Demo thermal data of Kestrel Hollow Lighting's library (invented within the ranges the trade
 * quotes [from memory]): garnets keep ~90–95 % of their emission at 150 °C, nitride reds ~85–90 %,
 * the narrow-band green and the nitride orange in between; the blue chip drifts 0.04 nm/K and
 * 0.004 nm/mA above 350 mA and loses ~15 % output at 150 °C. Materials already characterised, and
 * demo codes not in the library, are left alone.
 */
import type { Knex } from 'knex';
import { materialThermalSchema } from '../src/lib/blend/thermal/schema';

const curve = (q85: number, q125: number, q150: number) =>
  [25, 85, 125, 150].map((temperatureC, i) => ({ temperatureC, value: [1, q85, q125, q150][i] }));

const DATA: Record<string, unknown> = {
  'B-450': {
    kind: 'pump',
    peakDriftNmPerK: 0.04,
    peakDriftNmPerMa: 0.004,
    referenceCurrentMa: 350,
    relativeOutput: curve(0.94, 0.89, 0.85)
  },
  'YG-555': { kind: 'phosphor', relativeEmission: curve(0.98, 0.95, 0.93), peakShiftNm: { perK: -0.01 } },
  'YL-568': { kind: 'phosphor', relativeEmission: curve(0.97, 0.94, 0.91), peakShiftNm: { perK: -0.015 } },
  'GL-530': { kind: 'phosphor', relativeEmission: curve(0.98, 0.96, 0.94) },
  'OR-600': { kind: 'phosphor', relativeEmission: curve(0.95, 0.9, 0.86), widthFactor: { perK: 0.0004 } },
  'RD-625': { kind: 'phosphor', relativeEmission: curve(0.96, 0.91, 0.87), widthFactor: { perK: 0.0004 } }
};

export async function seed(knex: Knex): Promise<void> {
  if (!(await knex.schema.hasTable('material_thermal'))) return;
  const rows: { id: number; code: string }[] = await knex('materials').whereIn('code', Object.keys(DATA)).select('id', 'code');
  for (const m of rows) {
    if (await knex('material_thermal').where({ material_id: m.id }).first('material_id')) continue;
    const thermal = materialThermalSchema.parse(DATA[m.code]);
    await knex('material_thermal').insert({
      material_id: m.id,
      data_json: JSON.stringify(thermal),
      source: 'demo seed [from memory]',
      version: 1
    });
  }
}
