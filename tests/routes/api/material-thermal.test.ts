/**
 * /api/v1/{phosphors,pumps}/:id/thermal over HTTP handlers (real MariaDB): read "not characterised",
 * replace with the version read, refuse a stale or bad body, upload a CSV with line-named errors.
 * Values: a garnet keeping ~92 % at 150 °C, blue InGaN drift 0.04 nm/K [from memory].
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import * as phosphorThermal from '../../../src/routes/api/v1/phosphors/[id]/thermal/+server';
import * as pumpThermal from '../../../src/routes/api/v1/pumps/[id]/thermal/+server';
import * as editing from '../../../src/lib/server/library/editing';
import { call } from './support';
import { demoUser, phosphorFields, removeTestMaterials } from '../../server/library/support';
import type { User } from '../../../src/lib/server/accounts/users';

let rhea: User;
let tomas: User;

const ev = (user: User, id: number, init: { method?: string; body?: unknown; csv?: string; query?: string } = {}) => {
  const url = new URL(`http://local/api/v1/phosphors/${id}/thermal${init.query ?? ''}`);
  const body = init.csv ?? (init.body === undefined ? undefined : JSON.stringify(init.body));
  const headers = { 'content-type': init.csv !== undefined ? 'text/csv' : 'application/json', 'x-file-name': 'quench.csv' };
  return {
    request: new Request(url, { method: init.method ?? 'GET', body, headers }),
    url,
    params: { id: String(id) },
    locals: { user, viaToken: false, denied: null }
  };
};

const GARNET = {
  kind: 'phosphor',
  relativeEmission: [
    { temperatureC: 25, value: 1 },
    { temperatureC: 150, value: 0.92 }
  ]
};

describe('/api/v1/…/:id/thermal', () => {
  beforeAll(async () => {
    await removeTestMaterials();
    rhea = await demoUser('formulator');
    tomas = await demoUser('technician');
  });
  afterAll(async () => {
    await removeTestMaterials();
    await closeDb();
  });

  it('reads "not characterised", replaces with the version read, refuses a stale replacement', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-TA1'));
    const empty = await call(phosphorThermal.GET, ev(tomas, id));
    expect(empty).toMatchObject({ status: 200, body: { characterised: false, thermal: null, version: 0 } });
    const put = await call(
      phosphorThermal.PUT,
      ev(rhea, id, { method: 'PUT', body: { version: 0, thermal: GARNET, source: 'datasheet' } })
    );
    expect(put).toMatchObject({ status: 200, body: { characterised: true, version: 1, source: 'datasheet' } });
    const stale = await call(phosphorThermal.PUT, ev(rhea, id, { method: 'PUT', body: { version: 0, thermal: GARNET } }));
    expect(stale.status).toBe(409);
    expect((await call(phosphorThermal.PUT, ev(tomas, id, { method: 'PUT', body: { version: 1, thermal: GARNET } }))).status).toBe(403);
  });

  it('refuses a bad body (400) and a phosphor id on the pump route (404), saving nothing', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-TA2'));
    const bad = { version: 0, thermal: { ...GARNET, relativeEmission: [{ temperatureC: 25, value: 1 }] } };
    const r = await call(phosphorThermal.PUT, ev(rhea, id, { method: 'PUT', body: bad }));
    expect(r.status).toBe(400);
    expect(JSON.stringify(r.body)).toMatch(/at least two temperatures/);
    expect((await call(pumpThermal.GET, ev(rhea, id))).status).toBe(404);
    expect(await db()('material_thermal').where({ material_id: id }).first()).toBeUndefined();
  });

  it('uploads a CSV, and answers 422 naming the line of a bad one', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-TA3'));
    const bad = await call(phosphorThermal.POST, ev(rhea, id, { method: 'POST', csv: 'temperature_c,relative_emission\n25,1\n85,abc\n' }));
    expect(bad.status).toBe(422);
    expect(bad.body.issues[0]).toMatchObject({ line: 3 });
    const ok = await call(phosphorThermal.POST, ev(rhea, id, { method: 'POST', csv: 'temperature_c,relative_emission\n25,1\n85,0.97\n' }));
    expect(ok).toMatchObject({ status: 201, body: { characterised: true, version: 1, source: 'quench.csv' } });
  });
});
