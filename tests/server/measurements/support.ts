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
import { createBatchSchema } from '../../../src/lib/batches/schema';
import { loadBlendComponents } from '../../../src/lib/server/library/components';
import { fractionsWithLeak, materialIdsOf } from '../../../src/lib/recipe';
import { getRevision } from '../../../src/lib/server/formulations/read';
import { syntheticPartsCsv } from '../../../src/lib/measurements/syntheticParts';
import { demoUser } from '../batches/support';

export { DEMO_PASSWORD, demoUser } from '../batches/support';

export async function approvedRevisionId(code = 'KH-W30-90'): Promise<number> {
  const row = await db()('formulation_revisions as r')
    .join('formulations as f', 'f.id', 'r.formulation_id')
    .where({ 'f.code': code, 'r.state': 'approved' })
    .first('r.id');
  if (!row) throw new Error(`no approved revision of ${code}: run the tests in a seeded sandbox`);
  return row.id;
}

async function currentLot(materialId: number): Promise<string> {
  const lot = await db()('material_lots')
    .where({ material_id: materialId })
    .where((w) => w.whereNull('expires_on').orWhere('expires_on', '>', new Date()))
    .orderBy('id', 'desc')
    .first('lot_number');
  if (!lot) throw new Error(`material ${materialId} has no current lot`);
  return lot.lot_number;
}

/** A batch of the revision weighed out exactly to target by technician Tomas, mixed and completed. */
export async function completedBatch(code = 'KH-W30-90'): Promise<{ batchId: number; batchNumber: string; revisionId: number }> {
  const tech = await demoUser('technician');
  const revisionId = await approvedRevisionId(code);
  const { id, batchNumber } = await createBatch(
    tech,
    createBatchSchema.parse({
      revisionId,
      sizing: { kind: 'mass', batchMassG: 10 },
      loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
      additives: [],
      balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-Q1' },
      plantLimitMin: 120
    })
  );
  for (const line of (await getBatch(id))!.lines) {
    const lotNumber = line.materialId ? await currentLot(line.materialId) : 'BS-LX11-2611';
    await recordLine(tech, id, line.seq, { actualG: line.targetG, lotNumber, version: line.version });
  }
  await markMixed(tech, id, { version: (await getBatch(id))!.batch.version });
  await completeBatch(tech, id, (await getBatch(id))!.batch.version);
  return { batchId: id, batchNumber, revisionId };
}

/** CSV of `n` synthetic parts of the revision (see src/lib/measurements/syntheticParts.ts), labelled `${prefix}-001`… */
export async function partsCsv(revisionId: number, n: number, prefix: string, lastPhosphorScale = 1, scatter = 0.01): Promise<string> {
  const rev = (await getRevision(revisionId))!;
  const ids = materialIdsOf(rev.content);
  const components = await loadBlendComponents(ids.pump, ids.phosphors);
  const fractions = fractionsWithLeak(rev.content);
  return syntheticPartsCsv(components, fractions, { parts: n, prefix: `${prefix}-`, lastPhosphorScale, scatter });
}

export const csvFile = (text: string, name = 'sphere-export.csv') => ({ name, contentType: 'text/csv', body: Buffer.from(text, 'utf8') });

export async function countRows(table: string, where: Record<string, unknown> = {}): Promise<number> {
  const [{ n }] = await db()(table).where(where).count({ n: '*' });
  return Number(n);
}
