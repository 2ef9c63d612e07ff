/**
 * A measurement file may arrive gzip-compressed (RFC 1952: it starts with 1f 8b): it is unpacked as a stream
 * with node:zlib (createGunzip), refused as soon as the unpacked bytes pass the file limit, and a damaged or
 * cut-off stream is refused — nothing is read from part of a file, so nothing is saved.
 */
import { Readable } from 'node:stream';
import { createGunzip } from 'node:zlib';
import { DomainError, tooLarge, unprocessable } from '../../errors/domain-error';
import { formatBytes } from '../../spectrum-file/parse';

/** Bytes handed to the unpacker (and to the reader, for a plain file) at a time. */
const SLICE = 256 * 1024;

export function isGzip(body: Uint8Array): boolean {
  return body.length >= 2 && body[0] === 0x1f && body[1] === 0x8b;
}

function* slices(body: Uint8Array): Generator<Uint8Array> {
  for (let at = 0; at < body.length; at += SLICE) yield body.subarray(at, Math.min(body.length, at + SLICE));
}

function gzipRefusal(err: unknown, name: string): Error {
  const code = (err as { code?: string }).code;
  return unprocessable(
    `${name} is a damaged or incomplete gzip file (${code ?? (err as Error).message}): it may have been cut off in transfer. ` +
      'Nothing was saved.'
  );
}

/**
 * The file's bytes piece by piece, unpacked as they stream when gzip (never more than `maxBytes` in all);
 * `name` for the messages. A damaged stream throws only at its end, after every piece was handed out, so a
 * caller keeps nothing until the last piece was read.
 */
export async function* unpackedChunks(body: Uint8Array, name: string, maxBytes: number): AsyncGenerator<Uint8Array> {
  if (!isGzip(body)) {
    yield* slices(body);
    return;
  }
  const gunzip = Readable.from(slices(body), { objectMode: false }).pipe(createGunzip());
  let size = 0;
  try {
    for await (const chunk of gunzip as AsyncIterable<Buffer>) {
      size += chunk.length;
      if (size > maxBytes) throw tooLarge(`${name} unpacks to more than ${formatBytes(maxBytes)}, the limit. Nothing was saved.`);
      yield chunk;
    }
  } catch (err) {
    if (err instanceof DomainError) throw err;
    throw gzipRefusal(err, name);
  } finally {
    gunzip.destroy();
  }
}

/** The whole file, unpacked when gzip (streamed through `unpackedChunks`, so the cap holds while unpacking). */
export async function unpackUpload(body: Uint8Array, name: string, maxBytes: number): Promise<Buffer> {
  if (!isGzip(body)) return Buffer.from(body.buffer, body.byteOffset, body.byteLength);
  const parts: Uint8Array[] = [];
  for await (const chunk of unpackedChunks(body, name, maxBytes)) parts.push(chunk);
  return Buffer.concat(parts);
}
