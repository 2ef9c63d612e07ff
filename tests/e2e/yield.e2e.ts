import { test, expect } from '@playwright/test';
import { DEMO, signedInContext, testDb } from './support/accounts';

// The seeded path in the browser: a formulator opens a revision, forecasts its yield and sees the figures.
let target: { id: number; formulationId: number } | null = null;

test.beforeAll(async () => {
  const knex = testDb();
  try {
    const rows: { id: number; formulation_id: number; content_json: string }[] = await knex('formulation_revisions').select(
      'id',
      'formulation_id',
      'content_json'
    );
    const hit = rows.find((r) => {
      const c = JSON.parse(r.content_json) as { loading: unknown; phosphors: { wtPct: number | null }[] };
      return c.loading && c.phosphors.every((p) => (p.wtPct ?? 0) > 0);
    });
    target = hit ? { id: hit.id, formulationId: hit.formulation_id } : null;
  } finally {
    await knex.destroy();
  }
});

test('forecast the yield of a revision and see the figures', async ({ browser }) => {
  expect(target, 'the demo data holds a revision with wt % on the loading model').not.toBeNull();
  const api = await signedInContext(DEMO.formulator);
  const page = await (await browser.newContext({ storageState: await api.storageState() })).newPage();
  await api.dispose();
  await page.goto(`/formulations/${target!.formulationId}/revisions/${target!.id}`);
  await expect(page.getByRole('heading', { name: 'Production yield forecast' })).toBeVisible();
  await page.getByLabel('Parts').fill('2000');
  await page.getByLabel('Seed').fill('5');
  await page.getByRole('button', { name: 'Forecast yield' }).click();
  await expect(page.getByRole('status')).toContainText('Yield forecast computed');
  const table = page.getByTestId('yield-table');
  await expect(table).toContainText('Inside 3-step ellipse');
  await expect(table.locator('[data-steps="7"]')).toContainText('%');
  await expect(page.getByTestId('yield-breakdown')).toContainText('Dispensed slurry mass');
  await expect(page.getByText('2000 simulated parts, seed 5')).toBeVisible();
});
