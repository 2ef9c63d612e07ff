/**
 * One entry for every spectrum upload: an IES TM-27-14 XML document (./tm27) or a CSV/TXT table
 * (./parse.ts; with several parts also one part per row, ./rows.ts), told apart by the document's root
 * element and, for tables, by a wavelength header row. A TM-27 document must state a spectral
 * quantity the upload can use (emitted light for an emission spectrum or a measured part).
 * Pure: no I/O.
 */
import { parseSpectrumFile } from './parse';
import { looksLikeRowSpectra, parseRowSpectra } from './rows';
import { looksLikeTm27, parseTm27, type SpectralQuantity, type Tm27Meta } from './tm27';
import type { ParseOptions, SpectrumFileDialect, SpectrumFileFailed, SpectrumFileOk } from './types';

export type SpectrumUploadOk = Omit<SpectrumFileOk, 'dialect'> & { dialect: SpectrumFileDialect | null; tm27: Tm27Meta | null };
export type SpectrumUploadResult = SpectrumUploadOk | SpectrumFileFailed;

export interface UploadParseOptions extends ParseOptions {
  /** SpectralQuantity values a TM-27 document may state for this upload; any when absent. */
  quantities?: readonly SpectralQuantity[];
}

export function parseSpectrumUpload(text: string, options: UploadParseOptions = {}): SpectrumUploadResult {
  if (!looksLikeTm27(text)) {
    // One part per row (a wavelength header row), or the usual wavelength column with one column per part.
    const table =
      options.multiColumn && looksLikeRowSpectra(text, options.minPoints)
        ? parseRowSpectra(text, options)
        : parseSpectrumFile(text, options);
    return table.ok ? { ...table, tm27: null } : table;
  }
  const doc = parseTm27(text, options);
  if (!doc.ok) return doc;
  const allowed = options.quantities;
  if (allowed) {
    const wrong = doc.tm27.distributions.findIndex((d) => !allowed.includes(d.spectralQuantity));
    if (wrong !== -1)
      return {
        ok: false,
        errors: [
          {
            line: null,
            message:
              `SpectralDistribution ${wrong + 1} holds ${doc.tm27.distributions[wrong].spectralQuantity}; ` +
              `this upload takes ${allowed.join(', ')}.`
          }
        ]
      };
  }
  return doc;
}
