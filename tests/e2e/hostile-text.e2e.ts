import { test, expect, type Page } from '@playwright/test';
import { BASE, DEMO, DEMO_PASSWORD, signInThroughForm, signedInContext, testDb } from './support/accounts';
import { completedBatch, json } from './support/batches';
import { waitForMail } from '../support/mail';
import { DISPOSITION_MEANINGS } from '../../src/lib/measurements/schema';

// Text that looks like markup or SQL, typed into every free-text field a person fills in (material,
// lot, formulation, revision, review comment, return reason, batch, release comment): the API gives it back exactly as typed, every
// page that shows it shows the characters (never an element, never a script run), and the notice
// mail escapes it in HTML.

const RUN = Date.now().toString(36).toUpperCase();
const MARKUP = '<script>window.__pfInjected=1</script><img src=x onerror="window.__pfInjected=2">';
const SQL = `'; DROP TABLE materials; -- " OR 1=1 -- \\ %_`;
/** A distinct hostile text per field, so a page showing the wrong field's text is caught too. */
const hostile = (field: string) => `${field} ${MARKUP} ${SQL} ${RUN}`;
/** For fields limited to 80 characters (lot numbers). */
const shortHostile = (field: string) => `${field}<b>x</b>'"; --%_${RUN}`;

/** The page shows each text as characters: no element made from it, no script run, no dialog. */
async function expectShownLiterally(page: Page, url: string, texts: string[]): Promise<void> {
  const dialogs: string[] = [];
  page.on('dialog', (d) => {
    dialogs.push(d.message());
    void d.dismiss();
  });
  await page.goto(url);
  const body = page.locator('main');
  for (const t of texts) await expect(body, `${url} shows ${t.slice(0, 12)}… as typed`).toContainText(t);
  expect(await page.locator('img[src="x"]').count(), 'no <img> element was made from the text').toBe(0);
  expect(await page.locator('script', { hasText: '__pfInjected' }).count(), 'no <script> element was made from the text').toBe(0);
  expect(await page.locator('b', { hasText: /^x$/ }).count(), 'no <b> element was made from the text').toBe(0);
  expect(await page.evaluate(() => (window as unknown as { __pfInjected?: number }).__pfInjected)).toBeUndefined();
  expect(dialogs).toEqual([]);
}

