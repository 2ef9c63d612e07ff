import { test, expect as baseExpect } from '@playwright/test';
import { pickOption as pick } from './support/select';
import { DEMO, signInThroughForm } from './support/accounts';

const expect = baseExpect.configure({ timeout: 20_000 });

// "What a floor costs" in the designer: a formulator traces the LER front against Ra for a 3000 K aim
// with Ra ≥ 80, reads what a point of Ra costs, and puts the high-Ra end of the front on the desk.

test('the LER–Ra front at a 3000 K aim, and one click puts a point of it on the desk', async ({ page }) => {
  await signInThroughForm(page, DEMO.formulator);
  await page.goto('/designer');
  await expect(page.getByRole('heading', { name: 'Blend designer' })).toBeVisible();
  await pick(page, 'Pump', 'B-450');
  for (const code of ['GL-530', 'YL-568', 'RD-625']) {
    await pick(page, 'Add a phosphor', code);
    await page.getByRole('button', { name: 'Add', exact: true }).click();
  }
  await page.getByLabel('CCT + Duv').check();
  await page.getByLabel('Nominal CCT (K)').fill('3000');
  await page.getByLabel('Duv', { exact: true }).fill('0');
  await page.getByLabel('Ra ≥').fill('80');
  await expect(page.getByTestId('aim-resolved')).toContainText('3000 K');

  const panel = page.getByTestId('trade-off');
  await panel.getByLabel('Metric against LER').selectOption('ra');
  await panel.getByRole('button', { name: 'Trace the front' }).click();
  await expect(panel.getByTestId('trade-off-summary')).toContainText('lm/W per point of Ra');
  expect(await panel.getByTestId('front-point').count()).toBeGreaterThanOrEqual(5);

  // The last row is the highest Ra on the front; on the desk the readout shows it at the aim.
  await panel.getByText('The front as a table').click();
  const rows = panel.locator('tbody tr');
  const best = Number(await rows.last().locator('td').first().textContent());
  await rows.last().getByRole('button', { name: 'Put on the desk' }).click();
  await expect(page.getByTestId('m-cct')).toHaveText('3000 K');
  // The desk shows the mix on the optical superposition, as the front was traced (src/lib/blend/solver/tradeOff.ts).
  await expect.poll(async () => Number((await page.getByTestId('m-ra').textContent())?.replace(/[^\d.]/g, ''))).toBeGreaterThan(best - 1);
});
