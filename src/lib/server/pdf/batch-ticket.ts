/**
 * The printable weigh-out ticket: header with the batch number as Code 128 and QR, the plan
 * (target mass and allowed range per line) with write-in boxes for lot, actual mass, initials and
 * time, process notes, signature lines and the handling caution. A4 or US Letter.
 */
import { code128Png, qrPng } from './barcodes';
import { newDocument, renderToBuffer, type PaperSize } from './document';
import { headerFields, processNotes, stamp, type BatchDoc } from './batch-doc';
import { WEIGHOUT_CAUTION_TITLE, weighoutCautions } from './cautions';
import { MUTED, Sheet } from './sheet';

export async function buildBatchTicket(d: BatchDoc, size: PaperSize = 'A4'): Promise<Buffer> {
  const doc = newDocument(size, {
    title: `Weigh-out ticket ${d.batchNumber}`,
    subject: `${d.formulation.code} revision ${d.formulation.revisionNo}`,
    author: d.createdBy
  });
  const [bar, qr] = await Promise.all([code128Png(d.batchNumber), qrPng(d.batchNumber)]);
  const sheet = new Sheet(doc, (s) => {
    s.put(`Weigh-out ticket ${d.batchNumber} (continued)`, s.left, s.y, s.width, { size: 9, bold: true, color: MUTED });
    s.y += 16;
  });

  const top = sheet.y;
  sheet.put('Phosforge', sheet.left, top, 200, { size: 8, color: MUTED });
  sheet.put('Weigh-out ticket', sheet.left, top + 10, 250, { size: 18, bold: true });
  sheet.put(d.batchNumber, sheet.left, top + 34, 250, { size: 13, bold: true });
  sheet.put(`${d.formulation.code} · revision ${d.formulation.revisionNo} · printed ${stamp(d, new Date())}`, sheet.left, top + 52, 260, {
    size: 8,
    color: MUTED
  });
  const qrSize = 64;
  const barW = 170;
  const qrX = sheet.left + sheet.width - qrSize;
  const barX = qrX - barW - 12;
  doc.image(bar, barX, top + 4, { width: barW, height: 44 });
  sheet.put(d.batchNumber, barX, top + 50, barW, { size: 8, align: 'center' });
  doc.image(qr, qrX, top, { width: qrSize, height: qrSize });
  sheet.y = top + qrSize + 12;

  headerFields(sheet, d);
  sheet.boxed(WEIGHOUT_CAUTION_TITLE, d.cautions ?? weighoutCautions([]), '#9c4309');

  sheet.heading('Lines in weighing order');
  sheet.table(
    [
      { header: '#', width: 3, align: 'right' },
      { header: 'Material', width: 22 },
      { header: 'Supplier lot', width: 14, box: true },
      { header: 'Target g', width: 9, align: 'right' },
      { header: 'Allowed range g', width: 14, align: 'center' },
      { header: 'Actual g', width: 11, box: true },
      { header: 'Initials', width: 7, box: true },
      { header: 'Time', width: 7, box: true }
    ],
    d.lines.map((l) => [
      String(l.seq),
      `${l.code} — ${l.name}${l.loadingLabel ? ` (${l.loadingLabel})` : ''}`,
      '',
      l.targetG,
      `${l.lowG} – ${l.highG}\n${l.toleranceLabel}`,
      '',
      '',
      ''
    ]),
    28
  );
  sheet.paragraph(
    `Total of the targets: ${d.size.batchMassG} g. A reading outside its allowed ` +
      `range must not be corrected silently: record it and ask quality for a decision.`,
    { size: 8, color: MUTED }
  );

  sheet.heading('Mixing, degassing and pot life');
  for (const n of processNotes(d)) sheet.paragraph(n, { size: 8.5, gap: 3 });
  sheet.fields([
    ['Part B mixed in at', '______________'],
    ['Use slurry before', '______________'],
    ['Mixer programme / degas', '______________']
  ]);
  if (d.notes) sheet.paragraph(`Notes: ${d.notes}`, { size: 8.5 });

  sheet.heading('Signatures', 88);
  sheet.signatures(['Prepared by', 'Checked by']);
  sheet.footers(`${d.batchNumber} · ${d.formulation.code} rev. ${d.formulation.revisionNo} · weigh-out ticket`);
  return renderToBuffer(doc);
}
