import { test, expect } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { DEMO, signInThroughForm, testDb } from './support/accounts';

// A line technician plans a batch of the approved demo formulation, downloads the ticket, and
// records the weights — one of them out of range, which the page flags at once.
test('a technician plans a batch, downloads the ticket and records weights including one out of range', async ({ page }) => {
  const knex = testDb();
  const lots = new Map<string, string>();
  try {
    for (const code of ['GL-530', 'YL-568', 'RD-625']) {
      const row = await knex('material_lots as l')
        .join('materials as m', 'm.id', 'l.material_id')
        .where('m.code', code)
        .orderBy('l.id', 'desc')
        .first('l.lot_number');
      lots.set(code, row.lot_number);
    }
  } finally {
    await knex.destroy();
  }

  await signInThroughForm(page, DEMO.technician);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Weigh-out' }).click();
  await page.getByRole('link', { name: 'Plan a batch' }).click();
  const revision = page.getByLabel('Approved revision');
  const value = await revision.locator('option', { hasText: 'KH-W30-90' }).getAttribute('value');
  await revision.selectOption(value!);
  await page.waitForURL(/revision=/);
  await page.getByLabel('Batch size (g)').fill('20');
  // 20 g at the revision's 9.32 + 7.14 + 8.29 wt %: GL-530 = 1.864 g (20 × 9.32 %).
  await expect(page.getByTestId('plan-preview')).toContainText('1.864');
  await page.getByRole('button', { name: 'Plan this batch' }).click();
  await page.waitForURL(/\/batches\/\d+$/);
  const batchNumber = (await page.getByTestId('batch-number').textContent())!.trim();
  expect(batchNumber).toMatch(/^BT-\d{6}-\d{3}$/);
  await expect(page.getByTestId('batch-state')).toHaveText('Planned');

  const download = page.waitForEvent('download');
  await page.getByRole('link', { name: 'Ticket PDF (A4)' }).click();
  const file = await (await download).path();
  const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
  expect(text).toContain(batchNumber);
  expect(text).toContain('1.864');

  const lines = ['PART A', 'GL-530', 'YL-568', 'RD-625', 'PART B'];
  for (const [i, code] of lines.entries()) {
    const card = page.getByTestId(`line-${i + 1}`);
    const target = (await card.getByTestId(`target-${i + 1}`).textContent())!.replace(' g', '').trim();
    const reading = code === 'RD-625' ? (Number(target) + 0.05).toFixed(3) : target;
    const lot = card.getByLabel(/Lot/);
    await lot.fill(lots.get(code) ?? `BKF-${code.replace(' ', '')}-2612`);
    await lot.press('Enter'); // a scanner ends with Enter: focus moves to the reading
    await expect(card.getByLabel('Balance reading (g)')).toBeFocused();
    await page.keyboard.type(reading);
    await expect(card.getByTestId(`live-${i + 1}`)).toContainText(code === 'RD-625' ? 'above range' : 'in range');
    await card.getByRole('button', { name: 'Record' }).click();
    await expect(card.getByTestId(`status-${i + 1}`)).toHaveText(code === 'RD-625' ? 'above range' : 'in range');
  }
  await expect(page.getByTestId('batch-state')).toHaveText('Weighing');
  await expect(page.getByTestId('line-4')).toContainText('quality must accept the deviation');
  await page.getByRole('button', { name: 'Part B mixed in' }).click();
  await expect(page.getByTestId('slurry-status')).toContainText('min left');
  await expect(page.getByRole('button', { name: 'Complete batch' })).toBeDisabled();

  // An unknown lot is refused with the reason and the reading is kept.
  const first = page.getByTestId('line-2');
  await first.getByLabel(/Lot/).fill('NO-SUCH-LOT');
  await first.getByLabel('Balance reading (g)').fill('1.864');
  // Said live, before Record: the reading may be in range, the lot is not one of GL-530's.
  await expect(first.getByTestId('lot-problem-2')).toContainText('"NO-SUCH-LOT" is not a known lot of GL-530');
  await first.getByRole('button', { name: 'Re-record' }).click();
  await expect(first.getByRole('alert')).toContainText('not a known lot of GL-530');
  await expect(first.getByLabel('Balance reading (g)')).toHaveValue('1.864');
});
