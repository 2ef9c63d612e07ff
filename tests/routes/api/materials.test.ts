import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as phosphors from '../../../src/routes/api/v1/phosphors/+server';
import * as phosphor from '../../../src/routes/api/v1/phosphors/[id]/+server';
import * as phosphorSpectrum from '../../../src/routes/api/v1/phosphors/[id]/spectrum/+server';
import * as pump from '../../../src/routes/api/v1/pumps/[id]/+server';
import { call } from './support';
import { demoUser, gaussianCsv, phosphorFields, removeTestMaterials } from '../../server/library/support';
import type { Role } from '../../../src/lib/roles';
import type { User } from '../../../src/lib/server/accounts/users';

const people = new Map<Role, User>();

function event(
  role: Role,
  init: {
    method?: string;
    body?: unknown;
    params?: Record<string, string>;
    query?: string;
    headers?: Record<string, string>;
    raw?: BodyInit;
  } = {}
) {
  const url = new URL(`http://local/api${init.query ?? ''}`);
  const body = init.raw ?? (init.body === undefined ? undefined : JSON.stringify(init.body));
  const headers = init.raw ? (init.headers ?? {}) : { 'content-type': 'application/json', ...(init.headers ?? {}) };
  return {
    request: new Request(url, { method: init.method ?? (body ? 'POST' : 'GET'), body, headers }),
    url,
    params: init.params ?? {},
    locals: { user: people.get(role)!, viaToken: false, denied: null }
  };
}

