/**
 * Flowing layout on a pdfkit document: a cursor that moves down the page, with headings,
 * label/value grids, ruled tables with write-in boxes, boxed notes and signature lines. Starts a
 * new page (repeating the page header and the table header) when the next block does not fit.
 */
import { FONT, pdfSafe } from './fonts';

export const INK = '#171c27';
export const MUTED = '#58657d';
export const RULE = '#a8b2c3';
const LINE_GAP = 1;
/** Word widths per point of font size, kept across documents (fontkit shaping is the slow part). */
const WORD_WIDTHS = new Map<string, number>();

export interface Column {
  header: string;
  width: number;
  align?: 'left' | 'right' | 'center';
  box?: boolean;
}

export class Sheet {
  y: number;
  constructor(
    readonly doc: PDFKit.PDFDocument,
    private readonly onNewPage: (s: Sheet) => void = () => {}
  ) {
    this.y = doc.page.margins.top;
  }

  get left(): number {
    return this.doc.page.margins.left;
  }
  get width(): number {
    return this.doc.page.width - this.doc.page.margins.left - this.doc.page.margins.right;
  }
  get bottom(): number {
    return this.doc.page.height - this.doc.page.margins.bottom;
  }

  newPage(): void {
    this.doc.addPage();
    this.y = this.doc.page.margins.top;
    this.onNewPage(this);
  }

  ensure(height: number): void {
    if (this.y + height > this.bottom) this.newPage();
  }

  /**
   * Height of wrapped text. pdfkit's heightOfString runs its whole line wrapper (~10 ms a call);
   * this measures words with widthOfString instead, breaking only at spaces — never fewer lines
   * than pdfkit, which may also break at hyphens.
   */
  height(text: string, width: number, size: number, bold = false): number {
    const font = bold ? FONT.semibold : FONT.regular;
    const doc = this.doc.font(font).fontSize(size);
    const measure = (word: string) => {
      const key = `${font}|${word}`;
      let perPt = WORD_WIDTHS.get(key);
      if (perPt === undefined) {
        perPt = doc.widthOfString(word) / size;
        if (WORD_WIDTHS.size > 20_000) WORD_WIDTHS.clear();
        WORD_WIDTHS.set(key, perPt);
      }
      return perPt * size;
    };
    const space = measure(' ');
    let lines = 0;
    for (const para of pdfSafe(text).split('\n')) {
      let used = 0;
      lines++;
      for (const word of para.split(' ')) {
        const w = measure(word);
        if (used > 0 && used + space + w > width) {
          lines++;
          used = 0;
        }
        if (w > width) {
          lines += Math.ceil(w / width) - 1;
          used = w % width;
          continue;
        }
        used += (used > 0 ? space : 0) + w;
      }
    }
    return lines * (doc.currentLineHeight(true) + LINE_GAP);
  }

  /** Height of a table cell as pdfkit lays it out (the estimate above can break lines elsewhere). */
  cellHeight(text: string, width: number, size: number, align: 'left' | 'right' | 'center' = 'left'): number {
    if (text === '') return 0;
    const doc = this.doc.font(FONT.regular).fontSize(size);
    return Math.max(doc.heightOfString(pdfSafe(text), { width, align, lineGap: LINE_GAP }), this.height(text, width, size));
  }

  /** Writes text at (x, y) without moving the cursor; returns its height. */
  put(
    text: string,
    x: number,
    y: number,
    width: number,
    o: { size?: number; bold?: boolean; color?: string; align?: 'left' | 'right' | 'center' } = {}
  ): number {
    const size = o.size ?? 9;
    this.doc
      .font(o.bold ? FONT.semibold : FONT.regular)
      .fontSize(size)
      .fillColor(o.color ?? INK)
      .text(pdfSafe(text), x, y, { width, align: o.align ?? 'left', lineGap: LINE_GAP });
    return this.height(text, width, size, o.bold);
  }

  paragraph(text: string, o: { size?: number; bold?: boolean; color?: string; gap?: number } = {}): void {
    const h = this.height(text, this.width, o.size ?? 9, o.bold);
    this.ensure(h);
    this.put(text, this.left, this.y, this.width, o);
    this.y += h + (o.gap ?? 4);
  }

  /** Section heading; `keepWith` = height of what must follow on the same page. */
  heading(text: string, keepWith = 24): void {
    this.ensure(25 + keepWith);
    this.y += 6;
    this.put(text, this.left, this.y, this.width, { size: 11, bold: true });
    this.y += 16;
    this.doc
      .moveTo(this.left, this.y - 2)
      .lineTo(this.left + this.width, this.y - 2)
      .lineWidth(0.5)
      .strokeColor(RULE)
      .stroke();
    this.y += 3;
  }

