import { test, expect, type APIRequestContext, type Browser, type Page } from '@playwright/test';
import { BASE, DEMO, DEMO_PASSWORD, signedInContext, testDb } from './support/accounts';
import { ensureDemoMaterials } from '../support/demo-materials';

// End to end through the browser: the formulator writes and submits a draft, quality signs it off
// with the e-signature (re-entered password, meaning, comment), the technician sees it as current.
let ids = new Map<string, number>();
let siliconeId = 0;
const code = `E2E-${Date.now().toString(36).toUpperCase()}`;

test.beforeAll(async () => {
  const knex = testDb();
  try {
    ids = await ensureDemoMaterials(knex);
    const s = await knex('silicone_systems').orderBy('id').first('id');
    siliconeId = s
      ? s.id
      : (
          await knex('silicone_systems').insert({
            name: 'E2E 1:1 encapsulant',
            ratio_a: 1,
            ratio_b: 1,
            pot_life_min: 240,
            cure: '1 h at 80 °C',
            safety_note: 'Follow the safety data sheet.'
          })
        )[0];
  } finally {
    await knex.destroy();
  }
});

type Session = Awaited<ReturnType<APIRequestContext['storageState']>>;
const sessions = new Map<string, Session>();

/**
 * A browser page signed in as this person (one session per person from the sign-in endpoint; the
 * form itself is covered by sign-in.e2e.ts).
 */
async function as(browser: Browser, email: string): Promise<Page> {
  if (!sessions.has(email)) {
    const api = await signedInContext(email);
    sessions.set(email, await api.storageState());
    await api.dispose();
  }
  return (await browser.newContext({ storageState: sessions.get(email) })).newPage();
}

async function fillWarmWhite(page: Page) {
  await page.getByLabel('Pump', { exact: true }).selectOption(String(ids.get('B-450')));
  await page.getByLabel('Pump leak (optical fraction)').fill('0.07');
  const rows: [string, string, string][] = [
    ['GL-530', '0.2667', '9.32'],
    ['YL-568', '0.2346', '7.14'],
    ['RD-625', '0.4287', '8.29']
  ];
  for (const [i, [c, f, w]] of rows.entries()) {
    await page.getByLabel(`Phosphor ${i + 1}`, { exact: true }).selectOption(String(ids.get(c)));
    await page.getByLabel(`Optical fraction ${i + 1}`).fill(f);
    await page.getByLabel(`wt % ${i + 1}`).fill(w);
  }
  await page.getByLabel('Silicone system').selectOption(String(siliconeId));
  await page.getByLabel('Target CCT (K)').fill('3000');
  await page.getByLabel('Ra floor').fill('90');
}

async function revisionRow(id: number) {
  const knex = testDb();
  try {
    return (await knex('formulation_revisions').where({ id }).first())!;
  } finally {
    await knex.destroy();
  }
}

test('formulator submits, quality approves with an e-signature, technician sees it as current', async ({ browser }) => {
  const rhea = await as(browser, DEMO.formulator);
  await rhea.goto('/formulations/new');
  await rhea.getByLabel('Code (optional)').fill(code);
  await rhea.getByLabel('Name', { exact: true }).fill('E2E warm white');
  await fillWarmWhite(rhea);
  await rhea.getByRole('button', { name: 'Create with first draft' }).click();
  await rhea.waitForURL(/\/formulations\/\d+\/revisions\/\d+$/);
  const revisionUrl = new URL(rhea.url()).pathname;
  await expect(rhea.getByRole('heading', { level: 1 })).toContainText(`${code} · revision 1`);
  await expect(rhea.locator('[data-state="draft"]').first()).toBeVisible();
  await expect(rhea.locator('[data-metric="CCT"]')).toHaveText(/^3\d{3} K$/);
  await rhea.getByRole('button', { name: 'Submit for review' }).click();
  await expect(rhea.getByRole('status')).toContainText('Submitted for review');
  await expect(rhea.getByRole('heading', { name: 'Sign this revision' })).toHaveCount(0);

  const ines = await as(browser, DEMO.quality);
  await ines.goto(revisionUrl);
  // The meaning is a deliberate choice: nothing is pre-selected, and no password is asked before it.
  await expect(ines.locator('input[name="meaning"]:checked')).toHaveCount(0);
  await expect(ines.getByLabel('Your password')).toHaveCount(0);
  await ines.getByRole('button', { name: 'Continue to signature' }).click();
  await expect(ines.getByRole('alert')).toContainText('Choose what your signature means first.');
  // A return with a wrong password and no reason: both problems at once, under "Not signed".
  await ines.getByRole('radio', { name: /Returned/ }).check();
  await ines.getByRole('button', { name: 'Continue to signature' }).click();
  await ines.getByLabel('Your password').fill('not-the-password');
  await ines.getByRole('button', { name: 'Sign', exact: true }).click();
  const refused = ines.getByRole('alert');
  await expect(refused).toContainText('Not signed');
  await expect(refused).toContainText('password is not correct');
  await expect(refused).toContainText(/say why the revision is returned/i);
  await ines.getByRole('radio', { name: /Approved/ }).check();
  await ines.getByLabel('Comment or reason').fill('Matches the trial builds.');
  await ines.getByRole('button', { name: 'Continue to signature' }).click();
  // What is signed is shown before the password is checked: code, revision, meaning, content hash.
  const summary = ines.getByTestId('sign-summary');
  await expect(summary).toContainText(`${code} revision 1`);
  await expect(summary).toContainText('Approved — release for production');
  await expect(summary).toContainText(/[0-9a-f]{64}/);
  await ines.getByLabel('Your password').fill('not-the-password');
  await ines.getByRole('button', { name: 'Sign', exact: true }).click();
  await expect(ines.getByRole('alert')).toContainText('Not signed');
  await expect(ines.getByRole('alert')).toContainText('password is not correct');
  await expect(ines.getByLabel('Comment or reason')).toHaveValue('Matches the trial builds.');
  await ines.getByRole('button', { name: 'Continue to signature' }).click();
  await expect(ines.getByLabel('Your password')).toHaveValue('');
  await ines.getByLabel('Your password').fill(DEMO_PASSWORD);
  await ines.getByRole('button', { name: 'Sign', exact: true }).click();
  await expect(ines.getByRole('status')).toContainText('Signed and approved');
  const signature = ines.locator('[data-signature="approved"]');
  await expect(signature).toContainText('Ines Halloran');
  await expect(signature).toContainText('UTC');
  await expect(signature).toContainText('Matches the trial builds.');

  const tomas = await as(browser, DEMO.technician);
  await tomas.goto(`/formulations?q=${code}`);
  await expect(tomas.getByRole('link', { name: 'rev 1' })).toBeVisible();
  await tomas.getByRole('link', { name: code }).click();
  await expect(tomas.getByTestId('current-revision')).toContainText('Revision 1');
  await tomas.getByRole('link', { name: 'Revision 1' }).click();
  await expect(tomas.getByTestId('current-note')).toBeVisible();
  await expect(tomas.getByRole('button', { name: 'Sign', exact: true })).toHaveCount(0);
  await expect(tomas.getByRole('button', { name: /Submit|Save draft/ })).toHaveCount(0);
});

