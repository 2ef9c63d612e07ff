/**
 * Rows the quality tests need: a completed batch made through the batches services from a seeded,
 * approved demo revision (Kestrel Hollow, invented), and measurement files of synthetic parts built
 * with the blend model from the revision's own materials, with a known bias and a small scatter.
 */
import { db } from '../../../src/lib/server/db/index';
import { createBatch } from '../../../src/lib/server/batches/create';
import { getBatch } from '../../../src/lib/server/batches/read';
import { markMixed, recordLine } from '../../../src/lib/server/batches/weighing';
import { completeBatch } from '../../../src/lib/server/batches/complete';
import { createBatchSchema } from '../../../src/lib/schemas/batches';
import { loadBlendComponents } from '../../../src/lib/server/materials/components';
import { getRevision } from '../../../src/lib/server/formulations/read';
import { mix } from '../../../src/lib/blend/mix';
import { demoUser } from '../batches/support';

export { DEMO_PASSWORD, demoUser } from '../batches/support';

export async function approvedRevisionId(code = 'KH-W30-90'): Promise<number> {
  const row = await db()('formulation_revisions as r').join('formulations as f', 'f.id', 'r.formulation_id')
    .where({ 'f.code': code, 'r.state': 'approved' }).first('r.id');
  if (!row) throw new Error(`no approved revision of ${code}: run the tests in a seeded sandbox`);
  return row.id;
}

async function currentLot(materialId: number): Promise<string> {
  const lot = await db()('material_lots').where({ material_id: materialId })
    .where((w) => w.whereNull('expires_on').orWhere('expires_on', '>', new Date())).orderBy('id', 'desc').first('lot_number');
  if (!lot) throw new Error(`material ${materialId} has no current lot`);
  return lot.lot_number;
}

/** A batch of the revision weighed out exactly to target by technician Tomas, mixed and completed. */
export async function completedBatch(code = 'KH-W30-90'): Promise<{ batchId: number; batchNumber: string; revisionId: number }> {
  const tech = await demoUser('technician');
  const revisionId = await approvedRevisionId(code);
  const { id, batchNumber } = await createBatch(tech, createBatchSchema.parse({
    revisionId, sizing: { kind: 'mass', batchMassG: 10 }, loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
    additives: [], balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-Q1' }, plantLimitMin: 120
  }));
  for (const line of (await getBatch(id))!.lines) {
    const lotNumber = line.materialId ? await currentLot(line.materialId) : 'BS-LX11-2611';
    await recordLine(tech, id, line.seq, { actualG: line.targetG, lotNumber, version: line.version });
  }
  await markMixed(tech, id, { version: (await getBatch(id))!.batch.version });
  await completeBatch(tech, id, (await getBatch(id))!.batch.version);
  return { batchId: id, batchNumber, revisionId };
}

/**
 * CSV of `n` parts (380–780 nm, 1 nm; one column per part) from the revision's optical fractions,
 * the last phosphor scaled by `lastPhosphorScale` (the line's known bias), each phosphor scattered by
 * up to ±`scatter` (deterministic).
 */
export async function partsCsv(revisionId: number, n: number, prefix: string, lastPhosphorScale = 1, scatter = 0.01): Promise<string> {
  const rev = (await getRevision(revisionId))!;
  const components = await loadBlendComponents(rev.content.pump.materialId, rev.content.phosphors.map((p) => p.materialId));
  const base = [rev.content.pumpLeakFraction, ...rev.content.phosphors.map((p) => p.opticalFraction)];
  const wavelengths = Array.from({ length: 401 }, (_, i) => 380 + i);
  const cols = Array.from({ length: n }, (_, k) => {
    const fractions = base.map((f, i) => {
      if (i === 0) return f;
      const wobble = 1 + scatter * Math.sin(1.7 * (k + 1) * i);
      return f * wobble * (i === base.length - 1 ? lastPhosphorScale : 1);
    });
    const spd = mix(components, { kind: 'optical', fractions }).spd;
    return wavelengths.map((w) => spd.values[w - spd.wavelengths[0]]);
  });
  const header = ['Wavelength (nm)', ...cols.map((_, k) => `${prefix}-${String(k + 1).padStart(3, '0')}`)].join(',');
  return [header, ...wavelengths.map((w, r) => [w, ...cols.map((c) => c[r].toPrecision(6))].join(','))].join('\n');
}

export const csvFile = (text: string, name = 'sphere-export.csv') => ({ name, contentType: 'text/csv', body: Buffer.from(text, 'utf8') });

export async function countRows(table: string, where: Record<string, unknown> = {}): Promise<number> {
  const [{ n }] = await db()(table).where(where).count({ n: '*' });
  return Number(n);
}
