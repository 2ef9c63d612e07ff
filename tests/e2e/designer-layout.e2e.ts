import { test, expect as baseExpect, type Locator, type Page } from '@playwright/test';
import { DEMO, signInThroughForm } from './support/accounts';
import { approvedRevisionId } from './support/revisions';

// A loaded 2-core machine can take a few seconds for a first page load.
const expect = baseExpect.configure({ timeout: 15_000 });

// The designer on one screen: at 1440×900 (a common laptop display, common practice) the aim, the colour map,
// the readout and the proposals are all in view on load; the plot deck's charts open from their tabs.
const VIEWPORT = { width: 1440, height: 900 };
test.use({ viewport: VIEWPORT });

async function expectInView(page: Page, what: string, panel: Locator): Promise<void> {
  const box = await panel.boundingBox();
  expect(box, `${what} is drawn`).not.toBeNull();
  const { x, y, width, height } = box!;
  const scroll = await page.evaluate(() => [window.scrollX, window.scrollY]);
  expect(scroll, 'the page has not scrolled').toEqual([0, 0]);
  expect(x, `${what}: left edge in view`).toBeGreaterThanOrEqual(0);
  expect(y, `${what}: top edge in view`).toBeGreaterThanOrEqual(0);
  expect(x + width, `${what}: right edge in view`).toBeLessThanOrEqual(VIEWPORT.width);
  expect(y + height, `${what}: bottom edge in view`).toBeLessThanOrEqual(VIEWPORT.height);
}

test('at 1440×900 the aim, colour map, readout and proposals are in view together without scrolling', async ({ page }) => {
  await signInThroughForm(page, DEMO.formulator);
  await page.goto(`/designer?from=${await approvedRevisionId()}`);
  await expect(page.getByTestId('opened')).toContainText('KH-W30-90');
  await expect(page.getByTestId('m-cct')).toHaveText(/^\d+ K$/);

  await expectInView(page, 'aim panel', page.getByRole('region', { name: 'Aim & limits' }));
  await expectInView(page, 'colour map', page.getByRole('region', { name: 'Colour map' }));
  await expectInView(page, 'readout', page.getByTestId('readout'));
  await expectInView(page, 'proposals panel', page.getByRole('region', { name: 'Proposals' }));
  await expect(page.getByRole('button', { name: 'Find blends' })).toBeInViewport();
  // Filing stays one click away.
  await page.getByRole('link', { name: 'File this blend' }).click();
  await expect(page.getByRole('button', { name: 'File draft' })).toBeInViewport();
});

test('the plot deck opens the light profile, the TM-30 colour vectors and the R1–R14 bars', async ({ page }) => {
  await signInThroughForm(page, DEMO.formulator);
  await page.goto(`/designer?from=${await approvedRevisionId()}`);
  await expect(page.getByTestId('m-cct')).toHaveText(/^\d+ K$/);
  const deck = page.getByTestId('plot-deck');

  await deck.getByRole('tab', { name: 'Hue vectors (TM-30)' }).click();
  await expect(deck.getByRole('tab', { name: 'Hue vectors (TM-30)' })).toHaveAttribute('aria-selected', 'true');
  const rose = deck.getByTestId('vector-rose');
  await expect(rose).toBeVisible();
  await expect(deck.getByTestId('chroma-shifts')).toBeVisible();
  // ANSI/IES TM-30-20 Annex: the colour-vector graphic has 16 hue bins, one arrow each.
  await expect(rose.locator('line[stroke]')).toHaveCount(16);
  const roseBox = (await rose.boundingBox())!;
  // Readable: at least about 360 px across (common practice for the graphic shown on its own).
  expect(roseBox.width).toBeGreaterThanOrEqual(360);
  expect(roseBox.height).toBeGreaterThanOrEqual(360);
  await expect(deck.getByTestId('light-profile')).toHaveCount(0);

  await deck.getByRole('tab', { name: 'Light profile' }).click();
  const profile = deck.getByTestId('light-profile');
  await expect(profile).toBeVisible();
  // B-450 pump + GL-530 + YL-568 + RD-625: one stacked band per component (seeds/03_formulations.ts).
  await expect(profile.locator('[data-layer="band"]')).toHaveCount(4);
  await expect(profile.locator('[data-layer="total"]')).toHaveCount(1);

  // Keyboard: arrows move between tabs (WAI-ARIA Authoring Practices 1.2, tabs pattern).
  await deck.getByRole('tab', { name: 'Light profile' }).focus();
  await page.keyboard.press('ArrowLeft');
  await expect(deck.getByRole('tab', { name: 'R1–R14 bars' })).toBeFocused();
  // CIE 13.3-1995: fourteen test colour samples, one bar each.
  await expect(deck.getByTestId('ri-bars').locator('rect')).toHaveCount(14);
});
