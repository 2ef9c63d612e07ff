/**
 * Page form actions read their bodies through readForm: a body that cannot be read as a form is a
 * 400 with a plain message, never an exception (500). A scan of the source keeps it that way.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readForm, UNREADABLE_FORM } from '../../../src/lib/server/forms/read-form';

function broken(body: string, type = 'multipart/form-data; boundary=XYZ'): Request {
  return new Request('http://local/form', { method: 'POST', headers: { 'content-type': type }, body });
}

async function refusal(request: Request): Promise<unknown> {
  try {
    await readForm(request);
  } catch (err) {
    return err;
  }
  throw new Error('readForm accepted a body that is not a form');
}

describe('readForm', () => {
  it('gives the fields of a well-formed urlencoded or multipart body', async () => {
    const url = await readForm(
      new Request('http://local/form', {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
        body: 'name=Amber%20lot&days=30'
      })
    );
    expect(url.get('name')).toBe('Amber lot');
    const fd = new FormData();
    fd.set('file', new File(['380,0.1\n381,0.2\n'], 'spd.csv', { type: 'text/csv' }));
    const multipart = await readForm(new Request('http://local/form', { method: 'POST', body: fd }));
    expect((multipart.get('file') as File).name).toBe('spd.csv');
  });

  it.each([
    [
      'cut off before its closing boundary',
      broken('--XYZ\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\n\r\n380,1\r\n')
    ],
    ['without a boundary', broken('--XYZ\r\n\r\n', 'multipart/form-data')],
    ['with a boundary the body does not use', broken('--OTHER\r\nContent-Disposition: form-data; name="a"\r\n\r\nb\r\n--OTHER--\r\n')],
    ['plain text sent as multipart', broken('not a form at all')],
    ['JSON', broken('{"name":"x"}', 'application/json')]
  ])('answers a body %s with a 400 and a plain message', async (_label, request) => {
    const err = (await refusal(request)) as { status?: number; body?: { message?: string } };
    expect(err.status).toBe(400);
    expect(err.body?.message).toBe(UNREADABLE_FORM);
  });
});

describe('every form body goes through readForm', () => {
  it('no other source file reads a request body as a form', () => {
    const root = join(__dirname, '../../../src');
    const allowed = new Set(['lib/server/forms/read-form.ts', 'lib/server/api/upload.ts']);
    const offenders: string[] = [];
    const walk = (dir: string) => {
      for (const name of readdirSync(dir)) {
        const path = join(dir, name);
        if (statSync(path).isDirectory()) walk(path);
        else if (/\.(ts|svelte)$/.test(name) && /\.formData\(\)/.test(readFileSync(path, 'utf8')) && !allowed.has(relative(root, path)))
          offenders.push(relative(root, path));
      }
    };
    walk(root);
    expect(offenders).toEqual([]);
  });
});
