import { test, expect as baseExpect } from '@playwright/test';
import { DEMO, signInThroughForm } from './support/accounts';
import { pickOption } from './support/select';

const expect = baseExpect.configure({ timeout: 20_000 });

// Melanopic DER (CIE S 026/E:2018) in the designer: the readout shows the non-visual group, an
// impossible ceiling is refused with the best value reached, and a reachable one is met.
test('a formulator caps melanopic DER at 3000 K and asks for it as low as possible', async ({ page }) => {
  await signInThroughForm(page, DEMO.formulator);
  await page.goto('/designer');
  await pickOption(page, 'Pump', 'B-450');
  for (const code of ['GL-530', 'YL-568', 'OR-600', 'RD-650']) {
    await pickOption(page, 'Add a phosphor', code);
    await page.getByRole('button', { name: 'Add', exact: true }).click();
  }
  await page.getByLabel('CCT + Duv').check();
  await page.getByLabel('Nominal CCT (K)').fill('3000');
  await page.getByLabel('Duv', { exact: true }).fill('0');
  await page.getByLabel('Ra ≥').fill('80');
  await page.getByLabel('R9 ≥').fill('');
  await expect(page.getByTestId('non-visual')).toContainText('Non-visual (CIE S 026)');
  await expect(page.getByTestId('non-visual-mel-der')).toHaveText(/^\d\.\d{3}$/);
  await page.getByLabel('Search for').selectOption('minMelDer');

  // common practice: a blue-pumped warm white cannot get down to a melanopic DER of 0.1
  await page.getByLabel('Melanopic DER ≤').fill('0.1');
  await page.getByRole('button', { name: 'Find blends' }).click();
  await expect(page.getByTestId('solve-status')).toContainText('Floors not met');
  await expect(page.getByText(/Melanopic DER ≤ 0\.1 \(best 0\.\d{3}\)/)).toBeVisible();

  await page.getByLabel('Melanopic DER ≤').fill('0.6');
  await page.getByRole('button', { name: 'Find blends' }).click();
  await expect(page.getByTestId('solve-status')).toContainText('Blends found');
  await page
    .getByTestId('proposal')
    .first()
    .getByRole('button', { name: /Put on the desk/ })
    .click();
  await expect(page.getByTestId('floor-melDerMax')).toContainText('pass');
});
