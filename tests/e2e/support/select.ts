import { expect, type Page } from '@playwright/test';

/** Chooses the option of a labelled select whose text starts with `code ` (a library material by its code). */
export async function pickOption(page: Page, label: string, code: string): Promise<string> {
  const select = page.getByLabel(label);
  const value = await select.evaluate(
    (el: HTMLSelectElement, c) => [...el.options].find((o) => o.text.startsWith(`${c} `))?.value ?? '',
    code
  );
  expect(value, `${code} is in the demo library`).not.toBe('');
  await select.selectOption(value);
  return value;
}
