/** A table row is as tall as pdfkit lays out its tallest cell, so wrapped text never crosses the row's rule. */
import { describe, expect, it } from 'vitest';
import { newDocument } from '../../../src/lib/server/pdf/document';
import { Sheet } from '../../../src/lib/server/pdf/sheet';
import { FONT } from '../../../src/lib/server/pdf/fonts';

const columns = [
  { header: 'Material', width: 40 },
  { header: 'Allowed range g', width: 14, align: 'center' as const }
];

function tableHeight(rows: string[][]): { height: number; sheet: Sheet; doc: PDFKit.PDFDocument } {
  const doc = newDocument('A4', { title: 't', subject: 's', author: 'a' });
  const sheet = new Sheet(doc);
  const before = sheet.y;
  sheet.table(columns, rows, 16);
  return { height: sheet.y - before, sheet, doc };
}

describe('ticket table rows', () => {
  it('grow with an allowed range that wraps in its column (the "±1 %" line of a ticket)', () => {
    const cell = '1234.567 – 1259.432\n±1 %';
    const empty = tableHeight([]);
    const one = tableHeight([['GL-530 — green garnet (9.3200 wt %)', cell]]);
    const width = (14 / 54) * one.sheet.width - 6;
    // pdfkit's own layout of the cell, as it is written.
    const laidOut = one.doc.font(FONT.regular).fontSize(8.5).heightOfString(cell, { width, align: 'center', lineGap: 1 });
    expect(one.height - empty.height).toBeGreaterThanOrEqual(laidOut + 8 - 1e-9);
    empty.doc.end();
    one.doc.end();
  });
});
