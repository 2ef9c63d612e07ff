/** Checks that an uploaded document is a PDF within the size limit (by its bytes, not only its name). */
import { MAX_ATTACHMENT_BYTES } from '../../library/schema';
import { formatBytes } from '../../spectrum-file/parse';
import { tooLarge, unprocessable, unsupportedType } from '../../errors/domain-error';

export function assertPdf(name: string, body: Buffer): void {
  if (body.length === 0) throw unprocessable(`${name} is empty.`);
  if (body.length > MAX_ATTACHMENT_BYTES)
    throw tooLarge(`${name} is ${formatBytes(body.length)}; the limit is ${formatBytes(MAX_ATTACHMENT_BYTES)}. Nothing was saved.`);
  if (body.subarray(0, 5).toString('latin1') !== '%PDF-')
    throw unsupportedType(`${name} is not a PDF file. Data sheets and certificates are accepted as PDF. Nothing was saved.`);
}
