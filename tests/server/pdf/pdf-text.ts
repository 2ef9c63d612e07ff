/** Text of a PDF through poppler's pdftotext (installed with poppler-utils), layout kept. */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** Layout mode keeps table rows on one line; reading order (layout = false) keeps each cell's text together. */
export function pdfToText(pdf: Buffer, layout = true): string {
  const dir = mkdtempSync(join(tmpdir(), 'pf-pdf-'));
  const file = join(dir, 'doc.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', [...(layout ? ['-layout'] : []), file, '-'], { encoding: 'utf8' });
}

export function pdfInfo(pdf: Buffer): { pages: number; size: string; fonts: string } {
  const dir = mkdtempSync(join(tmpdir(), 'pf-pdf-'));
  const file = join(dir, 'doc.pdf');
  writeFileSync(file, pdf);
  const info = execFileSync('pdfinfo', [file], { encoding: 'utf8' });
  return {
    pages: Number(/Pages:\s+(\d+)/.exec(info)?.[1] ?? 0),
    size: /Page size:\s+(.*)/.exec(info)?.[1] ?? '',
    fonts: execFileSync('pdffonts', [file], { encoding: 'utf8' })
  };
}
