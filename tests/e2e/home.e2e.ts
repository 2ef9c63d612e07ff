import { test, expect } from '@playwright/test';
import { DEMO, signInThroughForm } from './support/accounts';

// The home page is each role's work queue: counts and the oldest items, with links into the work.
test('quality sees what waits for review and decision, with links into it', async ({ page }) => {
  await signInThroughForm(page, DEMO.quality);
  await page.goto('/');
  const queues = page.getByTestId('work-queues');
  await expect(queues.locator('[data-queue]')).toHaveCount(3);
  const decide = queues.locator('[data-queue="batchesToDecide"]');
  await expect(decide.getByRole('heading')).toHaveText('Batches waiting for a decision');
  await expect(decide.getByTestId('queue-count')).not.toHaveText('0');
  await decide.getByRole('link').first().click();
  await expect(page).toHaveURL(/\/measurements\/\d+$/);
});

test('a technician sees batches to weigh and slurries near their limit, not the review queue', async ({ page }) => {
  await signInThroughForm(page, DEMO.technician);
  await page.goto('/');
  await expect(page.locator('[data-queue="batchesToWeigh"]')).toBeVisible();
  await expect(page.locator('[data-queue="slurriesNearLimit"]')).toBeVisible();
  await expect(page.locator('[data-queue="revisionsToReview"]')).toHaveCount(0);
});
