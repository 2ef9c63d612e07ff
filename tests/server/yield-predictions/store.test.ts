import { afterAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { listYieldPredictions, storeYieldPrediction } from '../../../src/lib/server/yield-predictions/store';
import { DEFAULT_VARIATION_MODEL } from '../../../src/lib/blend/spread';
import { demoUser } from '../library/support';

afterAll(async () => {
  await closeDb();
});

describe('yield predictions kept with a revision', () => {
  it('stores the model, seed, N and figures with an audit event, and lists them newest first', async () => {
    const revision = await db()('formulation_revisions').first('id');
    expect(revision).toBeDefined();
    const user = await demoUser('formulator');
    const before = await db()('audit_events').where({ entity_type: 'yield-prediction' }).count({ n: '*' }).first();
    const id1 = await storeYieldPrediction(user, {
      revisionId: revision!.id,
      model: DEFAULT_VARIATION_MODEL,
      seed: 1,
      parts: 10_000,
      figures: { meanSteps: 2.5 },
      source: 'predicted'
    });
    const id2 = await storeYieldPrediction(user, {
      revisionId: revision!.id,
      model: { ...DEFAULT_VARIATION_MODEL, slurryMassCvPct: 3.2 },
      seed: 2,
      parts: 5000,
      figures: { meanSteps: 3.1 },
      source: 'fitted'
    });
    const list = await listYieldPredictions(revision!.id);
    expect(list.slice(0, 2).map((p) => p.id)).toEqual([id2, id1]);
    expect(list[0].model.slurryMassCvPct).toBe(3.2);
    expect(list[0].source).toBe('fitted');
    expect(list[1].figures).toEqual({ meanSteps: 2.5 });
    const after = await db()('audit_events').where({ entity_type: 'yield-prediction' }).count({ n: '*' }).first();
    expect(Number(after!.n) - Number(before!.n)).toBe(2);
  });

  it('refuses a revision that does not exist and saves nothing', async () => {
    const user = await demoUser('formulator');
    const n0 = await db()('yield_predictions').count({ n: '*' }).first();
    await expect(
      storeYieldPrediction(user, {
        revisionId: 99_999_999,
        model: DEFAULT_VARIATION_MODEL,
        seed: 1,
        parts: 100,
        figures: {},
        source: 'predicted'
      })
    ).rejects.toThrow(/revision not found/);
    const n1 = await db()('yield_predictions').count({ n: '*' }).first();
    expect(n1!.n).toEqual(n0!.n);
  });
});
