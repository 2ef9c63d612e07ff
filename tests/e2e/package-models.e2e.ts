import { test, expect, type Browser, type Page } from '@playwright/test';
import { DEMO, signedInContext } from './support/accounts';

// Package models in the browser: a formulator pastes builds with a bad line (nothing saved, the
// line is named), corrects it and fits; the detail shows parameters, residuals and the plot;
// a technician reads the seeded demo model but has no fit form.
async function pageFor(browser: Browser, email: string): Promise<Page> {
  const api = await signedInContext(email);
  const context = await browser.newContext({ storageState: await api.storageState() });
  await api.dispose();
  return context.newPage();
}

// A header of the builds CSV; the bad line below is refused before any fit runs.
const HEADER = 'label,YG-555,RD-625,x,y,path_mm,w_per_pump_w';

test('a formulator fits a package model from pasted builds; a bad line is named and nothing is saved', async ({ browser }) => {
  const page = await pageFor(browser, DEMO.formulator);
  await page.goto('/library');
  await page.getByRole('link', { name: 'Package models' }).click();
  await expect(page.getByRole('heading', { name: 'Package models' })).toBeVisible();
  const before = await page.getByTestId('package-models').locator('tbody tr').count();
  const name = `E2E cavity ${Date.now()}`;
  await page.getByLabel('Model name').fill(name);
  await page.getByLabel('Package type').fill('test cavity');
  await page.getByLabel(/^Builds/).fill(`${HEADER}\nB1,8,2,0.36,0.35,0.25\nB2,twelve,3,0.41,0.39,0.25`);
  await page.getByRole('button', { name: 'Run the fit and save' }).click();
  await expect(page.getByRole('alert')).toContainText('line 3');
  await expect(page.getByRole('alert')).toContainText('Nothing was saved');
  await page.goto('/library/packages');
  await expect(page.getByTestId('package-models').locator('tbody tr')).toHaveCount(before);

  const probe = await page.request.get('/api/v1/package-models');
  const seeded = (await probe.json()).items.find((m: { name: string }) => m.name === 'KH mid-power 3030 warm');
  expect(seeded).toBeTruthy();
  const detail = await (await page.request.get(`/api/v1/package-models/${seeded.id}`)).json();
  // Refit the seeded model's own builds under a new name: the fit must land where the seed's did.
  const codes = detail.phosphors.map((p: { code: string }) => p.code);
  const rows = detail.builds.map(
    (b: { label: string; concentrationsWtPct: number[]; x: number; y: number; pathLengthMm: number; outputWPerPumpW: number }) =>
      [b.label, ...b.concentrationsWtPct, b.x, b.y, b.pathLengthMm, b.outputWPerPumpW].join(',')
  );
  await page.getByLabel('Model name').fill(name);
  await page.getByLabel('Package type').fill('test cavity');
  await page.getByLabel('IQE scale (needs measured output)').check();
  await page.getByLabel(/^Builds/).fill([`label,${codes.join(',')},x,y,path_mm,w_per_pump_w`, ...rows].join('\n'));
  await page.getByRole('button', { name: 'Run the fit and save' }).click();
  await expect(page.getByRole('heading', { name: new RegExp(name) })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId('fit-status')).toContainText('Fit converged');
  await expect(page.getByTestId('parameters')).toContainText('Pump escape');
  await expect(page.getByTestId('residuals').locator('tbody tr')).toHaveCount(detail.builds.length);
  await expect(page.getByTestId('fit-plot')).toBeVisible();
});

test('a technician reads the demo package model but gets no fit form', async ({ browser }) => {
  const page = await pageFor(browser, DEMO.technician);
  await page.goto('/library/packages');
  await page.getByRole('link', { name: 'KH mid-power 3030 warm' }).first().click();
  await expect(page.getByTestId('parameters')).toContainText('IQE scale');
  await page.goto('/library/packages');
  await expect(page.getByRole('button', { name: 'Run the fit and save' })).toHaveCount(0);
});
