/** A pdfkit document on A4 or US Letter with Plex embedded, rendered to a Buffer. */
import PDFDocument from 'pdfkit';
import { registerPlex } from './fonts';

import type { PaperSize } from '../../batches/weighout/paper';

export type { PaperSize } from '../../batches/weighout/paper';

export function newDocument(size: PaperSize, info: { title: string; subject: string; author: string }): PDFKit.PDFDocument {
  const doc = new PDFDocument({
    size,
    margins: { top: 40, bottom: 48, left: 40, right: 40 },
    bufferPages: true,
    info: { Title: info.title, Subject: info.subject, Author: info.author, Creator: 'Phosforge' }
  });
  registerPlex(doc);
  return doc;
}

/** Ends the document and resolves with its bytes. */
export function renderToBuffer(doc: PDFKit.PDFDocument): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}

/** "2026-12-02 14:05 UTC" (or the plant's time zone when given). */
export function formatStamp(d: Date | null, timeZone = 'UTC'): string {
  if (!d) return '—';
  const parts = new Intl.DateTimeFormat('en-CA', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23'
  }).formatToParts(d);
  const p = (t: string) => parts.find((x) => x.type === t)?.value ?? '';
  return `${p('year')}-${p('month')}-${p('day')} ${p('hour')}:${p('minute')} ${timeZone === 'UTC' ? 'UTC' : timeZone}`;
}
