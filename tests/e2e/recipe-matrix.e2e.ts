import { test, expect } from '@playwright/test';
import { DEMO, signInThroughForm, signedInContext } from './support/accounts';
import { approvedContent } from './support/revisions';
import { json } from './support/batches';

// A formulator sees the pump's chip bins in the library, then solves a recipe per chip bin on a
// draft and sees one row per bin with its predicted point.
test('chip bins on the pump, then a recipe per bin on a draft revision', async ({ page }) => {
  const { content, pumpId } = await approvedContent();
  const api = await signedInContext(DEMO.formulator);
  const created = await json(api, '/api/v1/formulations', { name: 'E2E chip-bin matrix', content: { ...content, binRecipes: [] } });
  expect(created.status(), await created.text()).toBe(201);
  const { formulationId, revisionId } = await created.json();
  await api.dispose();

  await signInThroughForm(page, DEMO.formulator);
  await page.goto(`/library/${pumpId}`);
  await expect(page.getByTestId('pump-bins')).toContainText('Stated on the peak wavelength');
  const bins = (await page.getByTestId('pump-bins').locator('tbody tr').count()) as number;
  expect(bins).toBeGreaterThan(1);

  await page.goto(`/formulations/${formulationId}/revisions/${revisionId}`);
  await page.getByRole('button', { name: 'Solve a recipe per chip bin' }).click();
  const matrix = page.getByTestId('recipe-matrix');
  await expect(matrix.locator('tbody tr')).toHaveCount(bins);
  await expect(matrix.locator('tbody tr').first().locator('td').last()).toHaveText(/^0\.[0-4]\d$/);
  // The revision record prints the matrix with the signatures that will approve it.
  const record = await page.request.get(`/formulations/${formulationId}/revisions/${revisionId}/record`);
  expect(record.status()).toBe(200);
  expect(record.headers()['content-type']).toBe('application/pdf');
});
