import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db/index';
import { GET as list, POST as create } from '../../../src/routes/api/v1/batches/+server';
import { POST as preview } from '../../../src/routes/api/v1/batches/preview/+server';
import { GET as getOne } from '../../../src/routes/api/v1/batches/[id]/+server';
import { POST as recordLine } from '../../../src/routes/api/v1/batches/[id]/lines/[seq]/+server';
import { POST as override } from '../../../src/routes/api/v1/batches/[id]/lines/[seq]/override/+server';
import { GET as ticket } from '../../../src/routes/api/v1/batches/[id]/ticket/+server';
import { POST as complete } from '../../../src/routes/api/v1/batches/[id]/complete/+server';
import { call } from './support';
import { DEMO_PASSWORD, demoUser, makeFixture, request, type Fixture } from '../../server/batches/support';
import type { User } from '../../../src/lib/server/accounts/users';
import { pdfToText } from '../../server/pdf/pdf-text';

let fx: Fixture;
const who: Record<string, User> = {};
beforeAll(async () => {
  fx = await makeFixture();
  for (const k of ['technician', 'quality', 'formulator', 'admin'] as const) who[k] = await demoUser(k);
});
afterAll(closeDb);

function ev(user: User | null, body?: unknown, params: Record<string, string> = {}, query = '') {
  return {
    request: new Request(
      `http://local/api${query}`,
      body === undefined ? {} : { method: 'POST', body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }
    ),
    url: new URL(`http://local/api${query}`),
    params,
    locals: { user, viaToken: false, denied: null }
  };
}

describe('/api/v1/batches', () => {
  let id: number;

  it('lets technicians and admins plan a batch, not formulators or quality', async () => {
    for (const role of ['formulator', 'quality'] as const)
      expect((await call(create, ev(who[role], request(fx.revisionId)))).status).toBe(403);
    const res = await call(create, ev(who.technician, request(fx.revisionId)));
    expect(res.status).toBe(201);
    id = res.body.id;
    expect((await call(create, ev(who.admin, request(fx.revisionId)))).status).toBe(201);
  });

  it('answers 400 with the field for a malformed body, 422 for an impossible batch', async () => {
    const bad = await call(create, ev(who.technician, { ...request(fx.revisionId), balance: { resolutionG: -1, minWeightG: 0 } }));
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].path).toBe('balance.resolutionG');
    const tooCoarse = await call(create, ev(who.technician, { ...request(fx.revisionId), balance: { resolutionG: 0.01, minWeightG: 0 } }));
    expect(tooCoarse.status).toBe(422);
    expect(tooCoarse.body.error).toMatch(/finer than the balance resolution/);
  });

  it('previews a plan for any role without saving', async () => {
    const res = await call(preview, ev(who.formulator, request(fx.revisionId)));
    expect(res.status).toBe(200);
    expect(res.body.plan.lines.map((l: { targetG: string }) => l.targetG)).toEqual(['8.227', '0.700', '0.250', '0.823']);
  });

  it('lists and gets batches for every role', async () => {
    const l = await call(list, ev(who.formulator, undefined, {}, `?q=BT-&state=planned`));
    expect(l.status).toBe(200);
    expect(l.body.items.some((b: { id: number }) => b.id === id)).toBe(true);
    const one = await call(getOne, ev(who.quality, undefined, { id: String(id) }));
    expect(one.body.lines).toHaveLength(4);
    expect((await call(getOne, ev(who.quality, undefined, { id: '999999' }))).status).toBe(404);
    expect((await call(list, ev(who.quality, undefined, {}, '?state=lost'))).status).toBe(400);
  });

  it('records lines (technicians only), flags out-of-range, and needs quality to accept', async () => {
    const one = (await call(getOne, ev(who.technician, undefined, { id: String(id) }))).body;
    const rec = (seq: number, actualG: string, lotNumber: string, u = who.technician) =>
      call(recordLine, ev(u, { actualG, lotNumber, version: one.lines[seq - 1].version }, { id: String(id), seq: String(seq) }));
    expect((await rec(1, '8.227', 'BS-A-1', who.quality)).status).toBe(403);
    expect((await rec(1, '8.227', 'BS-A-1', who.formulator)).status).toBe(403);
    expect((await rec(1, '8.227', 'BS-A-1')).body.status).toBe('in');
    const unknownLot = await rec(2, '0.700', 'NOT-A-LOT');
    expect(unknownLot.status).toBe(400);
    expect(unknownLot.body.error).toMatch(/not a known lot/);
    expect((await rec(2, '0,700', fx.green.lot)).body.status).toBe('in'); // decimal comma from a keyboard wedge
    const high = await rec(3, '0.260', fx.red.lot);
    expect(high.body).toMatchObject({ status: 'above', deviationG: '0.01' });
    expect((await rec(4, '0.823', 'BS-B-1')).body.status).toBe('in');
    const v3 = (await call(getOne, ev(who.technician, undefined, { id: String(id) }))).body.lines[2].version;
    const body = { reason: 'Accepted: inside the colour window.', password: DEMO_PASSWORD, version: v3 };
    expect((await call(override, ev(who.technician, body, { id: String(id), seq: '3' }))).status).toBe(403);
    expect((await call(override, ev(who.quality, body, { id: String(id), seq: '3' }))).status).toBe(200);
    const stale = await call(complete, ev(who.technician, { version: 1 }, { id: String(id) }));
    expect(stale.status).toBe(409);
  });

  it('downloads the ticket PDF on A4 or Letter; refuses other paper', async () => {
    const res = await ticket(ev(who.formulator, undefined, { id: String(id) }, '?paper=LETTER') as never);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    const text = pdfToText(Buffer.from(await res.arrayBuffer()));
    expect(text).toContain('Weigh-out ticket');
    expect(text).toContain(fx.green.code);
    expect((await call(ticket, ev(who.formulator, undefined, { id: String(id) }, '?paper=A3'))).status).toBe(400);
  });
});
