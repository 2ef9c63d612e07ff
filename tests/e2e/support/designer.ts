/** Designer steps shared by end-to-end tests: choosing the pump and adding phosphors from the demo library. */
import { expect, type Page } from '@playwright/test';

/** The value of the option whose text starts with the material's code (options read "CODE — name · …"). */
async function optionFor(page: Page, label: string, code: string): Promise<string> {
  return page
    .getByLabel(label)
    .evaluate((el: HTMLSelectElement, c) => [...el.options].find((o) => o.text.startsWith(`${c} `))?.value ?? '', code);
}

export async function addPhosphor(page: Page, code: string): Promise<void> {
  const value = await optionFor(page, 'Add a phosphor', code);
  expect(value, `${code} is in the demo library`).not.toBe('');
  await page.getByLabel('Add a phosphor').selectOption(value);
  await page.getByRole('button', { name: 'Add', exact: true }).click();
}

export async function choosePump(page: Page, code: string): Promise<void> {
  const value = await optionFor(page, 'Pump', code);
  expect(value, `${code} is in the demo library`).not.toBe('');
  await page.getByLabel('Pump').selectOption(value);
}
