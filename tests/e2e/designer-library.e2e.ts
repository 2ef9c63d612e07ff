import { test, expect } from '@playwright/test';
import { DEMO, signInThroughForm, testDb } from './support/accounts';

// A phosphor entered in the library without its emission spectrum yet is shown in the designer as
// "no spectrum yet" and cannot be added, so the readout never blanks.
test('a phosphor without a spectrum is offered as "no spectrum yet" and cannot be added', async ({ page }) => {
  const code = `NS-${Date.now().toString(36).toUpperCase()}`;
  const knex = testDb();
  try {
    await knex('materials').insert({ kind: 'phosphor', code, name: `${code} pending powder`, iqe: 0.9, hazards: '' });
  } finally {
    await knex.destroy();
  }
  await signInThroughForm(page, DEMO.formulator);
  await page.goto('/designer');
  const option = page.getByLabel('Add a phosphor').locator('option', { hasText: code });
  await expect(option).toHaveText(`${code} — ${code} pending powder — no spectrum yet`);
  await expect(option).toBeDisabled();
  await expect(page.getByTestId('m-cct')).toHaveText(/\d+ K|—/);
  // Leave the shared library as it was for the other browser tests.
  const after = testDb();
  try {
    await after('materials').where({ code }).update({ archived_at: new Date() });
  } finally {
    await after.destroy();
  }
});
