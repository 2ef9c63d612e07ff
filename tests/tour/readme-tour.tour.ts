import { execFileSync } from 'node:child_process';
import { test } from '@playwright/test';
import { DEMO, signInThroughForm, testDb } from '../e2e/support/accounts';
import { approvedRevisionId } from '../e2e/support/revisions';

// Screenshots for the README's tour, from the seeded demo data: each role's home page, the designer
// at 1440×900 and the first page of a weigh-out ticket.
test.use({ viewport: { width: 1440, height: 900 } });

for (const role of ['formulator', 'technician', 'quality'] as const) {
  test(`home page of a ${role}`, async ({ page }) => {
    await signInThroughForm(page, DEMO[role]);
    await page.goto('/');
    await page.getByTestId('work-queues').waitFor();
    await page.screenshot({ path: `docs/tour/home-${role}.png` });
  });
}

test('designer at 1440×900', async ({ page }) => {
  await signInThroughForm(page, DEMO.formulator);
  await page.goto(`/designer?from=${await approvedRevisionId()}`);
  await page.getByTestId('m-cct').filter({ hasText: 'K' }).waitFor();
  // The proposals for the revision's own aim, beside the readout.
  await page.getByRole('button', { name: 'Find blends' }).click();
  await page.getByTestId('solve-status').filter({ hasText: 'Blends found' }).waitFor({ timeout: 30_000 });
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: 'docs/tour/designer.png' });
});

test('weigh-out ticket', async ({ page }) => {
  await signInThroughForm(page, DEMO.technician);
  const knex = testDb();
  let batchId: number;
  try {
    batchId = (await knex('batches').orderBy('id').first('id'))!.id;
  } finally {
    await knex.destroy();
  }
  const pdf = await page.request.get(`/api/v1/batches/${batchId}/ticket`);
  const file = 'docs/tour/ticket.pdf';
  const { writeFileSync, unlinkSync } = await import('node:fs');
  writeFileSync(file, await pdf.body());
  execFileSync('pdftoppm', ['-png', '-r', '80', '-f', '1', '-l', '1', '-singlefile', file, 'docs/tour/ticket']);
  unlinkSync(file);
});
