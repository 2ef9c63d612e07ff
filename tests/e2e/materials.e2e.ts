import { test, expect, request, type Browser, type Page } from '@playwright/test';
import { DEMO, signedInContext, BASE, testDb } from './support/accounts';
import { tokenFor } from './support/tokens';

// The material library in the browser: a formulator creates a phosphor, uploads its spectrum
// (a bad file first: nothing saved, the line is named), sees the preview and saves;
// a technician reads but cannot edit; a stale edit is refused with a clear message.
const CODE = 'E2E-OR600';
const fixture = (name: string) => `tests/fixtures/spectra/${name}`;

async function removeE2eMaterials() {
  const knex = testDb();
  try {
    const ids = (await knex('materials').where('code', 'like', 'E2E-%').select('id')).map((r) => r.id);
    if (ids.length) {
      await knex('materials').whereIn('id', ids).update({ emission_spectrum_id: null, excitation_spectrum_id: null });
      await knex('material_spectra').whereIn('material_id', ids).delete();
      await knex('materials').whereIn('id', ids).delete();
      await knex('stored_files').where({ entity_type: 'material' }).whereIn('entity_id', ids.map(String)).delete();
    }
  } finally {
    await knex.destroy();
  }
}

/** A browser page already signed in (session from the sign-in endpoint; the form itself is covered by sign-in.e2e.ts). */
async function pageFor(browser: Browser, email: string): Promise<Page> {
  const api = await signedInContext(email);
  const context = await browser.newContext({ storageState: await api.storageState() });
  await api.dispose();
  return context.newPage();
}

test.beforeAll(removeE2eMaterials);
test.afterAll(removeE2eMaterials);

test('a formulator creates a phosphor, sees a bad file refused, previews a good file and saves it', async ({ browser }) => {
  const page = await pageFor(browser, DEMO.formulator);
  await page.goto('/');
  await page.getByRole('link', { name: 'Library' }).first().click();
  await expect(page.getByRole('heading', { name: 'Material library' })).toBeVisible();
  await expect(page.getByRole('link', { name: 'YL-568' })).toBeVisible();
  await page.getByRole('link', { name: 'New phosphor' }).click();
  await page.getByLabel('Code').fill(CODE);
  await page.getByLabel('Name').fill(`${CODE} test nitride orange`);
  await page.getByLabel('IQE').fill('0,86');
  await page.getByRole('button', { name: 'Create phosphor' }).click();
  await expect(page).toHaveURL(/\/library\/\d+\/spectrum\?created=1/);
  const materialId = Number(new URL(page.url()).pathname.split('/')[2]);

  await page.getByLabel('File').setInputFiles(fixture('orange-band-bad-line13.csv'));
  await expect(page.getByTestId('upload-error')).toContainText('Line 13');
  await expect(page.getByTestId('upload-error')).toContainText('"abc" is not a number');
  await expect(page.getByTestId('preview')).toHaveCount(0);

  await page.getByLabel('File').setInputFiles(fixture('orange-band-semicolon.csv'));
  const preview = page.getByTestId('preview');
  await expect(preview).toBeVisible();
  await expect(preview.locator('path[data-series^="New emission"]')).toHaveCount(1);
  await expect(preview.locator('[data-marker="fwhm"]')).toHaveCount(1);
  await expect(preview.getByTestId('spectrum-metrics')).toContainText('600.0 nm'); // peak of the fixture band (README)

  const knex = testDb();
  try {
    expect((await knex('material_spectra').where({ material_id: materialId })).length).toBe(0); // preview saved nothing
  } finally {
    await knex.destroy();
  }
  await page.getByRole('button', { name: 'Save spectrum' }).click();
  await expect(page).toHaveURL(new RegExp(`/library/${materialId}\\?uploaded=emission`));
  await expect(page.getByText('New emission spectrum saved.')).toBeVisible();
  await expect(page.getByText('600.0 nm / 83.')).toBeVisible(); // FWHM ≈ 83.3 nm, hand-worked in the fixture README
  await expect(page.getByTestId('history')).toContainText('Emission spectrum uploaded');
  await expect(page.getByRole('link', { name: 'orange-band-semicolon.csv' }).first()).toBeVisible();
});

test('a technician reads the library but cannot edit', async ({ browser }) => {
  const page = await pageFor(browser, DEMO.technician);
  await page.goto('/library');
  await expect(page.getByRole('link', { name: 'New phosphor' })).toHaveCount(0);
  await page.getByRole('link', { name: 'YL-568' }).click();
  await expect(page.getByRole('heading', { name: 'YL-568 garnet yellow' })).toBeVisible();
  await expect(page.getByText('Handling caution')).toBeVisible();
  await expect(page.getByTestId('editor-actions')).toHaveCount(0);
  const path = new URL(page.url()).pathname;
  const edit = await page.goto(`${path}/edit`);
  expect(edit?.status()).toBe(403);
  const ctx = await signedInContext(DEMO.technician);
  const res = await ctx.post(`${path}?/archive`, { headers: { Origin: BASE }, form: { version: '1' }, maxRedirects: 0 });
  expect(res.status()).toBe(403);
  await ctx.dispose();
});

test('a stale edit is refused with a clear message and overwrites nothing', async ({ browser }) => {
  const knex = testDb();
  const [id] = await knex('materials').insert({ kind: 'phosphor', code: 'E2E-LOCK', name: 'E2E-LOCK probe', iqe: 0.9, cost_per_kg: 100 });
  await knex.destroy();
  const first = await pageFor(browser, DEMO.formulator);
  const second = await pageFor(browser, DEMO.admin);
  await first.goto(`/library/${id}/edit`);
  await second.goto(`/library/${id}/edit`);
  await first.getByLabel('Cost per kg').fill('120');
  await first.getByRole('button', { name: 'Save changes' }).click();
  await expect(first.getByText('Changes saved.')).toBeVisible();
  await second.getByLabel('Cost per kg').fill('999');
  await second.getByRole('button', { name: 'Save changes' }).click();
  await expect(second.getByTestId('form-error')).toContainText('changed by someone else');
  await expect(second.getByLabel('Cost per kg')).toHaveValue('999'); // the user's input is kept
  await second.goto(`/library/${id}`);
  await expect(second.getByText('Cost per kg')).toBeVisible();
  await expect(second.locator('dd', { hasText: '120.00' })).toBeVisible();
});

test('an API token reads the library and a stale PUT answers 409', async () => {
  const session = await signedInContext(DEMO.formulator);
  const token = await tokenFor(session, 'library e2e');
  await session.dispose();
  const api = await request.newContext({ baseURL: BASE, extraHTTPHeaders: { Authorization: `Bearer ${token}` } });
  const list = await api.get('/api/v1/phosphors?q=YL-568');
  expect(list.status()).toBe(200);
  const [yl] = (await list.json()).items;
  expect(yl).toMatchObject({ code: 'YL-568', kind: 'phosphor' });
  const stale = await api.put(`/api/v1/phosphors/${yl.id}`, { data: { version: yl.version + 5, notes: 'stale' } });
  expect(stale.status()).toBe(409);
  expect((await stale.json()).error).toMatch(/changed by someone else/);
  await api.dispose();
});
