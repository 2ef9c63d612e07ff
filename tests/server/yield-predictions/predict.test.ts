import { afterAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { predictRevisionYield } from '../../../src/lib/server/yield-predictions/predict';
import { listYieldPredictions } from '../../../src/lib/server/yield-predictions/store';
import { loadingOf, parseRecipe } from '../../../src/lib/recipe';
import { demoUser } from '../library/support';

afterAll(async () => {
  await closeDb();
});

async function revisionWithLoading(): Promise<number | null> {
  const rows = await db()('formulation_revisions').select('id', 'content_json');
  const hit = rows.find((r) => {
    const c = parseRecipe(r.content_json);
    return c.loading !== null && loadingOf(c) !== null;
  });
  return hit?.id ?? null;
}

describe('predictRevisionYield', () => {
  it('predicts a seeded revision yield, stores it, and the same seed gives the same figures', async () => {
    const id = await revisionWithLoading();
    expect(id, 'the demo data holds a revision with wt % on the loading model').not.toBeNull();
    const user = await demoUser('formulator');
    const a = await predictRevisionYield(user, { revisionId: id!, model: null, parts: 2000, seed: 9 });
    const b = await predictRevisionYield(user, { revisionId: id!, model: null, parts: 2000, seed: 9 });
    expect(a.cloud.x).toHaveLength(2000);
    expect(b.figures).toEqual(a.figures);
    const stored = await listYieldPredictions(id!);
    expect(stored[0].id).toBe(b.id);
    expect(stored[0].parts).toBe(2000);
    expect((stored[0].figures as { inSteps: unknown[] }).inSteps).toHaveLength(5);
  });

  it('refuses an unknown revision', async () => {
    const user = await demoUser('formulator');
    await expect(predictRevisionYield(user, { revisionId: 99_999_999, model: null, parts: 100, seed: 1 })).rejects.toThrow(
      /revision not found/
    );
  });
});
