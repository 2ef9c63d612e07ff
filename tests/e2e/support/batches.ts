/** A completed demo batch with a synthetic measurement file, made through the API as a technician would. */
import { expect, type APIRequestContext } from '@playwright/test';
import { signedInContext, testDb, DEMO } from './accounts';
import { fractionsWithLeak, parseRecipe } from '../../../src/lib/recipe';
import { loadRevisionComponents } from '../../../src/lib/server/formulations/components';
import { syntheticPartsCsv } from '../../../src/lib/measurements/syntheticParts';

export const json = (ctx: APIRequestContext, url: string, data: object) =>
  ctx.post(url, { data, headers: { 'content-type': 'application/json' } });

/** Weighs every line of a planned batch at its target (current lots), notes the mixing and completes it. */
export async function weighMixComplete(tech: APIRequestContext, knex: ReturnType<typeof testDb>, id: number): Promise<void> {
  const batch = await (await tech.get(`/api/v1/batches/${id}`)).json();
  for (const l of batch.lines) {
    const lot = l.materialId
      ? (await knex('material_lots').where({ material_id: l.materialId }).orderBy('id', 'desc').first('lot_number'))!.lot_number
      : 'BKF-LX11-2611';
    expect(
      (await json(tech, `/api/v1/batches/${id}/lines/${l.seq}`, { actualG: l.targetG, lotNumber: lot, version: l.version })).status()
    ).toBe(200);
  }
  let version = (await (await tech.get(`/api/v1/batches/${id}`)).json()).version;
  expect((await json(tech, `/api/v1/batches/${id}/mix`, { version })).status()).toBe(200);
  version = (await (await tech.get(`/api/v1/batches/${id}`)).json()).version;
  expect((await json(tech, `/api/v1/batches/${id}/complete`, { version })).status()).toBe(200);
}

/** A technician plans, weighs (every line at target, current lots), mixes and completes a 10 g batch of KH-W30-90. */
export async function completedBatch(): Promise<{ id: number; batchNumber: string; csv: string }> {
  const knex = testDb();
  try {
    const rev = await knex('formulation_revisions as r')
      .join('formulations as f', 'f.id', 'r.formulation_id')
      .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' })
      .first('r.id', 'r.content_json');
    const tech = await signedInContext(DEMO.technician);
    const created = await json(tech, '/api/v1/batches', {
      revisionId: rev.id,
      sizing: { kind: 'mass', batchMassG: 10 },
      loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
      additives: [],
      balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-E2E' },
      plantLimitMin: 120
    });
    expect(created.status()).toBe(201);
    const { id, batchNumber } = await created.json();
    await weighMixComplete(tech, knex, id);
    await tech.dispose();
    // Red 3 % high with a little scatter.
    return { id, batchNumber, csv: await revisionPartsCsv(knex, rev.id, batchNumber, 1.03) };
  } finally {
    await knex.destroy();
  }
}

/** A measurement file of 12 synthetic parts of a revision (invented), the last phosphor scaled, 1 % scatter. */
export async function revisionPartsCsv(
  knex: ReturnType<typeof testDb>,
  revisionId: number,
  batchNumber: string,
  lastPhosphorScale = 1
): Promise<string> {
  const rev = (await knex('formulation_revisions').where({ id: revisionId }).first('content_json'))!;
  const content = parseRecipe(rev.content_json);
  const { components } = await loadRevisionComponents(knex, content);
  const fractions = fractionsWithLeak(content);
  return syntheticPartsCsv(components, fractions, { parts: 12, prefix: `${batchNumber}-`, lastPhosphorScale, scatter: 0.01 });
}
