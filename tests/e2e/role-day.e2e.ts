import { test, expect as baseExpect, type Browser, type Page } from '@playwright/test';
import { DEMO, DEMO_PASSWORD, signInThroughForm, testDb } from './support/accounts';
import { revisionPartsCsv } from './support/batches';
import { watchConsole, type ConsoleWatch } from './support/console';
import { addPhosphor, choosePump } from './support/designer';
import type { Role } from '../../src/lib/roles';

// A loaded 2-core machine can take a few seconds for a page load or a search.
const expect = baseExpect.configure({ timeout: 20_000 });

// One working day through the browser, role by role, with every page watched for console errors and
// uncaught page errors: the formulator designs a blend and files and submits it; quality approves it with
// an e-signature; the technician plans a batch, weighs every line with the seeded lots and completes it;
// quality uploads the measurement file and releases the batch.
test.use({ viewport: { width: 1440, height: 900 } });

const code = `DAY-${Date.now().toString(36).toUpperCase()}`;

/** A fresh browser context signed in through the form as this role, watched from its first page. */
async function startDay(browser: Browser, role: Role): Promise<{ page: Page; watch: ConsoleWatch }> {
  const context = await browser.newContext();
  const watch = watchConsole(context);
  const page = await context.newPage();
  await signInThroughForm(page, DEMO[role]);
  await expect(page.getByTestId('work-queues')).toBeVisible();
  return { page, watch };
}

/** The newest registered lot of each demo material, by code (seeds/02_lots or the library). */
async function newestLots(): Promise<Map<string, string>> {
  const knex = testDb();
  try {
    const rows = await knex('material_lots as l')
      .join('materials as m', 'm.id', 'l.material_id')
      .orderBy('l.id', 'asc')
      .select('m.code', 'l.lot_number');
    return new Map(rows.map((r: { code: string; lot_number: string }) => [r.code, r.lot_number]));
  } finally {
    await knex.destroy();
  }
}

