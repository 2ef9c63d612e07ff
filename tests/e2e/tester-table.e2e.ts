import { test, expect } from '@playwright/test';
import { DEMO, signInThroughForm } from './support/accounts';
import { completedBatch } from './support/batches';

// Quality saves a tester profile once, then uploads a tester's per-part table to a batch: the parts are
// judged on what the table carries, and metrics that need a spectrum read "not measured". Values invented.
test('a tester profile, then a per-part table uploaded with it; spectral metrics read "not measured"', async ({ page }) => {
  const b = await completedBatch();
  const name = `E2E tester ${Date.now().toString(36)}`;
  await signInThroughForm(page, DEMO.quality);
  await page.goto('/measurements/tester-profiles');
  await page.getByLabel('Name').fill(name);
  await page.getByLabel('Delimiter').selectOption(';');
  await page.getByLabel('Decimal mark').selectOption(',');
  await page.getByLabel('Part label').fill('Serial');
  await page.getByLabel('CIE x').fill('x');
  await page.getByLabel('CIE y').fill('y');
  await page.getByLabel('Ra', { exact: true }).fill('Ra');
  await page.getByRole('button', { name: 'Create profile' }).click();
  await expect(page.getByRole('status')).toContainText(`Profile "${name}" created`);
  await expect(page.getByTestId('tester-profiles')).toContainText(name);

  await page.goto(`/measurements/${b.id}`);
  const rows = Array.from({ length: 5 }, (_, i) => `${b.batchNumber}-T${i + 1};0,433${8 + (i % 2)};0,4030;9${i},5`);
  await page.getByLabel('The file holds').selectOption({ label: `a tester table: ${name}` });
  await page
    .getByLabel('Measurement file', { exact: true })
    .setInputFiles({ name: 'tester.csv', mimeType: 'text/csv', buffer: Buffer.from(['Serial;x;y;Ra', ...rows].join('\n')) });
  await page.getByRole('button', { name: 'Upload and measure' }).click();
  await expect(page.getByTestId('upload-done')).toContainText('5 parts measured and saved');
  const part = page.locator(`tr[data-part="${b.batchNumber}-T1"]`);
  await expect(part).toContainText('not measured');
  await expect(part.getByTestId('not-measured')).toContainText('R9 ≥ 50: not measured');

  // The parts list is filtered and paged on the server: only T2 and T4 sit at x 0.4339.
  await page.goto(`/measurements/${b.id}?x0=0.43385&x1=0.43395&y0=0.40&y1=0.41&sort=label&dir=desc`);
  await expect(page.getByTestId('parts-count')).toContainText('Parts 1–2 of 2 matching');
  await expect(page.getByTestId('parts-table').locator('tbody tr').first()).toHaveAttribute('data-part', `${b.batchNumber}-T4`);
  // The matching parts as CSV, with the same filters: two rows, spectral metrics "not measured".
  const csv = await page.request.get((await page.getByTestId('parts-csv').getAttribute('href'))!);
  expect(csv.headers()['content-type']).toContain('text/csv');
  const lines = (await csv.text()).trim().split('\n');
  expect(lines).toHaveLength(3);
  expect(lines[1]).toContain(`${b.batchNumber}-T4`);
  expect(lines[1]).toContain('not measured');
  await page.goto(`/measurements/${b.id}?stepsMin=abc`);
  await expect(page.getByText('Filter not applied: steps from: "abc" is not a number')).toBeVisible();

  // A table that does not fit the profile: refused, naming the line and column; nothing saved.
  await page.getByLabel('The file holds').selectOption({ label: `a tester table: ${name}` });
  await page
    .getByLabel('Measurement file', { exact: true })
    .setInputFiles({ name: 'wrong.csv', mimeType: 'text/csv', buffer: Buffer.from('Serial;x;y;Ra\nW1;0,4338;abc;91\n') });
  await page.getByRole('button', { name: 'Upload and measure' }).click();
  await expect(page.getByTestId('upload-error')).toContainText('line 2, column "y": "abc" is not a number');
});