test('a stale edit in the form is refused with the reason, keeps what was typed and saves nothing', async ({ browser }) => {
  const rhea = await as(browser, DEMO.formulator);
  await rhea.goto('/formulations/new');
  await rhea.getByLabel('Name', { exact: true }).fill('E2E stale edit');
  await fillWarmWhite(rhea);
  await rhea.getByRole('button', { name: 'Create with first draft' }).click();
  await rhea.waitForURL(/\/revisions\/\d+$/);
  const url = rhea.url();
  const revisionId = Number(url.split('/').pop());

  const other = await rhea.context().newPage();
  await other.goto(url);
  await rhea.getByLabel('Notes').fill('saved first');
  await rhea.getByRole('button', { name: 'Save draft' }).click();
  await expect(rhea.getByRole('status').first()).toContainText('Draft saved (version 2)');

  await other.getByLabel('Notes').fill('my careful edit');
  await other.getByRole('button', { name: 'Save draft' }).click();
  await expect(other.getByRole('alert')).toContainText('Someone changed this revision after you opened it');
  await expect(other.getByLabel('Notes')).toHaveValue('my careful edit');
  const row = await revisionRow(revisionId);
  expect(row.version).toBe(2);
  expect(JSON.parse(row.content_json).notes).toBe('saved first');
});

test('a form post that edits a submitted revision is refused and the database row is unchanged', async () => {
  const api = await signedInContext(DEMO.formulator);
  const m = (c: string) => ({ materialId: ids.get(c)!, code: c, name: c });
  const content = {
    pump: m('B-450'),
    pumpLeakFraction: 0.07,
    loading: null,
    phosphors: [
      { ...m('GL-530'), opticalFraction: 0.2667, wtPct: null },
      { ...m('YL-568'), opticalFraction: 0.2346, wtPct: null },
      { ...m('RD-625'), opticalFraction: 0.4287, wtPct: null }
    ],
    silicone: { siliconeSystemId: siliconeId, name: '-', ratioA: 1, ratioB: 1, potLifeMin: 1, cure: '', densityGPerCm3: null },
    target: { kind: 'cctDuv', cct: 3000, duv: 0 },
    tolerance: { kind: 'sdcm', steps: 3 },
    floors: { raMin: 90 },
    notes: 'as submitted'
  };
  const created = await api.post('/api/v1/formulations', { data: { name: 'E2E locked', content } });
  expect(created.status()).toBe(201);
  const { formulationId, revisionId } = await created.json();
  expect((await api.post(`/api/v1/formulations/${formulationId}/revisions/${revisionId}/submit`, { data: { version: 1 } })).status()).toBe(
    200
  );
  const before = await revisionRow(revisionId);
  const res = await api.post(`/formulations/${formulationId}/revisions/${revisionId}?/save`, {
    headers: { Origin: BASE, accept: 'text/html' },
    maxRedirects: 0, // as a browser posts the form without JavaScript
    form: {
      version: String(before.version),
      pumpId: String(ids.get('B-450')),
      leak: '0.5',
      ph0: String(ids.get('YL-568')),
      of0: '0.5',
      siliconeId: String(siliconeId),
      cct: '5000',
      sdcm: '3',
      notes: 'tampered'
    }
  });
  const body = await res.text();
  expect(res.status()).toBe(409);
  expect(body).toContain('revision is submitted');
  expect(await revisionRow(revisionId)).toEqual(before);
  const put = await api.put(`/api/v1/formulations/${formulationId}/revisions/${revisionId}`, {
    data: { version: before.version, content: { ...content, notes: 'tampered' } }
  });
  expect(put.status()).toBe(409);
  expect(await revisionRow(revisionId)).toEqual(before);
  await api.dispose();
});
