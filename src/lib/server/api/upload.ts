/**
 * The file of an upload request: multipart field `file`, or the raw body (text/csv, text/plain,
 * text/tab-separated-values) named by the `x-file-name` header. Every way a request can fail to
 * deliver a file is a domain error: declared size over the limit (413), a multipart body that cannot
 * be read — no boundary, truncated, garbage — or no file in the field (400), another type (415).
 */
import { invalid, tooLarge, unsupportedType } from '../../errors/domain-error';
import { assertPlainFileName } from '../storage/objects';

export interface UploadedFile {
  name: string;
  contentType: string;
  body: Buffer;
}

export interface UploadKind {
  /** Most bytes of the file itself; the request may carry 64 kB of multipart framing more. */
  maxBytes: number;
  /** What the file holds, in messages: "spectrum", "measurement". */
  what: string;
  /** Name used when the request gives none. */
  defaultName: string;
  /** Also take an application/gzip body (the caller unpacks it). */
  gzip?: boolean;
}

const FRAMING_BYTES = 64 * 1024;

async function formFile(request: Request, kind: UploadKind): Promise<UploadedFile> {
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw invalid(
      `The multipart body could not be read (no boundary, truncated or not form data). ` +
        `Send the ${kind.what} file in the multipart field "file". Nothing was saved.`
    );
  }
  const file = form.get('file');
  if (!(file instanceof File)) throw invalid(`Send the ${kind.what} file in the multipart field "file".`);
  return { name: file.name || kind.defaultName, contentType: file.type || 'text/plain', body: Buffer.from(await file.arrayBuffer()) };
}

/**
 * A raw body read as it streams in, refused as soon as it passes the limit (a body sent without a length, or
 * longer than it said, is not held in memory to the end).
 */
async function streamedBody(request: Request, kind: UploadKind): Promise<Buffer> {
  if (!request.body) return Buffer.alloc(0);
  const chunks: Uint8Array[] = [];
  let size = 0;
  const reader = request.body.getReader();
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > kind.maxBytes) {
      await reader.cancel().catch(() => undefined);
      const mb = Number((kind.maxBytes / 1024 / 1024).toFixed(1));
      throw tooLarge(`The upload is larger than the ${mb} MB limit for ${kind.what} files. Nothing was saved.`);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks, size);
}

/** The file's name must be plain text: a control or text-direction character would disguise it. */
function plainName(file: UploadedFile): UploadedFile {
  assertPlainFileName(file.name);
  return file;
}

export async function readUploadedFile(request: Request, kind: UploadKind): Promise<UploadedFile> {
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > kind.maxBytes + FRAMING_BYTES) {
    const mb = Number((kind.maxBytes / 1024 / 1024).toFixed(1));
    throw tooLarge(`The upload is larger than the ${mb} MB limit for ${kind.what} files. Nothing was saved.`);
  }
  const type = request.headers.get('content-type') ?? '';
  if (/^multipart\/form-data/i.test(type)) return plainName(await formFile(request, kind));
  if (/^text\/(csv|plain|tab-separated-values)\b/i.test(type) || (kind.gzip && /^application\/(x-)?gzip\b/i.test(type))) {
    return plainName({
      name: request.headers.get('x-file-name')?.slice(0, 200) || kind.defaultName,
      contentType: type.split(';')[0],
      body: await streamedBody(request, kind)
    });
  }
  throw unsupportedType(
    `Send the ${kind.what} file as multipart/form-data (field "file") or as a text/csv or text/plain body` +
      (kind.gzip ? ' (or application/gzip).' : '.')
  );
}