test('each role works through a day in the browser without a console error', async ({ browser }) => {
  test.setTimeout(240_000);

  // Formulator: designs a 3000 K, Ra ≥ 90 blend in the designer, files it as a draft and submits it.
  const rhea = await startDay(browser, 'formulator');
  await rhea.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Designer' }).click();
  await expect(rhea.page.getByRole('heading', { name: 'Blend designer' })).toBeVisible();
  await choosePump(rhea.page, 'B-450');
  for (const c of ['GL-530', 'YL-568', 'RD-625']) await addPhosphor(rhea.page, c);
  await expect(rhea.page.getByTestId('m-cct')).toBeVisible();
  await rhea.page.getByLabel('CCT + Duv').check();
  await rhea.page.getByLabel('Nominal CCT (K)').fill('3000');
  await rhea.page.getByLabel('Duv', { exact: true }).fill('0');
  await rhea.page.getByLabel('Ra ≥').fill('90');
  await rhea.page.getByRole('button', { name: 'Find blends' }).click();
  await expect(rhea.page.getByTestId('solve-status')).toContainText('Blends found');
  await rhea.page
    .getByTestId('proposal')
    .first()
    .getByRole('button', { name: /Put on the desk/ })
    .click();
  // The solver places each proposal on the target (3000 K, Duv 0).
  await expect(rhea.page.getByTestId('m-cct')).toHaveText('3000 K');
  await rhea.page.getByRole('tab', { name: 'Hue vectors (TM-30)' }).click();
  await expect(rhea.page.getByTestId('vector-rose')).toBeVisible();
  await rhea.page.getByLabel('Name').fill(`Day walk warm white (${code})`);
  await rhea.page.getByLabel(/^Code/).fill(code);
  await rhea.page.getByLabel('Silicone system').selectOption({ index: 0 });
  await rhea.page.getByRole('button', { name: 'File draft' }).click();
  await expect(rhea.page.getByTestId('filed')).toContainText(`Filed as ${code} revision 1 (draft)`);
  await rhea.page.getByTestId('filed').getByRole('link', { name: 'Open the revision' }).click();
  await expect(rhea.page.getByRole('heading', { name: `${code} · revision 1` })).toBeVisible();
  const revisionPath = new URL(rhea.page.url()).pathname;
  const revisionId = Number(revisionPath.split('/').pop());
  await rhea.page.getByRole('button', { name: 'Submit for review' }).click();
  await expect(rhea.page.getByRole('status')).toContainText('Submitted for review');
  rhea.watch.expectClean('for the formulator');

  // Quality: sees revisions waiting on the home page's queue (it lists the oldest few, so after other
  // suites the new one may be further down), opens the submitted revision and approves it with an e-signature.
  const ines = await startDay(browser, 'quality');
  await expect(ines.page.getByTestId('work-queues')).toBeVisible();
  await ines.page.goto(revisionPath);
  await expect(ines.page.getByRole('heading', { name: `${code} · revision 1` })).toBeVisible();
  await ines.page.getByRole('radio', { name: /Approved/ }).check();
  await ines.page.getByLabel('Comment or reason').fill('Predicted point and floors as aimed; approved for a first batch.');
  await ines.page.getByRole('button', { name: 'Continue to signature' }).click();
  await ines.page.getByLabel('Your password').fill(DEMO_PASSWORD);
  await ines.page.getByRole('button', { name: 'Sign', exact: true }).click();
  await expect(ines.page.getByRole('status')).toContainText('Signed and approved');
  ines.watch.expectClean('for quality signing the revision');

  // Technician: plans a 20 g batch of the new revision, weighs every line at target with registered lots, completes it.
  const lots = await newestLots();
  const tomas = await startDay(browser, 'technician');
  await tomas.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Weigh-out' }).click();
  await tomas.page.getByRole('link', { name: 'Plan a batch' }).click();
  const revision = tomas.page.getByLabel('Approved revision');
  await revision.selectOption((await revision.locator('option', { hasText: code }).getAttribute('value'))!);
  await tomas.page.waitForURL(/revision=/);
  await tomas.page.getByLabel('Batch size (g)').fill('20');
  await expect(tomas.page.getByTestId('plan-preview')).toBeVisible();
  await tomas.page.getByRole('button', { name: 'Plan this batch' }).click();
  await tomas.page.waitForURL(/\/batches\/\d+$/);
  const batchId = Number(new URL(tomas.page.url()).pathname.split('/').pop());
  const batchNumber = (await tomas.page.getByTestId('batch-number').textContent())!.trim();
  await expect(tomas.page.getByTestId('batch-state')).toHaveText('Planned');
  const cards = tomas.page.locator('article[data-testid^="line-"]');
  const count = await cards.count();
  // Part A, the three phosphors and part B (the designer's blend in a two-part silicone).
  expect(count).toBe(5);
  for (let seq = 1; seq <= count; seq++) {
    const card = tomas.page.getByTestId(`line-${seq}`);
    const lineCode = (await card.getByRole('heading').textContent())!.trim().split(' ')[0];
    const target = (await card.getByTestId(`target-${seq}`).textContent())!.replace(' g', '').trim();
    // Phosphor lots must be registered (seeded); silicone part lots are typed as printed on the drum.
    await card.getByLabel(/Lot/).fill(lots.get(lineCode) ?? `BKF-DAY${seq}-2612`);
    await card.getByLabel('Balance reading (g)').fill(target);
    await expect(card.getByTestId(`live-${seq}`)).toContainText('in range');
    await card.getByRole('button', { name: 'Record' }).click();
    await expect(card.getByTestId(`status-${seq}`)).toHaveText('in range');
  }
  await tomas.page.getByRole('button', { name: 'Part B mixed in' }).click();
  await expect(tomas.page.getByTestId('slurry-status')).toContainText('min left');
  await tomas.page.getByRole('button', { name: 'Complete batch' }).click();
  await expect(tomas.page.getByTestId('batch-state')).toHaveText('Complete');
  tomas.watch.expectClean('for the technician');

  // Quality: uploads the sphere's file for the batch and releases it with an e-signature.
  const knex = testDb();
  let csv: string;
  try {
    csv = await revisionPartsCsv(knex, revisionId, batchNumber);
  } finally {
    await knex.destroy();
  }
  await ines.page.goto('/');
  await ines.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Measurements' }).click();
  await expect(ines.page.getByTestId('awaiting')).toBeVisible();
  await ines.page.goto(`/measurements/${batchId}`);
  await expect(ines.page.getByTestId('batch-state')).toHaveText('complete');
  await ines.page
    .getByLabel('Measurement file', { exact: true })
    .setInputFiles({ name: 'sphere-export.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
  await ines.page.getByRole('button', { name: 'Upload and measure' }).click();
  await expect(ines.page.getByTestId('upload-done')).toContainText('12 parts measured and saved');
  await expect(ines.page.getByTestId('chromaticity-plot').locator('circle[data-part]')).toHaveCount(12);
  await ines.page.getByLabel('Release the batch').check();
  await ines.page.getByLabel('Comment').fill('Colour inside the acceptance; released for assembly.');
  await ines.page.getByLabel('Your password (re-enter to sign)').fill(DEMO_PASSWORD);
  await ines.page.getByRole('button', { name: 'Sign and release' }).click();
  await expect(ines.page.getByTestId('disposition')).toContainText('Released');
  await expect(ines.page.getByTestId('batch-state')).toHaveText('released');
  ines.watch.expectClean('for quality releasing the batch');

  for (const who of [rhea, ines, tomas]) await who.page.context().close();
});

test('the watch sees a console error and an uncaught page error', async ({ browser }) => {
  const context = await browser.newContext();
  const watch = watchConsole(context);
  const page = await context.newPage();
  await page.goto('/signin');
  await page.evaluate(() => console.error('planted console error'));
  await page.evaluate(() =>
    setTimeout(() => {
      throw new Error('planted page error');
    })
  );
  await expect.poll(() => watch.problems.length).toBe(2);
  expect(watch.problems.join('\n')).toContain('planted console error');
  expect(watch.problems.join('\n')).toContain('planted page error');
  await context.close();
});
