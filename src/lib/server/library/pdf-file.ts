/**
 * Checks that an uploaded document is a PDF within the size limit, by its bytes, not its name: the
 * `%PDF-` header (ISO 32000-1 §7.5.2) and then the whole document parsed (cross-reference, objects,
 * catalogue, page tree) with pdf-lib, so a file that only starts like a PDF (`%PDF-<html>…`) or is
 * cut off is refused before anything is stored.
 */
import { PDFDocument } from 'pdf-lib';
import { MAX_ATTACHMENT_BYTES } from '../../library/schema';
import { formatBytes } from '../../spectrum-file/parse';
import { tooLarge, unprocessable, unsupportedType } from '../../errors/domain-error';

export async function assertPdf(name: string, body: Buffer): Promise<void> {
  if (body.length === 0) throw unprocessable(`${name} is empty.`);
  if (body.length > MAX_ATTACHMENT_BYTES)
    throw tooLarge(`${name} is ${formatBytes(body.length)}; the limit is ${formatBytes(MAX_ATTACHMENT_BYTES)}. Nothing was saved.`);
  const notPdf = `${name} is not a PDF file. Data sheets and certificates are accepted as PDF. Nothing was saved.`;
  if (body.subarray(0, 5).toString('latin1') !== '%PDF-') throw unsupportedType(notPdf);
  let pages: number;
  try {
    const doc = await PDFDocument.load(body, { ignoreEncryption: true, updateMetadata: false, throwOnInvalidObject: true });
    pages = doc.getPageCount();
  } catch {
    throw unsupportedType(
      `${name} starts like a PDF but cannot be read as one (damaged, cut off or another kind of file). Nothing was saved.`
    );
  }
  if (pages < 1) throw unsupportedType(`${name} is a PDF without pages. Nothing was saved.`);
}