describe('/api/v1/phosphors and /api/v1/pumps', () => {
  beforeAll(async () => {
    await removeTestMaterials();
    for (const r of ['formulator', 'technician', 'quality', 'admin'] as const) people.set(r, await demoUser(r));
  });
  afterAll(async () => {
    await removeTestMaterials();
    if (await db().schema.hasTable('probe_formulation_revisions')) await db().schema.dropTable('probe_formulation_revisions');
    await closeDb();
  });

  it('lists the seeded phosphors for every role, with search and sort', async () => {
    for (const role of ['technician', 'quality'] as const) {
      const r = await call(phosphors.GET, event(role, { query: '?q=garnet&sort=peakNm&dir=desc' }));
      expect(r.status).toBe(200);
      // Other test files leave their own probe materials behind; only the demo seed's are judged here.
      const seeded = new Set(['YL-568', 'YG-555', 'GL-530']);
      const codes = r.body.items.map((m: { code: string }) => m.code).filter((c: string) => seeded.has(c));
      expect(codes).toEqual(['YL-568', 'YG-555', 'GL-530']); // the three garnets of the demo seed, longest peak first
    }
  });

  it('lets formulators and admins create, and refuses technicians and quality (403)', async () => {
    for (const role of ['technician', 'quality'] as const) {
      const r = await call(phosphors.POST, event(role, { body: phosphorFields('TST-A0') }));
      expect(r.status).toBe(403);
    }
    expect(await db()('materials').where({ code: 'TST-A0' }).first()).toBeUndefined();
    const r = await call(phosphors.POST, event('formulator', { body: phosphorFields('TST-A1') }));
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ code: 'TST-A1', kind: 'phosphor', version: 1, emission: null });
  });

  it('answers 400 with the field named for an invalid body', async () => {
    const r = await call(phosphors.POST, event('formulator', { body: { ...phosphorFields('TST-A2'), iqe: 1.7 } }));
    expect(r.status).toBe(400);
    expect(r.body.error).toMatch(/IQE must be 0\.01–1/);
  });

  it('edits with the version read, and answers 409 to a stale edit', async () => {
    const created = await call(phosphors.POST, event('formulator', { body: phosphorFields('TST-A3') }));
    const id = String(created.body.id);
    const ok = await call(phosphor.PUT, event('admin', { method: 'PUT', params: { id }, body: { version: 1, costPerKg: 175 } }));
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ version: 2, costPerKg: 175, iqe: 0.9 });
    const stale = await call(phosphor.PUT, event('formulator', { method: 'PUT', params: { id }, body: { version: 1, costPerKg: 1 } }));
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatch(/changed by someone else/);
    expect((await call(phosphor.GET, event('quality', { params: { id } }))).body.costPerKg).toBe(175);
    const tech = await call(phosphor.PUT, event('technician', { method: 'PUT', params: { id }, body: { version: 2, costPerKg: 1 } }));
    expect(tech.status).toBe(403);
  });

  it('does not serve a pump under /phosphors (404)', async () => {
    const b450 = (await db()('materials').where({ code: 'B-450' }).first('id'))!;
    expect((await call(phosphor.GET, event('formulator', { params: { id: String(b450.id) } }))).status).toBe(404);
    const r = await call(pump.GET, event('technician', { params: { id: String(b450.id) } }));
    expect(r.status).toBe(200);
    expect(r.body.metrics.peakNm).toBeCloseTo(450, 0); // the seeded chip peaks at 450 nm (split Gaussian, DEMO_PUMPS)
  });

  it('uploads a spectrum as CSV body and as multipart, and checks without saving on dryRun', async () => {
    const created = await call(phosphors.POST, event('formulator', { body: phosphorFields('TST-A4') }));
    const id = String(created.body.id);
    const dry = await call(
      phosphorSpectrum.POST,
      event('formulator', { params: { id }, query: '?dryRun=1', raw: gaussianCsv(600, 45), headers: { 'content-type': 'text/csv' } })
    );
    expect(dry.status).toBe(200);
    expect(dry.body).toMatchObject({ saved: false, points: 81 });
    expect((await db()('material_spectra').where({ material_id: Number(id) })).length).toBe(0);
    // A yellow band exported over 540–580 nm only: refused, naming where it is cut off; nothing saved.
    const band = [
      'wavelength,intensity',
      ...Array.from({ length: 41 }, (_, i) => 540 + i).map((l) => `${l},${Math.exp(-(((l - 560) / 60) ** 2)).toFixed(4)}`)
    ];
    const cut = await call(
      phosphorSpectrum.POST,
      event('formulator', {
        params: { id },
        query: '?kind=emission&version=1',
        raw: band.join('\n'),
        headers: { 'content-type': 'text/csv' }
      })
    );
    expect(cut.status).toBe(422);
    expect(cut.body.error).toMatch(/emission is cut off at 540 nm .* and at 580 nm .*380–780 nm/);
    expect((await db()('material_spectra').where({ material_id: Number(id) })).length).toBe(0);
    const form = new FormData();
    form.set('file', new File([gaussianCsv(600, 45)], 'orange.csv', { type: 'text/csv' }));
    const saved = await call(phosphorSpectrum.POST, event('formulator', { params: { id }, query: '?kind=emission&version=1', raw: form }));
    expect(saved.status).toBe(201);
    expect(saved.body).toMatchObject({ saved: true, version: 2 });
    expect(saved.body.metrics.peakNm).toBeCloseTo(600, 1);
    const bad = await call(
      phosphorSpectrum.POST,
      event('formulator', { params: { id }, raw: 'wavelength,intensity\n400,1\n390,1\n', headers: { 'content-type': 'text/csv' } })
    );
    expect(bad.status).toBe(422);
    expect(bad.body.issues[0]).toEqual({
      path: 'line 3',
      line: 3,
      message: 'Line 3: wavelength 390 nm is lower than 400 nm on line 2; wavelengths must increase.'
    });
    const tech = await call(
      phosphorSpectrum.POST,
      event('technician', { params: { id }, raw: gaussianCsv(), headers: { 'content-type': 'text/csv' } })
    );
    expect(tech.status).toBe(403);
  });

  it('deletes an unused material (204) and answers 404 for one that does not exist', async () => {
    const created = await call(phosphors.POST, event('formulator', { body: phosphorFields('TST-A5') }));
    const id = String(created.body.id);
    expect((await call(phosphor.DELETE, event('technician', { method: 'DELETE', params: { id } }))).status).toBe(403);
    const r = await phosphor.DELETE(event('formulator', { method: 'DELETE', params: { id } }) as never);
    expect(r.status).toBe(204);
    expect(
      await db()('materials')
        .where({ id: Number(id) })
        .first()
    ).toBeUndefined();
    expect((await call(phosphor.DELETE, event('formulator', { method: 'DELETE', params: { id: '999999' } }))).status).toBe(404);
  });
});
