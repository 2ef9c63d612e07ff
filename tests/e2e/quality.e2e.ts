import { test, expect } from '@playwright/test';
import { DEMO, DEMO_PASSWORD, signInThroughForm, testDb } from './support/accounts';
import { completedBatch } from './support/batches';

test('quality uploads a multi-part file, sees the plot and releases the batch', async ({ page }) => {
  const batch = await completedBatch();

  await signInThroughForm(page, DEMO.quality);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Measurements' }).click();
  await page.getByTestId('awaiting').getByRole('link', { name: batch.batchNumber }).click();
  await page.waitForURL(new RegExp(`/measurements/${batch.id}$`));
  await expect(page.getByTestId('batch-state')).toHaveText('complete');
  // Before any upload the page says what to do next, not "0 of 0 parts pass".
  await expect(page.getByTestId('next-step')).toContainText('Next: upload the spectra');
  await expect(page.getByText('0 of 0')).toHaveCount(0);

  await page
    .getByLabel('Measurement file', { exact: true })
    .setInputFiles({ name: 'sphere-export.csv', mimeType: 'text/csv', buffer: Buffer.from(batch.csv) });
  await page.getByRole('button', { name: 'Upload and measure' }).click();
  await expect(page.getByTestId('upload-done')).toContainText('12 parts measured and saved');

  const plot = page.getByTestId('chromaticity-plot');
  await expect(plot.locator('circle[data-part]')).toHaveCount(12);
  await expect(plot.locator('[data-shape="bin"][data-bin="3000"]')).toHaveCount(1);
  await expect(plot.locator('[data-marker="mean"]')).toHaveCount(1);
  await expect(page.getByTestId('summary-table')).toContainText('CCT');
  await expect(page.getByTestId('parts-table').locator('tbody tr')).toHaveCount(12);
  await expect(page.getByTestId('prediction-offset')).toContainText('steps');
  // Zoom changes the axes: the first x tick label differs after zooming in.
  const firstTick = async () => plot.locator('text').first().textContent();
  const before = await firstTick();
  await page.getByRole('button', { name: 'Zoom in' }).click();
  await expect.poll(firstTick).not.toBe(before);

  // Measured yield with its Wilson interval, against the forecast (none made for this revision yet).
  await expect(page.getByTestId('yield-check')).toContainText(/Measured inside the tolerance: \d+ of \d+/);
  await expect(page.getByTestId('yield-check')).toContainText('95 % interval');
  await page.getByLabel('Release the batch').check();
  await page.getByLabel('Comment').fill('Colour inside the acceptance; released for assembly.');
  await page.getByLabel('Your password (re-enter to sign)').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign and release' }).click();
  await expect(page.getByTestId('disposition')).toContainText('Released');
  await expect(page.getByTestId('disposition')).toContainText('Ines Halloran');
  // The signed batch record opens from the link beside the signature.
  const record = page.getByRole('link', { name: 'Batch record with the measurement summary (PDF)' });
  const answer = await page.request.get((await record.getAttribute('href'))!);
  expect(answer.status()).toBe(200);
  expect(answer.headers()['content-type']).toContain('application/pdf');
  await expect(page.getByTestId('batch-state')).toHaveText('released');
  await expect(page.getByRole('link', { name: /Batch record with the measurement summary/ })).toBeVisible();
});

test('a wrong password signs nothing and says so', async ({ page }) => {
  const knex = testDb();
  let id: number;
  try {
    // The demo batch BT-261201-001 is seeded with measurements and waits for a decision.
    id = (await knex('batches').where({ batch_number: 'BT-261201-001' }).first('id'))!.id;
  } finally {
    await knex.destroy();
  }
  await signInThroughForm(page, DEMO.quality);
  await page.goto(`/measurements/${id}`);
  await page.getByLabel('Reject the batch').check();
  await page.getByLabel('Comment').fill('Trying with a wrong password.');
  await page.getByLabel('Your password (re-enter to sign)').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign and reject' }).click();
  await expect(page.getByTestId('disposition-error')).toContainText('password is not correct');
  await expect(page.getByTestId('batch-state')).toHaveText('complete');
});

test('a missing page says it is missing, not that something went wrong', async ({ page }) => {
  await signInThroughForm(page, DEMO.quality);
  const answer = await page.goto('/library/no-such-page/anywhere');
  expect(answer?.status()).toBe(404);
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('Nothing here');
  await expect(page.getByText('There is no page at this address.')).toBeVisible();
  await expect(page.getByText('Something went wrong on our side')).toHaveCount(0);
});
