/**
 * File storage down: the app's S3 client points at a closed port. An upload must answer 503 with
 * `{ error }` naming the file storage (not the database), log it, and save nothing.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  // Port 1 (TCP port service multiplexer, RFC 1078) is not served on the test machine: connections are refused.
  process.env.S3_ENDPOINT = 'http://127.0.0.1:1';
});

import { db, closeDb } from '../../../src/lib/server/db/index';
import * as phosphors from '../../../src/routes/api/v1/phosphors/+server';
import * as phosphorSpectrum from '../../../src/routes/api/v1/phosphors/[id]/spectrum/+server';
import * as lots from '../../../src/lib/server/library/lots';
import { STORAGE_UNAVAILABLE } from '../../../src/lib/server/http/outage';
import { call } from '../../routes/api/support';
import { demoUser, gaussianCsv, phosphorFields, removeTestMaterials } from '../library/support';
import type { User } from '../../../src/lib/server/accounts/users';
import { PDFDocument } from 'pdf-lib';

let rhea: User;
const count = async (table: string) => Number((await db()(table).count({ n: '*' }))[0].n);

function event(init: { body?: unknown; raw?: BodyInit; params?: Record<string, string>; query?: string }) {
  const url = new URL(`http://local/api${init.query ?? ''}`);
  const headers: Record<string, string> = init.raw ? {} : { 'content-type': 'application/json' };
  const body = init.raw ?? JSON.stringify(init.body);
  return {
    request: new Request(url, { method: 'POST', body, headers }),
    url,
    params: init.params ?? {},
    locals: { user: rhea, viaToken: false, denied: null }
  };
}

describe('uploads while the file storage is down', () => {
  beforeAll(async () => {
    await removeTestMaterials();
    rhea = await demoUser('formulator');
  });
  afterAll(async () => {
    await removeTestMaterials();
    await closeDb();
  });

  it('answers a spectrum upload with 503 { error } naming the file storage, logs it, saves nothing', async () => {
    const created = await call(phosphors.POST, event({ body: phosphorFields('TST-S1') }));
    expect(created.status).toBe(201); // the database is up
    const id = String(created.body.id);
    const before = [await count('material_spectra'), await count('stored_files')];
    const log = vi.spyOn(console, 'error').mockImplementation(() => {});
    const form = new FormData();
    form.set('file', new File([gaussianCsv(600, 45)], 'orange.csv', { type: 'text/csv' }));
    const res = await phosphorSpectrum.POST(event({ params: { id }, query: '?kind=emission&version=1', raw: form }) as never);
    expect(res.status).toBe(503);
    expect(res.headers.get('retry-after')).toBe('5');
    const body = await res.json();
    expect(body).toEqual({ error: STORAGE_UNAVAILABLE });
    expect(body.error).not.toMatch(/database/i);
    expect(log.mock.calls.map((c) => c.join(' ')).join('\n')).toMatch(/\[phosforge\] file storage unavailable.*ECONNREFUSED/);
    log.mockRestore();
    expect([await count('material_spectra'), await count('stored_files')]).toEqual(before);
  }, 30_000);

  it('refuses a lot certificate with the same 503 refusal and no lot row', async () => {
    const id = Number((await call(phosphors.POST, event({ body: phosphorFields('TST-S2') }))).body.id);
    const doc = await PDFDocument.create();
    doc.addPage();
    const body = Buffer.from(await doc.save());
    vi.spyOn(console, 'error').mockImplementation(() => {});
    await expect(
      lots.add(
        rhea,
        id,
        { lotNumber: 'LLM-9001', supplier: null, receivedOn: null, expiresOn: null, notes: null },
        { name: 'coa.pdf', body }
      )
    ).rejects.toMatchObject({ status: 503, message: STORAGE_UNAVAILABLE });
    vi.restoreAllMocks();
    expect(await db()('material_lots').where({ material_id: id }).first()).toBeUndefined();
  }, 30_000);
});