// A lot larger than the plot draws point by point: the density in hexagons, the failing parts as points,
// the parts list paged. 6,000 parts invented: a spread of about ±6 steps around 3000 K.
test('a 6,000-part tester table is plotted as a density with the failing parts as points', async ({ page }) => {
  const b = await completedBatch();
  const name = `E2E density ${Date.now().toString(36)}`;
  await signInThroughForm(page, DEMO.quality);
  await page.goto('/measurements/tester-profiles');
  await page.getByLabel('Name').fill(name);
  await page.getByLabel('CIE x').fill('x');
  await page.getByLabel('CIE y').fill('y');
  await page.getByRole('button', { name: 'Create profile' }).click();
  await expect(page.getByRole('status')).toContainText('created');
  let s = 5;
  const rnd = () => (s = (s * 16807) % 2147483647) / 2147483647;
  const rows = Array.from(
    { length: 6000 },
    () => `${(0.4338 + 0.012 * (rnd() - 0.5)).toFixed(5)},${(0.403 + 0.008 * (rnd() - 0.5)).toFixed(5)}`
  );
  await page.goto(`/measurements/${b.id}`);
  await page.getByLabel('The file holds').selectOption({ label: `a tester table: ${name}` });
  await page
    .getByLabel('Measurement file', { exact: true })
    .setInputFiles({ name: 'lot.csv', mimeType: 'text/csv', buffer: Buffer.from(['x,y', ...rows].join('\n')) });
  await page.getByRole('button', { name: 'Upload and measure' }).click();
  await expect(page.getByTestId('upload-done')).toContainText('6000 parts measured and saved');
  await expect(page.locator('[data-shape="density"]')).toHaveAttribute('data-bins', /^[1-9]\d+$/);
  await expect(page.getByTestId('plot-sample')).toContainText('6,000 parts: density in hexagons');
  // More than a thousand failing parts: drawn on a canvas layer inside the plot, not as SVG circles.
  await expect(page.getByTestId('parts-canvas')).toHaveAttribute('data-points', /^\d{4}$/);
  await expect(page.getByTestId('chromaticity-plot').locator('circle[data-part]')).toHaveCount(0);
  await expect(page.getByTestId('parts-count')).toContainText('Parts 1–100 of 6,000 matching');
  await expect(page.getByTestId('parts-pager')).toContainText('page 1 of 60');

  // Lot statistics of the whole lot: counts, capability, the mean's confidence ellipse, the run trend.
  const stats = page.getByTestId('lot-statistics');
  await expect(stats.getByTestId('lot-verdicts')).toContainText('pass');
  await expect(stats.getByTestId('cpk-colour')).toHaveText(/^-?\d+\.\d\d$/);
  await expect(page.locator('[data-shape="mean-confidence"]')).toHaveCount(1);
  await expect(page.getByTestId('mean-confidence-legend')).toContainText('95 % confidence ellipse of the mean');
  // 6,000 parts in 50 consecutive groups (at most 50 groups: common practice for a readable run chart).
  await expect(stats.getByTestId('trend-chart')).toHaveAttribute('data-groups', '50');
  await stats.getByTestId('trend-quantity').selectOption({ label: 'CCT' });
  await expect(stats.getByTestId('trend-chart')).toHaveAttribute('data-quantity', 'cct');
  await expect(stats.getByTestId('trend-drift')).toContainText('K per 1,000 parts');

  // A rectangle drawn on the plot lists only the parts inside it (filtered on the server, first page).
  await page.getByTestId('select-parts').click();
  const box = (await page.getByTestId('chromaticity-plot').boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.45, box.y + box.height * 0.4);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width * 0.5, box.y + box.height * 0.45, { steps: 5 });
  await page.mouse.move(box.x + box.width * 0.55, box.y + box.height * 0.5, { steps: 5 });
  await page.mouse.up();
  await expect(page).toHaveURL(/x0=0\.\d+&x1=0\.\d+&y0=0\.\d+&y1=0\.\d+/);
  await expect(page.getByTestId('plot-selection')).toContainText('matching');
  await expect(page.locator('[data-shape="selection"]')).toHaveCount(1);
  await expect(page.getByTestId('parts-count')).not.toContainText('of 6,000 matching');
  await page.getByRole('link', { name: 'List every part' }).click();
  await expect(page.getByTestId('parts-count')).toContainText('Parts 1–100 of 6,000 matching');
});
