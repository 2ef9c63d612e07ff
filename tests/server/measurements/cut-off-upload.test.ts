/**
 * An upload cut off at any byte stores nothing, and a gzip file is accepted whole. A multipart request
 * cut short loses its closing boundary (RFC 7578 / RFC 2046 §5.1.1) and is refused before the file is
 * read; a gzip stream cut short fails its length and CRC trailer (RFC 1952 §2.3.1) and is refused before
 * anything is parsed. Parts are synthetic (invented) parts of the seeded revision.
 */
import { gzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db/index';
import { readUploadedFile } from '../../../src/lib/server/api/upload';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { DomainError } from '../../../src/lib/errors/domain-error';
import type { User } from '../../../src/lib/server/accounts/users';
import { completedBatch, countRows, demoUser, partsCsv } from './support';

let quality: User;
let b: Awaited<ReturnType<typeof completedBatch>>;
let csv: string;

beforeAll(async () => {
  quality = await demoUser('quality');
  b = await completedBatch();
  csv = await partsCsv(b.revisionId, 6, `Z${b.batchId}`);
});
afterAll(closeDb);

const stored = async () => ({
  parts: await countRows('part_measurements', { batch_id: b.batchId }),
  uploads: await countRows('measurement_uploads', { batch_id: b.batchId })
});
const cuts = (length: number, n: number) => Array.from({ length: n }, (_, k) => Math.floor(((k + 1) * length) / (n + 1)));

describe('a cut-off upload stores nothing', () => {
  it('a multipart request cut at any of 40 points is refused before the file is read', async () => {
    const form = new FormData();
    form.set('file', new File([csv], 'sphere.csv', { type: 'text/csv' }));
    const framed = new Response(form);
    const bytes = new Uint8Array(await framed.arrayBuffer());
    const type = framed.headers.get('content-type')!;
    const kind = { maxBytes: 11 * 1024 * 1024, what: 'measurement', defaultName: 'm.csv' };
    for (const at of cuts(bytes.length - 1, 40)) {
      const request = new Request('http://local/up', { method: 'POST', body: bytes.slice(0, at), headers: { 'content-type': type } });
      const refused = await readUploadedFile(request, kind).then(
        () => null,
        (e: unknown) => e
      );
      expect(refused, `cut at byte ${at} of ${bytes.length}`).toBeInstanceOf(DomainError);
    }
  });

  it('a gzip file cut at any of 40 points is refused and saves nothing; the whole file is read', async () => {
    const gz = gzipSync(Buffer.from(csv, 'utf8'));
    const before = await stored();
    for (const at of cuts(gz.length - 1, 40)) {
      await expect(
        uploadMeasurements(quality, b.batchId, { name: 'sphere.csv.gz', contentType: 'application/gzip', body: gz.subarray(0, at) }),
        `cut at byte ${at} of ${gz.length}`
      ).rejects.toThrow(/damaged or incomplete gzip file|is empty/);
    }
    expect(await stored()).toEqual(before);
    const whole = await uploadMeasurements(quality, b.batchId, { name: 'sphere.csv.gz', contentType: 'application/gzip', body: gz });
    expect(whole.parts).toBe(6);
    expect(await stored()).toEqual({ parts: before.parts + 6, uploads: before.uploads + 1 });
  });
});
