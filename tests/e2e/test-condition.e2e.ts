import { test, expect } from '@playwright/test';
import { DEMO, signInThroughForm, testDb } from './support/accounts';
import { completedBatch } from './support/batches';

// Quality states the condition a file was measured at. The demo revision is aimed at the bench, so a
// file measured at Tj 85 °C (common practice for hot binning) has no prediction to be judged against:
// it is refused with the reason and nothing is saved; the bench file is judged and compared by condition.
test('a hot file for a bench revision is refused with the reason; a bench file is compared by condition', async ({ page }) => {
  const batch = await completedBatch();
  await signInThroughForm(page, DEMO.quality);
  await page.goto(`/measurements/${batch.id}`);
  const file = { name: 'sphere-export.csv', mimeType: 'text/csv', buffer: Buffer.from(batch.csv) };

  await page.getByLabel('Measurement file', { exact: true }).setInputFiles(file);
  await page.getByLabel('Temperature (°C; empty = bench 25 °C)').fill('85');
  await page.getByLabel('Drive current (mA)').fill('350');
  await page.getByRole('button', { name: 'Upload and measure' }).click();
  await expect(page.getByTestId('upload-error')).toContainText('it has no prediction at Tj 85 °C, 350 mA');
  const knex = testDb();
  try {
    expect((await knex('measurement_uploads').where({ batch_id: batch.id })).length).toBe(0);
  } finally {
    await knex.destroy();
  }

  await page.getByLabel('Measurement file', { exact: true }).setInputFiles(file);
  await page.getByLabel('Temperature (°C; empty = bench 25 °C)').fill('');
  await page.getByLabel('Drive current (mA)').fill('');
  await page.getByRole('button', { name: 'Upload and measure' }).click();
  await expect(page.getByTestId('upload-done')).toContainText('12 parts measured and saved');
  const checks = page.getByTestId('condition-checks');
  await expect(checks.locator('tbody tr')).toHaveCount(1);
  await expect(checks).toContainText('bench (25 °C)');
  await expect(page.getByText('12 parts at bench (25 °C)')).toBeVisible();
});
