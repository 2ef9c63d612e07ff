/**
 * zod schemas of a spectrum table read from a file. Stage 1 (`rowsSchema`) turns each data
 * row into numbers; stage 2 (`spectrumSchema`) checks the spectrum as a whole. Every issue
 * carries the row index in its path, so the parser can name the file line.
 * Limits follow the spectral core's input rules (src/lib/spectral/resample.ts): wavelengths
 * 300–900 nm, strictly increasing, negatives below −1 % of the maximum refused as more than noise.
 */
import { z } from 'zod';
import { MAX_WAVELENGTH_NM, MIN_WAVELENGTH_NM, NEGATIVE_NOISE_FRACTION } from '../spectral/resample';
import { readNumberCell } from './number-cell';
import type { SpectrumFileDialect } from './types';

export interface RawRow {
  line: number;
  cells: string[];
}

export interface NumericRow {
  line: number;
  values: number[];
}

export function rowsSchema(decimal: SpectrumFileDialect['decimal'], columnNames: string[]) {
  const width = columnNames.length;
  return z.array(
    // Rows come from the field splitter (strings already); each field is read by readNumberCell.
    z
      .custom<RawRow>((v) => typeof v === 'object' && v !== null && Array.isArray((v as RawRow).cells))
      .transform((row, ctx): NumericRow => {
        const cells = trimTrailingEmpty(row.cells);
        if (cells.length < width) {
          ctx.addIssue({
            code: 'custom',
            message: `has ${cells.length} value${cells.length === 1 ? '' : 's'}; ${width} are expected (${columnNames.join(', ')})`
          });
          return z.NEVER;
        }
        if (cells.length > width) {
          ctx.addIssue({
            code: 'custom',
            message:
              `has ${cells.length} values; ${width} are expected ` +
              `(${columnNames.join(', ')})${width === 2 ? ' — this upload takes two columns, wavelength and intensity' : ''}`
          });
          return z.NEVER;
        }
        const values: number[] = [];
        cells.forEach((c, i) => {
          const parsed = readNumberCell(c, decimal);
          if (parsed.ok) values.push(parsed.value);
          else ctx.addIssue({ code: 'custom', message: `column ${i + 1} (${columnNames[i]}): ${parsed.message}` });
        });
        return values.length === width ? { line: row.line, values } : z.NEVER;
      })
  );
}

function trimTrailingEmpty(cells: string[]): string[] {
  let n = cells.length;
  while (n > 0 && cells[n - 1].trim() === '') n--;
  return cells.slice(0, n);
}

export interface SpectrumLimits {
  minPoints: number;
  maxPoints: number;
}

export function spectrumSchema(columnNames: string[], limits: SpectrumLimits) {
  // Rows come from rowsSchema (already numbers): only the whole-spectrum rules are checked here.
  return z
    .custom<NumericRow[]>((v) => Array.isArray(v))
    .superRefine((rows, ctx) => {
      const at = (i: number, message: string) => ctx.addIssue({ code: 'custom', path: [i], message });
      if (rows.length < limits.minPoints) {
        ctx.addIssue({
          code: 'custom',
          path: [],
          message: `The file holds ${rows.length} data point${rows.length === 1 ? '' : 's'}; at least ${limits.minPoints} are needed.`
        });
      }
      if (rows.length > limits.maxPoints) {
        ctx.addIssue({
          code: 'custom',
          path: [],
          message: `The file holds ${rows.length} data points; at most ${limits.maxPoints} are accepted.`
        });
      }
      rows.forEach((r, i) => {
        const wl = r.values[0];
        if (wl < MIN_WAVELENGTH_NM || wl > MAX_WAVELENGTH_NM) {
          at(i, `wavelength ${wl} nm is outside ${MIN_WAVELENGTH_NM}–${MAX_WAVELENGTH_NM} nm`);
        }
        if (i > 0) {
          const prev = rows[i - 1];
          if (wl === prev.values[0]) at(i, `wavelength ${wl} nm repeats line ${prev.line} (duplicate point)`);
          else if (wl < prev.values[0])
            at(i, `wavelength ${wl} nm is lower than ${prev.values[0]} nm on line ${prev.line}; wavelengths must increase`);
        }
      });
      for (let c = 1; c < columnNames.length; c++) {
        let max = -Infinity;
        for (const r of rows) if (r.values[c] > max) max = r.values[c];
        if (!(max > 0)) {
          ctx.addIssue({ code: 'custom', path: [], message: `Column ${c + 1} (${columnNames[c]}) has no positive intensity.` });
          continue;
        }
        rows.forEach((r, i) => {
          if (r.values[c] < -NEGATIVE_NOISE_FRACTION * max) {
            at(
              i,
              `intensity ${r.values[c]} in column ${c + 1} (${columnNames[c]}) is negative ` +
                `beyond noise (more than ${NEGATIVE_NOISE_FRACTION * 100} % of the maximum ` +
                `${max})`
            );
          }
        });
      }
    });
}