  /** Label above value, in `cols` columns. */
  fields(pairs: [string, string][], cols = 3): void {
    const colW = this.width / cols;
    for (let i = 0; i < pairs.length; i += cols) {
      const row = pairs.slice(i, i + cols);
      const h = Math.max(...row.map(([, v]) => this.height(v, colW - 8, 9.5, true))) + 12;
      this.ensure(h);
      row.forEach(([label, value], j) => {
        const x = this.left + j * colW;
        this.put(label, x, this.y, colW - 8, { size: 7.5, color: MUTED });
        this.put(value, x, this.y + 9.5, colW - 8, { size: 9.5, bold: true });
      });
      this.y += h + 4;
    }
  }

  /** A ruled table; columns with `box` get an empty write-in box when the cell is blank. */
  table(columns: Column[], rows: string[][], minRowHeight = 16): void {
    const total = columns.reduce((a, c) => a + c.width, 0);
    const widths = columns.map((c) => (c.width / total) * this.width);
    const header = () => {
      const h = Math.max(...columns.map((c, i) => this.height(c.header, widths[i] - 6, 7.5, true))) + 6;
      this.ensure(h + minRowHeight);
      let x = this.left;
      this.doc.rect(this.left, this.y, this.width, h).fillColor('#e9ecf1').fill();
      columns.forEach((c, i) => {
        this.put(c.header, x + 3, this.y + 3, widths[i] - 6, { size: 7.5, bold: true, align: c.align });
        x += widths[i];
      });
      this.y += h;
    };
    header();
    for (const row of rows) {
      // Cells are measured with pdfkit's own line breaking (the text is written with it), so a range
      // that wraps in a narrow column never runs over the row's rule.
      const h = Math.max(minRowHeight, ...row.map((cell, i) => this.cellHeight(cell, widths[i] - 6, 8.5, columns[i].align) + 8));
      if (this.y + h > this.bottom) {
        this.newPage();
        header();
      }
      let x = this.left;
      row.forEach((cell, i) => {
        const c = columns[i];
        if (c.box && cell === '') {
          this.doc
            .rect(x + 3, this.y + 3, widths[i] - 6, h - 6)
            .lineWidth(0.75)
            .strokeColor(INK)
            .stroke();
        } else {
          this.put(cell, x + 3, this.y + 4, widths[i] - 6, { size: 8.5, align: c.align });
        }
        x += widths[i];
      });
      this.doc
        .moveTo(this.left, this.y + h)
        .lineTo(this.left + this.width, this.y + h)
        .lineWidth(0.4)
        .strokeColor(RULE)
        .stroke();
      this.y += h;
    }
    this.y += 6;
  }

  /** A bordered block with a bold title. */
  boxed(title: string, lines: string[], color = INK): void {
    const inner = this.width - 16;
    const body = lines.reduce((a, l) => a + this.height(l, inner, 8.5) + 2, 0);
    const h = 14 + body + 12;
    this.ensure(h);
    this.doc.rect(this.left, this.y, this.width, h).lineWidth(1.2).strokeColor(color).stroke();
    let y = this.y + 6;
    this.put(title, this.left + 8, y, inner, { size: 9.5, bold: true, color });
    y += 14;
    for (const l of lines) y += this.put(l, this.left + 8, y, inner, { size: 8.5 }) + 2;
    this.y += h + 8;
  }

  /** Signature lines: role, then "Name / signature" and "Date, time" rules. */
  signatures(roles: string[], filled: (string | null)[] = []): void {
    const h = 44;
    this.ensure(h * roles.length);
    roles.forEach((role, i) => {
      const y = this.y;
      this.put(role, this.left, y, 110, { size: 9, bold: true });
      const sigX = this.left + 115;
      const sigW = this.width * 0.5;
      const dateX = sigX + sigW + 15;
      const dateW = this.left + this.width - dateX;
      for (const [x, w, label] of [
        [sigX, sigW, 'Name and signature'],
        [dateX, dateW, 'Date and time']
      ] as const) {
        this.doc
          .moveTo(x, y + 22)
          .lineTo(x + w, y + 22)
          .lineWidth(0.75)
          .strokeColor(INK)
          .stroke();
        this.put(label, x, y + 25, w, { size: 7, color: MUTED });
      }
      const done = filled[i];
      if (done) this.put(done, sigX, y + 8, sigW + dateW, { size: 8.5 });
      this.y += h;
    });
  }

  /** Footer on every page: left text and "page n of m". Call once, at the end. */
  footers(left: string): void {
    const range = this.doc.bufferedPageRange();
    for (let i = range.start; i < range.start + range.count; i++) {
      this.doc.switchToPage(i);
      const bottomMargin = this.doc.page.margins.bottom;
      this.doc.page.margins.bottom = 0;
      const y = this.doc.page.height - 32;
      this.put(left, this.left, y, this.width * 0.7, { size: 7.5, color: MUTED });
      this.put(`Page ${i - range.start + 1} of ${range.count}`, this.left + this.width * 0.7, y, this.width * 0.3, {
        size: 7.5,
        color: MUTED,
        align: 'right'
      });
      this.doc.page.margins.bottom = bottomMargin;
    }
  }
}
