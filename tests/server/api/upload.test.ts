/**
 * The file of an upload request (src/lib/server/api/upload.ts): every way a request can fail to
 * deliver a file is a DomainError with its status, never an exception (which the routes would answer
 * with a 500). Found by the upload fuzz: a multipart body without its boundary, cut short or not
 * form data at all made request.formData() throw a TypeError.
 */
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/lib/errors/domain-error';
import { readUploadedFile } from '../../../src/lib/server/api/upload';

const KIND = { maxBytes: 2 * 1024 * 1024, what: 'spectrum', defaultName: 'spectrum.csv' };
const post = (body: BodyInit, headers: Record<string, string> = {}) =>
  new Request('http://local/upload', { method: 'POST', body, headers });

async function refusal(request: Request): Promise<DomainError> {
  try {
    await readUploadedFile(request, KIND);
  } catch (err) {
    if (err instanceof DomainError) return err;
    throw err;
  }
  throw new Error('expected a refusal');
}

async function multipartBody(): Promise<{ bytes: Uint8Array; type: string }> {
  const form = new FormData();
  form.set('file', new File(['400,1\n410,2\n'], 'kh-export.csv', { type: 'text/csv' }));
  const framed = new Response(form);
  return { bytes: new Uint8Array(await framed.arrayBuffer()), type: framed.headers.get('content-type')! };
}

describe('readUploadedFile', () => {
  it('reads the multipart field "file" and a raw text body', async () => {
    const form = new FormData();
    form.set('file', new File(['400,1\n'], 'kh-export.csv', { type: 'text/csv' }));
    expect(await readUploadedFile(post(form), KIND)).toMatchObject({ name: 'kh-export.csv', contentType: 'text/csv' });
    const raw = await readUploadedFile(post('400,1\n', { 'content-type': 'text/plain; charset=utf-8' }), KIND);
    expect(raw).toMatchObject({ name: 'spectrum.csv', contentType: 'text/plain' });
    expect(raw.body.toString()).toBe('400,1\n');
  });

  it('a broken multipart body is a 400, whatever is wrong with it', async () => {
    const { bytes, type } = await multipartBody();
    const broken = [
      post(bytes.slice(), { 'content-type': 'multipart/form-data' }), // no boundary
      post(bytes.slice(), { 'content-type': 'multipart/form-data; boundary=not-the-boundary' }),
      post(bytes.slice(0, 60), { 'content-type': type }), // cut short
      post('hello', { 'content-type': type })
    ];
    for (const request of broken) {
      const e = await refusal(request);
      expect(e.status).toBe(400);
      expect(e.message).toMatch(/multipart body could not be read/);
    }
  });

  it('no file in the field is a 400, an oversized declared length a 413, another type a 415', async () => {
    const form = new FormData();
    form.set('file', 'text, not a file');
    expect((await refusal(post(form))).message).toBe('Send the spectrum file in the multipart field "file".');
    expect((await refusal(post('400,1', { 'content-type': 'text/csv', 'content-length': String(3 * 1024 * 1024) }))).status).toBe(413);
    expect((await refusal(post('{}', { 'content-type': 'application/json' }))).status).toBe(415);
  });

  it('a raw body without a length is refused as soon as it streams past the limit, reading no further', async () => {
    let pulled = 0;
    const chunk = new Uint8Array(256 * 1024).fill(0x31);
    // An endless body (chunked transfer, no content-length): the reader must stop just past 2 MB.
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        pulled++;
        controller.enqueue(chunk);
      }
    });
    const request = new Request('http://local/upload', {
      method: 'POST',
      body,
      headers: { 'content-type': 'text/csv' },
      duplex: 'half'
    } as RequestInit);
    const err = await refusal(request);
    expect(err.status).toBe(413);
    expect(pulled).toBeLessThanOrEqual(10); // 2 MB / 256 kB = 8 chunks, and one past the limit
  });
});
