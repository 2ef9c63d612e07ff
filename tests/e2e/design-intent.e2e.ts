import { test, expect as baseExpect } from '@playwright/test';
import { DEMO, signInThroughForm } from './support/accounts';
import { pickOption } from './support/select';

const expect = baseExpect.configure({ timeout: 20_000 });

// TM-30-20 Annex E design intents in the designer: the readout names the levels the blend meets, a
// level can be required in the aim, and the solver's proposals then meet it (P2: Rg ≥ 92 and
// −7 % ≤ Rcs,h1 ≤ +19 % as quoted by ASHRAE 189.1; Rf ≥ 75 from memory).
test('a formulator requires Preference P2 and the proposals meet it', async ({ page }) => {
  await signInThroughForm(page, DEMO.formulator);
  await page.goto('/designer');
  await pickOption(page, 'Pump', 'B-450');
  for (const code of ['GL-530', 'YL-568', 'RD-625', 'RD-650']) {
    await pickOption(page, 'Add a phosphor', code);
    await page.getByRole('button', { name: 'Add', exact: true }).click();
  }
  await page.getByLabel('CCT + Duv').check();
  await page.getByLabel('Nominal CCT (K)').fill('3000');
  await page.getByLabel('Duv', { exact: true }).fill('0');
  await page.getByLabel('Ra ≥').fill('');
  await page.getByLabel('R9 ≥').fill('');
  await page.getByLabel('TM-30 design intent (Annex E)').selectOption('P2');
  await expect(page.getByTestId('floor-intent')).toContainText('TM-30 design intent P2');

  await page.getByRole('button', { name: 'Find blends' }).click();
  await expect(page.getByTestId('solve-status')).toContainText('Blends found');
  await page
    .getByTestId('proposal')
    .first()
    .getByRole('button', { name: /Put on the desk/ })
    .click();
  await expect(page.getByTestId('floor-intent')).toContainText('pass');
  await expect(page.getByTestId('design-intents')).toContainText(/Annex E design intents met: P[12]/);
});
