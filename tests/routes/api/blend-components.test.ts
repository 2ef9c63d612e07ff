import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET } from '../../../src/routes/api/v1/blend-components/+server';
import { db, closeDb } from '../../../src/lib/server/db/index';
import { ensureDemoMaterials } from '../../support/demo-materials';
import { call, fakeUser } from './support';

let ids: Map<string, number>;

function get(query: string, roles: Parameters<typeof fakeUser>[0] | null = ['formulator']) {
  return call(GET, {
    url: new URL(`http://local/api/v1/blend-components?${query}`),
    locals: { user: roles ? fakeUser(roles) : null, viaToken: false, denied: null }
  });
}

describe('GET /api/v1/blend-components', () => {
  beforeAll(async () => {
    ids = await ensureDemoMaterials(db());
  });
  afterAll(closeDb);

  it('answers the pump and phosphors as blend specs, in the order asked', async () => {
    const [pump, rd, gl] = [ids.get('B-450')!, ids.get('RD-625')!, ids.get('GL-530')!];
    const res = await get(`pump=${pump}&phosphors=${rd},${gl}`);
    expect(res.status).toBe(200);
    expect(res.body.pump.id).toBe(String(pump));
    expect(res.body.phosphors.map((p: { id: string }) => p.id)).toEqual([String(rd), String(gl)]);
    expect(res.body.phosphors[0].emission.wavelengths.length).toBeGreaterThan(100);
  });

  it('answers the pump alone', async () => {
    const res = await get(`pump=${ids.get('V-405')}`);
    expect(res.status).toBe(200);
    expect(res.body.phosphors).toEqual([]);
  });

  it('refuses a bad query with 400, an unknown id with 404 and a phosphor in the pump slot with 422', async () => {
    expect((await get('pump=abc&phosphors=1')).status).toBe(400);
    expect((await get(`pump=${ids.get('B-450')}&phosphors=999999`)).status).toBe(404);
    const wrong = await get(`pump=${ids.get('YL-568')}&phosphors=${ids.get('RD-625')}`);
    expect(wrong.status).toBe(422);
    expect(wrong.body.error).toContain('not a pump');
  });

  it('needs a signed-in user', async () => {
    expect((await get(`pump=${ids.get('B-450')}`, null)).status).toBe(401);
  });
});
