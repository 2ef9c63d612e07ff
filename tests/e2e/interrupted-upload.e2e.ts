import type { Knex } from 'knex';
import { test, expect, type APIRequestContext } from '@playwright/test';
import http from 'node:http';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { BASE, makeUser, testDb } from './support/accounts';
import { createApiToken, tokenContext } from './support/tokens';

// A spectrum upload whose connection drops in the middle of the body stores nothing: no
// stored_files row, no material_spectra row, no object in storage, the material's version
// unchanged; the app keeps answering, and a stalled upload blocks nobody's edit of the material.
const USER = { email: 'upload.cut@kestrelhollow.example', password: 'upload-cut-password-1' };
const run = Date.now().toString(36);
let token = '';
let api: APIRequestContext;
let materialId = 0;

/** A Gaussian band every 0.5 nm over 380–780 nm (801 lines, ~16 kB), so "half the body" is many packets. */
function spectrumCsv(centreNm = 600, w = 35): string {
  const lines = ['wavelength_nm,relative_intensity'];
  for (let i = 0; i <= 800; i++) {
    const l = 380 + i / 2;
    lines.push(`${l.toFixed(1)},${Math.exp(-(((l - centreNm) / w) ** 2)).toFixed(6)}`);
  }
  return lines.join('\n');
}

function multipart(fileName: string, text: string): { body: Buffer; type: string } {
  const boundary = `----phosforge-test-${run}`;
  const body = Buffer.concat([
    Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="${fileName}"\r\nContent-Type: text/csv\r\n\r\n`),
    Buffer.from(text),
    Buffer.from(`\r\n--${boundary}--\r\n`)
  ]);
  return { body, type: `multipart/form-data; boundary=${boundary}` };
}

/**
 * Starts the upload with its full Content-Length, waits for the server's "100 Continue" (the app
 * has the request), sends only `sendBytes` of the body, calls `whileStalled`, then cuts the connection.
 */
function cutUpload(
  path: string,
  upload: { body: Buffer; type: string },
  sendBytes: number,
  whileStalled: () => Promise<void>
): Promise<void> {
  return new Promise((resolve, reject) => {
    const url = new URL(path, BASE);
    const req = http.request(url, {
      method: 'POST',
      headers: {
        authorization: `Bearer ${token}`,
        origin: BASE,
        'content-type': upload.type,
        'content-length': String(upload.body.length),
        expect: '100-continue'
      }
    });
    let cut = false;
    req.on('response', (res) => reject(new Error(`the app answered ${res.statusCode} before the body was complete`)));
    req.on('error', (err) => {
      if (!cut) reject(err);
    });
    req.on('continue', () => {
      req.write(upload.body.subarray(0, sendBytes), () => {
        whileStalled().then(() => {
          cut = true;
          req.destroy();
          resolve();
        }, reject);
      });
    });
    req.flushHeaders();
  });
}

async function storedState() {
  const knex = testDb();
  try {
    const count = async <T extends object>(q: Knex.QueryBuilder<T>) =>
      Number(((await q.count({ n: '*' }).first()) as { n: number | string }).n);
    return {
      files: await count(knex('stored_files').where({ entity_type: 'material', entity_id: String(materialId) })),
      cutFiles: await count(knex('stored_files').where('original_name', 'like', `cut-${run}-%`)),
      spectra: await count(knex('material_spectra').where({ material_id: materialId })),
      version: Number((await knex('materials').where({ id: materialId }).first('version'))!.version)
    };
  } finally {
    await knex.destroy();
  }
}

/** Object keys in the (shared) bucket holding this run's cut file names. */
async function cutObjects(): Promise<string[]> {
  const s3 = new S3Client({
    region: process.env.S3_REGION ?? 'us-east-1',
    endpoint: process.env.S3_ENDPOINT ?? 'http://127.0.0.1:4570',
    forcePathStyle: (process.env.S3_FORCE_PATH_STYLE ?? 'true') === 'true',
    credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID ?? 'S3RVER', secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? 'S3RVER' }
  });
  const found: string[] = [];
  let next: string | undefined;
  try {
    do {
      const page = await s3.send(
        new ListObjectsV2Command({
          Bucket: process.env.S3_BUCKET ?? 'phosforge-files',
          Prefix: 'spectrum-source/',
          ContinuationToken: next
        })
      );
      for (const o of page.Contents ?? []) if (o.Key?.includes(`cut-${run}-`)) found.push(o.Key);
      next = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (next);
  } finally {
    s3.destroy();
  }
  return found;
}

test.beforeAll(async () => {
  await makeUser(USER.email, ['formulator'], USER.password);
  token = await createApiToken(USER.email, USER.password, 'interrupted-upload');
  api = await tokenContext(BASE, token);
  const res = await api.post('/api/v1/phosphors', {
    data: { code: `CUT-${run.toUpperCase()}`, name: 'Interrupted-upload test nitride', iqe: 0.88 }
  });
  expect(res.status(), await res.text()).toBe(201);
  materialId = (await res.json()).id;
});

test.afterAll(async () => {
  if (materialId) await api.delete(`/api/v1/phosphors/${materialId}`);
  await api?.dispose();
});

test('an upload cut off mid-body stores nothing, blocks no edit, and the app keeps answering', async () => {
  const text = spectrumCsv();
  const path = `/api/v1/phosphors/${materialId}/spectrum?kind=emission`;
  const before = await storedState();
  expect(before).toMatchObject({ files: 0, cutFiles: 0, spectra: 0, version: 1 });

  // Cut at half the body, then one byte short of the end (the closing boundary incomplete). The
  // cut uploads name no version, so had the app saved a partial body nothing would have refused it.
  let version = before.version;
  for (const [label, fraction] of [
    ['half', 0.5],
    ['all but the last byte', -1]
  ] as const) {
    const upload = multipart(`cut-${run}-${label.replace(/\W+/g, '-')}.csv`, text);
    const sendBytes = fraction < 0 ? upload.body.length - 1 : Math.floor(upload.body.length * fraction);
    await cutUpload(path, upload, sendBytes, async () => {
      // While the upload hangs, the same material can be edited (no row lock is held yet) and the app answers.
      const t0 = Date.now();
      const edit = await api.put(`/api/v1/phosphors/${materialId}`, { data: { version, notes: `edited while an upload hung (${label})` } });
      expect(edit.status(), await edit.text()).toBe(200);
      console.log(
        `interrupted upload (${label}, ${sendBytes} of ${upload.body.length} bytes ` +
          `sent): an edit of the same material answered in ${Date.now() - t0} ms`
      );
      version += 1;
    });
  }

  // The app still answers, and the upload then goes through in full with the current version.
  const health = await api.get('/api/health');
  expect(health.status()).toBe(200);
  const ok = await api.post(`${path}&version=${version}`, {
    multipart: { file: { name: `whole-${run}.csv`, mimeType: 'text/csv', buffer: Buffer.from(text) } }
  });
  expect(ok.status(), await ok.text()).toBe(201);
  expect(await ok.json()).toMatchObject({ saved: true, version: version + 1, points: 801 });

  // Only the complete upload left anything: one file row, one spectrum, and no object or row of a cut upload.
  expect(await storedState()).toEqual({ files: 1, cutFiles: 0, spectra: 1, version: version + 1 });
  expect(await cutObjects()).toEqual([]);
});
