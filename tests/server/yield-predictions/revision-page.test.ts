import { afterAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { actions, load } from '../../../src/routes/(app)/formulations/[id]/revisions/[revisionId]/+page.server';
import { loadingOf, parseRecipe } from '../../../src/lib/recipe';
import { demoUser } from '../library/support';
import type { User } from '../../../src/lib/server/accounts/users';

afterAll(async () => {
  await closeDb();
});

async function revision(): Promise<{ id: number; formulation_id: number }> {
  const rows = await db()('formulation_revisions').select('id', 'formulation_id', 'content_json');
  const hit = rows.find((r) => {
    const c = parseRecipe(r.content_json);
    return c.loading !== null && loadingOf(c) !== null;
  });
  return hit!;
}

function event(user: User, rev: { id: number; formulation_id: number }, form: Record<string, string>) {
  const body = new FormData();
  for (const [k, v] of Object.entries(form)) body.set(k, v);
  const request = new Request('http://local/formulations', { method: 'POST', body });
  return { locals: { user } as App.Locals, params: { id: String(rev.formulation_id), revisionId: String(rev.id) }, request } as never;
}

describe('the revision page forecasts yield', () => {
  it('computes, keeps and shows the forecast', async () => {
    const rev = await revision();
    const user = await demoUser('formulator');
    const out = await actions.predictYield(event(user, rev, { parts: '1000', seed: '3' }));
    expect(out).toMatchObject({ action: 'predictYield' });
    const page = (await load(event(user, rev, {}))) as { latestYield: { parts: number; seed: number } | null; canPredictYield: boolean };
    expect(page.latestYield).toMatchObject({ parts: 1000, seed: 3 });
    expect(page.canPredictYield).toBe(true);
  });

  it('refuses more than 100,000 parts and saves nothing', async () => {
    const rev = await revision();
    const user = await demoUser('formulator');
    const n0 = await db()('yield_predictions').count({ n: '*' }).first();
    const out = (await actions.predictYield(event(user, rev, { parts: '200000', seed: '3' }))) as {
      status: number;
      data: { error: string };
    };
    expect(out.status).toBe(400);
    expect(out.data.error).toMatch(/at most 100000 parts/);
    const n1 = await db()('yield_predictions').count({ n: '*' }).first();
    expect(n1!.n).toEqual(n0!.n);
  });
});
