import { test, expect } from '@playwright/test';
import { DEMO, signedInContext, signInThroughForm, testDb } from './support/accounts';
import { weighMixComplete } from './support/batches';
import { approvedMatrixRevision } from './support/chip-bins';

test("a batch for a revision with a recipe per chip bin weighs the lot's bin, prints it and is judged against its prediction", async ({
  browser
}) => {
  const m = await approvedMatrixRevision();
  const c3 = m.bins.find((b) => b.code === 'C3')!;
  const chipLot = `KH-CHIP-E2E-${Date.now().toString(36).toUpperCase()}`;

  const techPage = await browser.newPage();
  await signInThroughForm(techPage, DEMO.technician);
  await techPage.goto(`/batches/new?revision=${m.revisionId}`);
  await techPage.getByLabel('Chip lot number').fill(chipLot);
  // Outside every bin: the preview says why, before anything is sent.
  await techPage.getByLabel(/measured peak wavelength/).fill(String(c3.toNm + 20));
  await expect(techPage.getByText(/lies outside every bin of this pump/).first()).toBeVisible();
  await techPage.getByLabel(/measured peak wavelength/).fill(String(c3.fromNm + 1));
  await expect(techPage.getByTestId('chosen-bin')).toContainText(`C3 · ${c3.fromNm}–${c3.toNm} nm peak`);
  await techPage.getByRole('button', { name: 'Plan this batch' }).click();
  await techPage.waitForURL(/\/batches\/\d+$/);
  const id = Number(new URL(techPage.url()).pathname.split('/').at(-1));
  await expect(techPage.getByTestId('chip-lot')).toContainText(chipLot);
  await expect(techPage.getByTestId('chip-lot')).toContainText(`C3 · ${c3.fromNm}–${c3.toNm} nm peak`);
  await expect(techPage.getByTestId('chip-bin-predicted')).toContainText(`x ${c3.x.toFixed(4)}, y ${c3.y.toFixed(4)}`);
  await techPage.close();

  const knex = testDb();
  try {
    const tech = await signedInContext(DEMO.technician);
    await weighMixComplete(tech, knex, id);
    await tech.dispose();
  } finally {
    await knex.destroy();
  }

  const page = await browser.newPage();
  await signInThroughForm(page, DEMO.quality);
  await page.goto(`/measurements/${id}`);
  const csv = m.partsCsv('C3', 6, `${chipLot}-`);
  await page
    .getByLabel('Measurement file', { exact: true })
    .setInputFiles({ name: 'bins.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
  await page.getByRole('button', { name: 'Upload and measure' }).click();
  await expect(page.getByTestId('upload-done')).toContainText('6 parts measured and saved');
  await expect(page.getByTestId('prediction-source')).toContainText(`chip bin C3 (${c3.fromNm}–${c3.toNm} nm peak)`);
  await expect(page.getByTestId('prediction-table')).toContainText(c3.x.toFixed(4));
  await expect(page.getByTestId('parts-table').getByRole('columnheader', { name: 'Steps from prediction' })).toBeVisible();
  await expect(page.getByTestId('steps-from-prediction')).toHaveCount(6);
  await page.close();
});
