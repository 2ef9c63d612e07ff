import { test, expect as baseExpect } from '@playwright/test';
import { readFile, writeFile } from 'node:fs/promises';
import { DEMO, signInThroughForm, testDb } from './support/accounts';

const expect = baseExpect.configure({ timeout: 15_000 });

// IES TM-27-14 spectral data documents in the browser: a material's spectrum goes out as XML, comes
// back in through the spectrum upload with a laboratory's header, and goes out again with that header;
// the revision page offers its predicted SPD in the same format. CG-505 is a demo phosphor no other
// browser test edits.

async function ids(): Promise<{ material: number; formulation: number; revision: number }> {
  const knex = testDb();
  try {
    const m = (await knex('materials').where({ code: 'CG-505' }).first('id'))!;
    const r = (await knex('formulation_revisions').where({ state: 'approved' }).orderBy('id').first('id', 'formulation_id'))!;
    return { material: Number(m.id), formulation: Number(r.formulation_id), revision: Number(r.id) };
  } finally {
    await knex.destroy();
  }
}

test('a spectrum goes out as an IES TM-27 document, comes back with a lab header, and goes out with it', async ({ page }, info) => {
  const { material, formulation, revision } = await ids();
  await signInThroughForm(page, DEMO.formulator);
  await page.goto(`/library/${material}`);
  const links = page.getByTestId('tm27-downloads');
  const [first] = await Promise.all([page.waitForEvent('download'), links.getByRole('link', { name: 'emission' }).click()]);
  const xml = await readFile((await first.path())!, 'utf8');
  expect(xml).toContain('<IESTM2714 xmlns="http://www.ies.org/iestm2714" version="1.0">');
  expect(xml).toContain('<CatalogNumber>CG-505</CatalogNumber>');

  // The lab's own header: a report number and the conditions, as a measuring lab would write them.
  const labXml = xml
    .replace(/<Description>[^<]*<\/Description>/, '<Description>CG-505 lot 7, excited at 450 nm</Description>')
    .replace('</Header>', '  <ReportNumber>PL-2612-009</ReportNumber>\n  </Header>');
  const labFile = info.outputPath('cg505-lab.xml');
  await writeFile(labFile, labXml);
  await page.goto(`/library/${material}/spectrum`);
  await page.getByLabel('File').setInputFiles(labFile);
  const preview = page.getByTestId('preview');
  await expect(preview).toBeVisible();
  await expect(preview).toContainText('IES TM-27 document');
  await page.getByRole('button', { name: 'Save spectrum' }).click();
  await expect(page.getByText('New emission spectrum saved.')).toBeVisible();

  const [second] = await Promise.all([
    page.waitForEvent('download'),
    page.getByTestId('tm27-downloads').getByRole('link', { name: 'emission' }).click()
  ]);
  const again = await readFile((await second.path())!, 'utf8');
  expect(again).toContain('<Description>CG-505 lot 7, excited at 450 nm</Description>');
  expect(again).toContain('<ReportNumber>PL-2612-009</ReportNumber>');
  expect(again.match(/<SpectralData /g)?.length).toBe(xml.match(/<SpectralData /g)?.length);

  // A broken document is refused whole, naming the line.
  const broken = info.outputPath('broken.xml');
  await writeFile(broken, labXml.replace('</SpectralQuantity>', ''));
  await page.goto(`/library/${material}/spectrum`);
  await page.getByLabel('File').setInputFiles(broken);
  await expect(page.getByTestId('upload-error')).toContainText('not well formed');

  await page.goto(`/formulations/${formulation}/revisions/${revision}`);
  const [predicted] = await Promise.all([page.waitForEvent('download'), page.getByTestId('revision-tm27').click()]);
  const spd = await readFile((await predicted.path())!, 'utf8');
  expect(spd).toContain('A prediction, not a measurement.');
});
