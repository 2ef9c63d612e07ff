/**
 * From a chip bin's measured batch back to the revision: "fit the spread to this batch" keeps a fitted
 * variation model with the revision (the next forecast uses it), and a correction of that batch starts
 * from its bin's recipe. The matrix revision and its parts are invented (tests/e2e/support/chip-bins.ts);
 * 2.5 nm bins are common practice.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createBatch } from '../../../src/lib/server/batches/create';
import { getBatch } from '../../../src/lib/server/batches/read';
import { markMixed, recordLine } from '../../../src/lib/server/batches/weighing';
import { completeBatch } from '../../../src/lib/server/batches/complete';
import { createBatchSchema } from '../../../src/lib/batches/schema';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { fitSpreadToBatch, MIN_PARTS_FOR_FIT } from '../../../src/lib/server/measurements/fit-spread';
import { makeCorrectionDraft } from '../../../src/lib/server/measurements/correction';
import { getRevisionVariationModel, putRevisionVariationModel } from '../../../src/lib/server/yield-predictions/variation-model';
import { predictRevisionYield } from '../../../src/lib/server/yield-predictions/predict';
import { listYieldPredictions } from '../../../src/lib/server/yield-predictions/store';
import { getRevision } from '../../../src/lib/server/formulations/read';
import { batchResults } from '../../../src/lib/server/measurements/results';
import { DEFAULT_VARIATION_MODEL } from '../../../src/lib/blend/spread';
import { approvedMatrixRevision, type MatrixRevision } from '../../e2e/support/chip-bins';
import type { User } from '../../../src/lib/server/accounts/users';
import { csvFile, demoUser } from './support';

let m: MatrixRevision;
let quality: User;
let formulator: User;

async function chipBatch(binCode: string, parts: number, scatter = 0.08): Promise<{ id: number; batchNumber: string }> {
  const tech = await demoUser('technician');
  const made = await createBatch(
    tech,
    createBatchSchema.parse({
      revisionId: m.revisionId,
      sizing: { kind: 'mass', batchMassG: 10 },
      loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
      additives: [],
      balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-Q1' },
      plantLimitMin: 120,
      chipLot: { lotNumber: `KH-CHIP-FIT-${Math.random().toString(36).slice(2, 7)}`, binCode }
    })
  );
  for (const line of (await getBatch(made.id))!.lines) {
    const lot = line.materialId
      ? await db()('material_lots')
          .where({ material_id: line.materialId })
          .where((w) => w.whereNull('expires_on').orWhere('expires_on', '>', new Date()))
          .orderBy('id', 'desc')
          .first('lot_number')
      : null;
    await recordLine(tech, made.id, line.seq, {
      actualG: line.targetG,
      lotNumber: lot?.lot_number ?? 'BS-LX11-2611',
      version: line.version
    });
  }
  await markMixed(tech, made.id, { version: (await getBatch(made.id))!.batch.version });
  await completeBatch(tech, made.id, (await getBatch(made.id))!.batch.version);
  await uploadMeasurements(quality, made.id, csvFile(m.partsCsv(binCode, parts, `F${made.id}-`, scatter)));
  return made;
}

beforeAll(async () => {
  [m, quality, formulator] = await Promise.all([approvedMatrixRevision(), demoUser('quality'), demoUser('formulator')]);
});
afterAll(closeDb);

describe('the revision variation model', () => {
  it('starts at the defaults, with the chip wavelength drawn from the matrix bins', async () => {
    const kept = await getRevisionVariationModel(m.revisionId);
    expect(kept.source).toBe('default');
    expect(kept.version).toBe(0);
    expect(kept.model.slurryMassCvPct).toBe(DEFAULT_VARIATION_MODEL.slurryMassCvPct);
    expect(kept.model.pump.kind === 'bins' && kept.model.pump.bins.map((b) => b.code)).toEqual(m.bins.map((b) => b.code));
  });
});

describe('fit the spread to a chip bin batch', () => {
  let batch: { id: number; batchNumber: string };
  beforeAll(async () => {
    batch = await chipBatch('C2', 40);
  });

  it('refuses a batch with too few parts and changes nothing', async () => {
    const small = await chipBatch('C2', 5);
    await expect(fitSpreadToBatch(quality, small.id, 0)).rejects.toThrow(new RegExp(`at least ${MIN_PARTS_FOR_FIT}`));
    expect((await getRevisionVariationModel(m.revisionId)).version).toBe(0);
  });

  it('keeps the fitted model with the revision, names the batch, and the next forecast uses it', async () => {
    const fit = await fitSpreadToBatch(quality, batch.id, 0);
    expect(fit.parts).toBe(40);
    expect(fit.before.slurryMassCvPct).toBe(DEFAULT_VARIATION_MODEL.slurryMassCvPct);
    const kept = await getRevisionVariationModel(m.revisionId);
    expect(kept).toMatchObject({ source: 'fitted', version: 1, fittedBatch: { id: batch.id, batchNumber: batch.batchNumber } });
    expect(kept.model.slurryMassCvPct).toBe(fit.after.slurryMassCvPct);
    const audit = await db()('audit_events')
      .where('entity_type', 'formulation_revision')
      .where('entity_id', String(m.revisionId))
      .where('action', 'variation-model-fit');
    expect(audit).toHaveLength(1);
    // Each phosphor of the synthetic parts wobbles by up to ±8 % (σ ≈ 5.7 %, invented), more than the default
    // sources give (lot absorption CV 3 %, slurry mass CV 2 %): the fit must raise the slurry-mass CV to explain it.
    expect(fit.explained).toBe(true);
    expect(fit.after.slurryMassCvPct).toBeGreaterThan(fit.before.slurryMassCvPct);
    await predictRevisionYield(formulator, { revisionId: m.revisionId, model: null, parts: 1000, seed: 4 });
    expect((await listYieldPredictions(m.revisionId))[0].model.slurryMassCvPct).toBe(fit.after.slurryMassCvPct);
    // The batch's plot lays the forecast of its own chip bin under the parts: a quarter of the pooled
    // forecast (four bins of equal share), every point on the C2 recipe's side of the cloud.
    const plot = (await batchResults(batch.id))!.plot;
    expect(plot.forecast!.label).toBe('Forecast: 250 simulated parts of chip bin C2');
    expect(plot.forecast!.points).toHaveLength(250);
  });

  it('refuses a stale fit or edit (the version read has moved on)', async () => {
    await expect(fitSpreadToBatch(quality, batch.id, 0)).rejects.toThrow(/changed by someone else/);
    await expect(
      putRevisionVariationModel(formulator, m.revisionId, { model: { ...DEFAULT_VARIATION_MODEL, slurryMassCvPct: 9 }, version: 0 })
    ).rejects.toThrow(/Nothing was saved/);
    expect((await getRevisionVariationModel(m.revisionId)).version).toBe(1);
  });

  it("a correction of the batch starts from its bin's recipe and changes that bin only", async () => {
    const before = (await getRevision(m.revisionId))!.content;
    const out = await makeCorrectionDraft(quality, batch.id, 0.8, 'http://localhost');
    expect(out.binCode).toBe('C2');
    const draft = (await getRevision(out.revisionId))!.content;
    expect(draft.phosphors).toEqual(before.phosphors);
    const bins = (c: typeof draft) => (c.binRecipes ?? []).map((b) => b.phosphors.map((p) => p.wtPct));
    for (const k of [0, 2, 3]) expect(bins(draft)[k]).toEqual(bins(before)[k]);
    expect(bins(draft)[1]).not.toEqual(bins(before)[1]);
    expect(draft.notes).toContain('Chip bin C2');
  });
});
