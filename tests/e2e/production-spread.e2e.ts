import { test, expect as baseExpect } from '@playwright/test';
import { DEMO, DEMO_PASSWORD, signInThroughForm, signedInContext, testDb } from './support/accounts';
import { approvedContent } from './support/revisions';
import { json, weighMixComplete } from './support/batches';
import { binPartsCsv, resetPumpBins } from './support/chip-bins';

const expect = baseExpect.configure({ timeout: 20_000 });

// The road from chip bins to parts in their bin, in the browser, seeded: the formulator solves a recipe per
// chip bin, sets the variation model and forecasts the yield (the same seed gives the same figures);
// quality signs; the technician plans a batch for a chip lot and the bin is on the batch; quality uploads
// the parts, sees measured against forecast yield and fits the spread for the next forecast.
// Demo materials and bins (B-450, B3–B6 at 2.5 nm, common practice) are invented; so are the parts.
test('chip bins → recipe matrix → variation model → seeded forecast → signature → chip-lot batch → measured vs forecast → fit', async ({
  browser
}) => {
  test.setTimeout(120_000);
  const { content, pumpId } = await approvedContent();
  await resetPumpBins(pumpId);
  const name = `E2E production spread ${Date.now().toString(36)}`;
  const api = await signedInContext(DEMO.formulator);
  const created = await json(api, '/api/v1/formulations', { name, content: { ...content, binRecipes: [] } });
  expect(created.status(), await created.text()).toBe(201);
  const { formulationId, revisionId } = await created.json();
  await api.dispose();
  const revisionPath = `/formulations/${formulationId}/revisions/${revisionId}`;

  // Formulator: the pump's chip bins, the recipe per bin, the variation model, two seeded forecasts.
  const rhea = await browser.newPage();
  await signInThroughForm(rhea, DEMO.formulator);
  await rhea.goto(`/library/${pumpId}`);
  await expect(rhea.getByTestId('pump-bins')).toContainText('B4');
  await rhea.goto(revisionPath);
  await rhea.getByRole('button', { name: 'Solve a recipe per chip bin' }).click();
  await expect(rhea.getByTestId('recipe-matrix').locator('tbody tr')).toHaveCount(4);
  await expect(rhea.getByTestId('matrix-map').locator('circle[data-bin]')).toHaveCount(4);

  const model = rhea.getByTestId('variation-model');
  await expect(rhea.getByTestId('variation-source')).toContainText('Defaults');
  await model.getByLabel(/Dispensed slurry mass CV/).fill('80');
  await model.getByRole('button', { name: 'Keep this model' }).click();
  await expect(rhea.getByText('Slurry mass CV: at most 50')).toBeVisible();
  await expect(model.getByLabel(/Dispensed slurry mass CV/)).toHaveValue('80'); // kept on refusal
  await model.getByLabel(/Dispensed slurry mass CV/).fill('3');
  await model.getByRole('button', { name: 'Keep this model' }).click();
  await expect(rhea.getByRole('status')).toContainText('Variation model saved');
  await expect(rhea.getByTestId('variation-source')).toContainText('Set by hand');

  const forecast = async () => {
    await rhea.getByLabel('Parts').fill('4000');
    await rhea.getByLabel('Seed').fill('11');
    await rhea.getByRole('button', { name: 'Forecast yield' }).click();
    await expect(rhea.getByRole('status')).toContainText('Yield forecast computed');
    await expect(rhea.getByText('4000 simulated parts, seed 11')).toBeVisible();
    return (await rhea.getByTestId('yield-table').textContent())!.replace(/\s+/g, ' ');
  };
  const first = await forecast();
  expect(first).toContain('Inside the ANSI C78.377 quadrangle');
  await expect(rhea.getByText('slurry mass CV 3 %')).toBeVisible();
  expect(await forecast()).toBe(first);
  await rhea.getByRole('button', { name: 'Submit for review' }).click();
  await expect(rhea.getByRole('status')).toContainText('Submitted for review');

  // Quality signs: the signature covers every bin's recipe.
  const ines = await browser.newPage();
  await signInThroughForm(ines, DEMO.quality);
  await ines.goto(revisionPath);
  await ines.getByRole('radio', { name: /Approved/ }).check();
  await ines.getByLabel('Comment or reason').fill('Matrix and forecast reviewed.');
  await ines.getByRole('button', { name: 'Continue to signature' }).click();
  await ines.getByLabel('Your password').fill(DEMO_PASSWORD);
  await ines.getByRole('button', { name: 'Sign', exact: true }).click();
  await expect(ines.getByRole('status')).toContainText('Signed and approved');

  // Technician: a batch for a chip lot measured at 448.6 nm picks bin B4 (447.5–450 nm).
  const chipLot = `KH-CHIP-SPREAD-${Date.now().toString(36).toUpperCase()}`;
  const tomas = await browser.newPage();
  await signInThroughForm(tomas, DEMO.technician);
  await tomas.goto(`/batches/new?revision=${revisionId}`);
  await tomas.getByLabel('Chip lot number').fill(chipLot);
  await tomas.getByLabel(/measured peak wavelength/).fill('448.6');
  await expect(tomas.getByTestId('chosen-bin')).toContainText('B4');
  await tomas.getByRole('button', { name: 'Plan this batch' }).click();
  await tomas.waitForURL(/\/batches\/\d+$/);
  const batchId = Number(new URL(tomas.url()).pathname.split('/').at(-1));
  await expect(tomas.getByTestId('chip-lot')).toContainText(chipLot);
  await expect(tomas.getByTestId('chip-lot')).toContainText('B4');
  const batchNumber = (await tomas.getByTestId('batch-number').textContent())!.trim();
  const db = testDb();
  try {
    const tech = await signedInContext(DEMO.technician);
    await weighMixComplete(tech, db, batchId);
    await tech.dispose();
  } finally {
    await db.destroy();
  }

  // Quality: 30 parts built on B4 chips, spread wider than the model (±8 % per phosphor, invented).
  await ines.goto(`/measurements/${batchId}`);
  const csv = await binPartsCsv(revisionId, 'B4', 30, `${batchNumber}-`, 0.08);
  await ines
    .getByLabel('Measurement file', { exact: true })
    .setInputFiles({ name: 'b4.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
  await ines.getByRole('button', { name: 'Upload and measure' }).click();
  await expect(ines.getByTestId('upload-done')).toContainText('30 parts measured and saved');
  await expect(ines.getByTestId('prediction-source')).toContainText('chip bin B4');
  // The measured parts over the forecast cloud of their own chip bin (a quarter of 4,000 simulated parts, kept 1 in 2).
  await expect(ines.getByTestId('forecast-legend')).toContainText('simulated parts of chip bin B4');
  await expect(ines.locator('[data-shape="forecast"]')).toHaveAttribute('data-points', /^\d+$/);
  const check = ines.getByTestId('yield-check');
  await expect(check).toContainText('Measured inside the tolerance');
  await expect(check).toContainText('Forecast:');
  await expect(ines.getByTestId('model-source')).toContainText('set by hand');
  await check.getByRole('button', { name: 'Fit the spread to this batch' }).click();
  await expect(ines.getByTestId('fit-result')).toContainText(`Fitted to 30 parts of batch ${batchNumber}: slurry mass CV 3 % →`);
  await expect(ines.getByTestId('model-source')).toContainText(`fitted to batch ${batchNumber}`);

  // The revision now forecasts with the fitted model.
  await rhea.goto(revisionPath);
  await expect(rhea.getByTestId('variation-source')).toContainText(`Fitted to batch ${batchNumber}`);
  await Promise.all([rhea.close(), ines.close(), tomas.close()]);
});
