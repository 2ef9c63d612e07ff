import { test, expect } from '@playwright/test';
import { DEMO, signInThroughForm, signedInContext, testDb } from './support/accounts';
import { json } from './support/batches';

// A revision whose prediction misses its aim shows the miss, and is submitted only with a reason,
// which the revision page then shows.
test('submitting outside the aim shows the miss and takes a reason onto the record', async ({ page }) => {
  const knex = testDb();
  let content: Record<string, unknown>;
  try {
    const approved = await knex('formulation_revisions as r')
      .join('formulations as f', 'f.id', 'r.formulation_id')
      .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' })
      .first('r.content_json');
    content = { ...JSON.parse(approved.content_json), target: { kind: 'cctDuv', cct: 5000, duv: 0 } };
  } finally {
    await knex.destroy();
  }
  const api = await signedInContext(DEMO.formulator);
  const created = await json(api, '/api/v1/formulations', { name: 'E2E off-aim trial', content });
  expect(created.status(), await created.text()).toBe(201);
  const { formulationId, revisionId } = await created.json();
  await api.dispose();

  await signInThroughForm(page, DEMO.formulator);
  await page.goto(`/formulations/${formulationId}/revisions/${revisionId}`);
  await expect(page.getByTestId('aim-miss')).toContainText(/steps .* from the target 5000 K/);
  const reason = 'Comparison build for the 5000 K line: same recipe, new aim';
  await page.getByLabel(/Why submit it anyway/).fill(reason);
  await page.getByRole('button', { name: 'Submit outside the aim' }).click();
  await expect(page.getByRole('status')).toContainText('Submitted for review');
  await expect(page.getByTestId('off-aim-reason')).toContainText(reason);
});
