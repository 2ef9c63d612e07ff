/**
 * IBM Plex Sans for PDFs, embedded from @fontsource/ibm-plex-sans. The package ships WOFF and
 * WOFF2 only (no TTF); pdfkit cannot read WOFF2, so the WOFF files are used, unpacked once to an
 * SFNT (woff.ts) so each PDF does not inflate them again. The files hold the "latin" subset
 * only, so pdfSafe() swaps the few symbols outside it for plain equivalents.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { woffToSfnt } from './woff';

export const FONT = { regular: 'Plex', semibold: 'Plex-SemiBold' } as const;

const require = createRequire(import.meta.url);
let files: { regular: Buffer; semibold: Buffer } | undefined;

function load(weight: 400 | 600): Buffer {
  return woffToSfnt(readFileSync(require.resolve(`@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-${weight}-normal.woff`)));
}

export function registerPlex(doc: PDFKit.PDFDocument): void {
  files ??= { regular: load(400), semibold: load(600) };
  doc.registerFont(FONT.regular, files.regular);
  doc.registerFont(FONT.semibold, files.semibold);
  doc.font(FONT.regular);
}

const REPLACEMENTS: [RegExp, string][] = [
  [/→/g, '->'],
  [/←/g, '<-'],
  [/≥/g, '>='],
  [/≤/g, '<='],
  [/≈/g, '~'],
  [/Δ/g, 'delta '],
  [/≠/g, '!=']
];

/** Text limited to the glyphs of the embedded latin subset. */
export function pdfSafe(text: string): string {
  let out = text;
  for (const [re, to] of REPLACEMENTS) out = out.replace(re, to);
  // Anything else outside the subset (U+0000–00FF, general punctuation, −, €, ™) becomes '?'.
  // eslint-disable-next-line no-control-regex -- U+0000 is the deliberate lower bound of the latin subset range
  return out.replace(/[^\u0000-\u00ff\u0131\u0152\u0153\u2000-\u206f\u20ac\u2122\u2212\u2215]/g, '?');
}
