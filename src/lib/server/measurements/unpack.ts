/**
 * A measurement file may arrive gzip-compressed (RFC 1952: it starts with 1f 8b): it is unpacked with
 * node:zlib, never past the file limit, and a damaged or cut-off stream is refused — nothing is read
 * from part of a file, so nothing is saved.
 */
import { gunzipSync } from 'node:zlib';
import { tooLarge, unprocessable } from '../../errors/domain-error';
import { formatBytes } from '../../spectrum-file/parse';

export function isGzip(body: Buffer): boolean {
  return body.length >= 2 && body[0] === 0x1f && body[1] === 0x8b;
}

/** The file's bytes, unpacked when gzip; `name` and `maxBytes` for the messages and the cap. */
export function unpackUpload(body: Buffer, name: string, maxBytes: number): Buffer {
  if (!isGzip(body)) return body;
  try {
    return gunzipSync(body, { maxOutputLength: maxBytes });
  } catch (err) {
    const code = (err as { code?: string }).code;
    if (code === 'ERR_BUFFER_TOO_LARGE' || (err instanceof RangeError && /length/i.test(err.message)))
      throw tooLarge(`${name} unpacks to more than ${formatBytes(maxBytes)}, the limit. Nothing was saved.`);
    throw unprocessable(
      `${name} is a damaged or incomplete gzip file (${code ?? (err as Error).message}): it may have been cut off in transfer. ` +
        'Nothing was saved.'
    );
  }
}
