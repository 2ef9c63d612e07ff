/**
 * Names, codes, lot numbers and file names with control characters (NUL, ESC) or bidirectional
 * overrides are refused with 400 naming the character, and nothing is saved. A file named
 * "orange<U+202E>vsc.exe" (U+202E, Unicode UAX #9 §2) would otherwise be listed and downloaded disguised.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as phosphors from '../../../src/routes/api/v1/phosphors/+server';
import * as phosphorSpectrum from '../../../src/routes/api/v1/phosphors/[id]/spectrum/+server';
import { POST as previewBatch } from '../../../src/routes/api/v1/batches/preview/+server';
import { call } from './support';
import { demoUser, gaussianCsv, phosphorFields, removeTestMaterials } from '../../server/library/support';
import { makeFixture, request as batchRequest } from '../../server/batches/support';
import { lotSchema } from '../../../src/lib/library/schema';
import type { User } from '../../../src/lib/server/accounts/users';

let rhea: User;
let tomas: User;

function event(user: User, init: { body?: unknown; raw?: BodyInit; params?: Record<string, string>; query?: string }) {
  const url = new URL(`http://local/api${init.query ?? ''}`);
  const body = init.raw ?? JSON.stringify(init.body);
  const headers: Record<string, string> = init.raw ? {} : { 'content-type': 'application/json' };
  return {
    request: new Request(url, { method: 'POST', body, headers }),
    url,
    params: init.params ?? {},
    locals: { user, viaToken: false, denied: null }
  };
}
const count = async (table: string) => Number((await db()(table).count({ n: '*' }))[0].n);

describe('hidden characters in names, codes, lots and file names', () => {
  beforeAll(async () => {
    await removeTestMaterials();
    rhea = await demoUser('formulator');
    tomas = await demoUser('technician');
  });
  afterAll(async () => {
    await removeTestMaterials();
    await closeDb();
  });

  it('refuses a phosphor named with NUL, ESC or a right-to-left override (400), saving nothing', async () => {
    const before = await count('materials');
    for (const name of ['Garnet\u0000 green', 'Garnet \u001B[31mred', 'Garnet\u202Efdp.exe', 'Garnet\u2066 isolate']) {
      const r = await call(phosphors.POST, event(rhea, { body: { ...phosphorFields('TST-H1'), name } }));
      expect(r.status).toBe(400);
      expect(JSON.stringify(r.body.issues)).toMatch(/Name contains a (control|text-direction) character \(U\+/);
    }
    const supplier = await call(phosphors.POST, event(rhea, { body: { ...phosphorFields('TST-H1'), supplier: 'Larkspur\u202E' } }));
    expect(supplier.status).toBe(400);
    expect(await count('materials')).toBe(before);
    // Notes keep their line breaks and tabs.
    const ok = await call(phosphors.POST, event(rhea, { body: { ...phosphorFields('TST-H2'), notes: 'Line one\n\tLine two' } }));
    expect(ok.status).toBe(201);
  });

  it('refuses a spectrum file named with U+202E (400) and stores neither spectrum nor object', async () => {
    const id = String((await call(phosphors.POST, event(rhea, { body: phosphorFields('TST-H3') }))).body.id);
    const [spectra, files] = [await count('material_spectra'), await count('stored_files')];
    const form = new FormData();
    form.set('file', new File([gaussianCsv(600, 45)], 'orange\u202Evsc.exe', { type: 'text/csv' }));
    const r = await call(phosphorSpectrum.POST, event(rhea, { params: { id }, query: '?kind=emission&version=1', raw: form }));
    expect(r.status).toBe(400);
    expect(r.body.error).toMatch(/The file name contains a text-direction character \(U\+202E\).*Nothing was saved/);
    expect([await count('material_spectra'), await count('stored_files')]).toEqual([spectra, files]);
  });

  it('refuses a lot number with ESC and a batch additive named with an override', async () => {
    const lot = lotSchema.safeParse({ lotNumber: 'LLM\u001B-7731' });
    expect(lot.success).toBe(false);
    expect(lot.error!.issues[0].message).toMatch(/Lot number contains a control character \(U\+001B\)/);
    const fx = await makeFixture();
    const additive = { code: 'TIO2', name: 'diffuser\u202E', pct: 0.5, tolerance: { kind: 'pct', value: 1 } };
    const r = await call(previewBatch, event(tomas, { body: { ...batchRequest(fx.revisionId), additives: [additive] } }));
    expect(r.status).toBe(400);
    expect(r.body.issues[0]).toMatchObject({ path: 'additives.0.name', message: expect.stringContaining('U+202E') });
  });
});
