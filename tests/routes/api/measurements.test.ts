import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db/index';
import { GET, POST } from '../../../src/routes/api/v1/measurements/[batchId]/+server';
import { POST as DISPOSE } from '../../../src/routes/api/v1/measurements/[batchId]/disposition/+server';
import { PUT as ACCEPT } from '../../../src/routes/api/v1/measurements/[batchId]/acceptance/+server';
import type { User } from '../../../src/lib/server/accounts/users';
import { call } from './support';
import { completedBatch, demoUser, DEMO_PASSWORD, partsCsv } from '../../server/measurements/support';

let quality: User;
let tech: User;
let b: { batchId: number; batchNumber: string; revisionId: number };
let csv: string;

function event(user: User | null, init: RequestInit & { path?: string } = {}, batchId = b.batchId) {
  const url = `http://local/api/v1/measurements/${batchId}${init.path ?? ''}`;
  return {
    request: new Request(url, init),
    url: new URL(url),
    params: { batchId: String(batchId) },
    locals: { user, viaToken: false, denied: null }
  };
}
const multipart = (text: string, name = 'export.csv') => {
  const fd = new FormData();
  fd.set('file', new File([text], name, { type: 'text/csv' }));
  return fd;
};

beforeAll(async () => {
  [quality, tech] = await Promise.all([demoUser('quality'), demoUser('technician')]);
  b = await completedBatch();
  csv = await partsCsv(b.revisionId, 6, `A${b.batchId}`);
});
afterAll(closeDb);

describe('POST /api/v1/measurements/{batchId} (upload)', () => {
  it('refuses a technician (403) and an unknown batch (404)', async () => {
    expect((await call(POST, event(tech, { method: 'POST', body: multipart(csv) }))).status).toBe(403);
    expect((await call(POST, event(quality, { method: 'POST', body: multipart(csv) }, 999999))).status).toBe(404);
  });

  it('a bad line is a 422 naming the line', async () => {
    const bad = csv.replace(/A\d+-/g, 'X-').split('\n');
    bad[3] = '382,1,2';
    const res = await call(POST, event(quality, { method: 'POST', body: multipart(bad.join('\n')) }));
    expect(res.status).toBe(422);
    expect(res.body.issues[0].line).toBe(4);
  });

  it('streams progress as NDJSON and ends with the result', async () => {
    const res = await POST(event(quality, { method: 'POST', body: multipart(csv), headers: { accept: 'application/x-ndjson' } }) as never);
    expect(res.headers.get('content-type')).toMatch(/application\/x-ndjson/);
    const lines = (await res.text())
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l));
    expect(lines[0]).toEqual({ type: 'progress', phase: 'parsing' });
    expect(lines.some((l) => l.phase === 'measuring' && l.done === 6 && l.total === 6)).toBe(true);
    expect(lines.at(-1)).toMatchObject({ type: 'done', status: 201, result: { parts: 6 } });
  });

  it('a refusal after streaming started is the last line, with its status', async () => {
    const res = await POST(event(quality, { method: 'POST', body: multipart(csv), headers: { accept: 'application/x-ndjson' } }) as never);
    const last = JSON.parse((await res.text()).trim().split('\n').at(-1)!);
    expect(last).toMatchObject({ type: 'error', status: 409 });
  });
});

describe('GET /api/v1/measurements/{batchId}', () => {
  it('any role reads the results', async () => {
    const res = await call(GET, event(tech));
    expect(res.status).toBe(200);
    expect(res.body.parts).toHaveLength(6);
    expect(res.body.summary.parts).toBe(6);
    expect(res.body.plot.parts).toHaveLength(6);
    expect(res.body.partsPage).toMatchObject({ matched: 6, total: 6, page: 1, pages: 1 });
    expect(res.body.lotStatistics.parts).toBe(6);
  });
  it('pages and sorts the parts on the server; a bad filter is a 400 that names it', async () => {
    const res = await call(GET, event(tech, { path: '?pageSize=10&sort=label&dir=desc&page=1' }));
    expect(res.body.parts.map((p: { label: string }) => p.label)).toEqual(
      [...res.body.parts.map((p: { label: string }) => p.label)].sort().reverse()
    );
    const bad = await call(GET, event(tech, { path: '?stepsMin=abc' }));
    expect(bad.status).toBe(400);
    expect(bad.body.error).toContain('steps from');
  });
});

describe('PUT acceptance and POST disposition validate their bodies', () => {
  it('acceptance: steps out of range is a 400', async () => {
    const res = await call(
      ACCEPT,
      event(quality, {
        method: 'PUT',
        path: '/acceptance',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ mode: 'steps', steps: 12, version: 0 })
      })
    );
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/steps must be 1–7/i);
  });
  it('disposition: a comment and the password are required; a meaning must fit the decision', async () => {
    const body = { decision: 'release', meaning: 'Rejection for rework', comment: '', password: '', version: 1 };
    const res = await call(
      DISPOSE,
      event(quality, { method: 'POST', path: '/disposition', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
    );
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/comment/);
    expect(res.body.error).toMatch(/password/);
  });
  it('disposition by a technician is a 403', async () => {
    const body = {
      decision: 'release',
      meaning: 'Release approval: the batch meets its revision',
      comment: 'ok for me',
      password: DEMO_PASSWORD,
      version: 1
    };
    const res = await call(
      DISPOSE,
      event(tech, { method: 'POST', path: '/disposition', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
    );
    expect(res.status).toBe(403);
  });
});