test('markup and SQL typed into every text field are stored and shown literally', async ({ page }) => {
  const formulator = await signedInContext(DEMO.formulator);
  const quality = await signedInContext(DEMO.quality);
  const technician = await signedInContext(DEMO.technician);
  const knex = testDb();
  try {
    // Material: every free-text field through the API, a lot through the page's form action.
    const material = {
      name: hostile('name'),
      family: hostile('family'),
      supplier: hostile('supplier'),
      notes: hostile('notes'),
      safetyNote: hostile('safety')
    };
    const created = await json(formulator, '/api/v1/phosphors', { code: `HX-${RUN}`, iqe: 0.9, densityGCm3: 4.6, ...material });
    expect(created.status(), await created.text()).toBe(201);
    const materialId = (await created.json()).id as number;
    const back = await (await formulator.get(`/api/v1/phosphors/${materialId}`)).json();
    for (const [k, v] of Object.entries(material)) expect(back[k], `API gives ${k} back as typed`).toBe(v);
    const lot = { lotNumber: shortHostile('lot'), supplier: shortHostile('lotsup'), notes: hostile('lotnotes') };
    const addLot = await formulator.post(`/library/${materialId}?/addLot`, {
      headers: { Origin: BASE, 'x-sveltekit-action': 'true' },
      form: { ...lot, receivedOn: '', expiresOn: '' }
    });
    expect(addLot.status()).toBe(200);
    expect(JSON.parse(await addLot.text()).type, await addLot.text()).toBe('success');
    const lotRow = (await knex('material_lots').where({ material_id: materialId }).first('lot_number', 'supplier', 'notes'))!;
    expect([lotRow.lot_number, lotRow.supplier, lotRow.notes]).toEqual([lot.lotNumber, lot.supplier, lot.notes]);

    // Formulation and its first revision (content copied from an approved demo revision).
    const approved = await knex('formulation_revisions as r')
      .join('formulations as f', 'f.id', 'r.formulation_id')
      .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' })
      .first('r.id', 'r.content_json');
    const content = { ...JSON.parse(approved.content_json), notes: hostile('revnotes') };
    const meta = { name: hostile('fname'), description: hostile('fdesc') };
    const formulation = await json(formulator, '/api/v1/formulations', { ...meta, content });
    expect(formulation.status(), await formulation.text()).toBe(201);
    const { formulationId, revisionId } = await formulation.json();
    const stored = await knex('formulations').where({ id: formulationId }).first('name', 'description');
    expect(stored).toEqual({ name: meta.name, description: meta.description });
    const revBase = `/api/v1/formulations/${formulationId}/revisions/${revisionId}`;
    expect((await json(formulator, `${revBase}/submit`, { version: 1 })).status()).toBe(200);
    const revVersion = async () => (await knex('formulation_revisions').where({ id: revisionId }).first('version'))!.version as number;
    const reviewComment = hostile('review');
    const reviewed = await json(quality, `${revBase}/review`, {
      version: await revVersion(),
      password: DEMO_PASSWORD,
      comment: reviewComment
    });
    expect(reviewed.status(), await reviewed.text()).toBe(200);
    const reason = hostile('reason');
    const returned = await json(quality, `${revBase}/return`, { version: await revVersion(), password: DEMO_PASSWORD, reason });
    expect(returned.status(), await returned.text()).toBe(200);
    const revRow = (await knex('formulation_revisions').where({ id: revisionId }).first('content_json'))!;
    expect(JSON.parse(revRow.content_json).notes).toBe(content.notes);
    // The notice to the author carries the reason as typed in its text part and escaped in its HTML part.
    const [notice] = await waitForMail((m) => m.text.includes(reason), 1, 10_000);
    expect(notice, 'a notice mail carries the reason').toBeDefined();
    expect(notice.html).toContain('&lt;script&gt;window.__pfInjected=1&lt;/script&gt;');
    expect(notice.html).not.toContain(MARKUP);

    // Batch notes (a technician plans a batch of the approved demo revision).
    const batchNotes = hostile('bnotes');
    const batch = await json(technician, '/api/v1/batches', {
      revisionId: approved.id,
      sizing: { kind: 'mass', batchMassG: 50 },
      loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
      additives: [],
      balance: { resolutionG: 0.01, minWeightG: 0.05 },
      notes: batchNotes
    });
    expect(batch.status(), await batch.text()).toBe(201);
    const batchId = (await batch.json()).id as number;
    expect((await knex('batches').where({ id: batchId }).first('notes'))!.notes).toBe(batchNotes);

    // Quality's signed release of a measured batch, with its comment.
    const measured = await completedBatch();
    const upload = await quality.post(`/api/v1/measurements/${measured.id}`, {
      data: measured.csv,
      headers: { 'content-type': 'text/csv', Origin: BASE }
    });
    expect(upload.status(), await upload.text()).toBe(201);
    const dispositionComment = hostile('dcomment');
    const batchVersion = (await knex('batches').where({ id: measured.id }).first('version'))!.version;
    const released = await json(quality, `/api/v1/measurements/${measured.id}/disposition`, {
      decision: 'release',
      meaning: DISPOSITION_MEANINGS.release[0],
      comment: dispositionComment,
      password: DEMO_PASSWORD,
      version: batchVersion
    });
    expect(released.status(), await released.text()).toBe(201);

    // Every page that shows these texts, each for a role that may open it.
    await signInThroughForm(page, DEMO.formulator);
    await expectShownLiterally(page, `/library/${materialId}`, [...Object.values(material), lot.lotNumber, lot.notes]);
    await expectShownLiterally(page, `/library?q=HX-${RUN}`, [material.name]);
    await expectShownLiterally(page, `/formulations/${formulationId}`, [meta.name, meta.description]);
    await expectShownLiterally(page, `/formulations/${formulationId}/revisions/${revisionId}`, [content.notes, reviewComment, reason]);
    await expectShownLiterally(page, `/formulations?q=${encodeURIComponent(`fname ${MARKUP}`)}`, [meta.name]);
    await page.context().clearCookies();
    await signInThroughForm(page, DEMO.technician);
    await expectShownLiterally(page, `/batches/${batchId}`, [batchNotes]);
    await page.context().clearCookies();
    await signInThroughForm(page, DEMO.quality);
    await expectShownLiterally(page, `/measurements/${measured.id}`, [dispositionComment]);
  } finally {
    await knex.destroy();
    await Promise.all([formulator.dispose(), quality.dispose(), technician.dispose()]);
  }
});
