import { test, expect, type APIRequestContext } from '@playwright/test';
import { DEMO, DEMO_PASSWORD, signInThroughForm, signedInContext, testDb } from './support/accounts';
import { revisionContentSchema } from '../../src/lib/formulations/content';
import { loadRevisionComponents } from '../../src/lib/server/formulations/components';
import { syntheticPartsCsv } from '../../src/lib/quality/syntheticParts';

const json = (ctx: APIRequestContext, url: string, data: object) => ctx.post(url, { data, headers: { 'content-type': 'application/json' } });

/** A technician plans, weighs (every line at target, current lots), mixes and completes a 10 g batch of KH-W30-90. */
async function completedBatch(): Promise<{ id: number; batchNumber: string; csv: string }> {
  const knex = testDb();
  try {
    const rev = await knex('formulation_revisions as r').join('formulations as f', 'f.id', 'r.formulation_id')
      .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' }).first('r.id', 'r.content_json');
    const tech = await signedInContext(DEMO.technician);
    const created = await json(tech, '/api/v1/batches', {
      revisionId: rev.id, sizing: { kind: 'mass', batchMassG: 10 }, loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
      additives: [], balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-E2E' }, plantLimitMin: 120
    });
    expect(created.status()).toBe(201);
    const { id, batchNumber } = await created.json();
    const batch = await (await tech.get(`/api/v1/batches/${id}`)).json();
    for (const l of batch.lines) {
      const lot = l.materialId ? (await knex('material_lots').where({ material_id: l.materialId }).orderBy('id', 'desc').first('lot_number')).lot_number : 'BKF-LX11-2611';
      expect((await json(tech, `/api/v1/batches/${id}/lines/${l.seq}`, { actualG: l.targetG, lotNumber: lot, version: l.version })).status()).toBe(200);
    }
    let version = (await (await tech.get(`/api/v1/batches/${id}`)).json()).version;
    expect((await json(tech, `/api/v1/batches/${id}/mix`, { version })).status()).toBe(200);
    version = (await (await tech.get(`/api/v1/batches/${id}`)).json()).version;
    expect((await json(tech, `/api/v1/batches/${id}/complete`, { version })).status()).toBe(200);
    await tech.dispose();
    // 12 synthetic parts of the revision (invented), red 3 % high with a little scatter.
    const content = revisionContentSchema.parse(JSON.parse(rev.content_json));
    const { components } = await loadRevisionComponents(knex, content);
    const fractions = [content.pumpLeakFraction, ...content.phosphors.map((p) => p.opticalFraction)];
    return { id, batchNumber, csv: syntheticPartsCsv(components, fractions, { parts: 12, prefix: `${batchNumber}-`, lastPhosphorScale: 1.03, scatter: 0.01 }) };
  } finally {
    await knex.destroy();
  }
}

test('quality uploads a multi-part file, sees the plot and releases the batch', async ({ page }) => {
  const batch = await completedBatch();

  await signInThroughForm(page, DEMO.quality);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Measurements' }).click();
  await page.getByTestId('awaiting').getByRole('link', { name: batch.batchNumber }).click();
  await page.waitForURL(new RegExp(`/measurements/${batch.id}$`));
  await expect(page.getByTestId('batch-state')).toHaveText('complete');

  await page.getByLabel('Measurement file', { exact: true }).setInputFiles({ name: 'sphere-export.csv', mimeType: 'text/csv', buffer: Buffer.from(batch.csv) });
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

  await page.getByLabel('Release the batch').check();
  await page.getByLabel('Comment').fill('Colour inside the acceptance; released for assembly.');
  await page.getByLabel('Your password (re-enter to sign)').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign and release' }).click();
  await expect(page.getByTestId('disposition')).toContainText('Released');
  await expect(page.getByTestId('disposition')).toContainText('Ines Halloran');
  await expect(page.getByTestId('batch-state')).toHaveText('released');
  await expect(page.getByRole('link', { name: /Batch record with the measurement summary/ })).toBeVisible();
});

test('a wrong password signs nothing and says so', async ({ page }) => {
  const knex = testDb();
  let id: number;
  try {
    // The demo batch BT-261201-001 is seeded with measurements and waits for a decision.
    id = (await knex('batches').where({ batch_number: 'BT-261201-001' }).first('id')).id;
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
