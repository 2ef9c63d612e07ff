/**
 * Spectra one row per part, as some sphere and tester software export them: a header row whose first
 * cell names the parts' column and whose other cells are the wavelengths (nm, strictly increasing), then
 * one row per part — its name, then its values at those wavelengths. Same dialect rules as the column
 * layout (delimiter and decimal mark detected, comment lines skipped, fields split by papaparse); every
 * problem names its line, and nothing is guessed. Small negative values (noise within 1 % of the row's
 * maximum) are set to 0, as in the column layout. Pure.
 */
import Papa from 'papaparse';
import { contentLines, DELIMITER_CHAR, detectDecimal, detectDelimiter } from './dialect';
import { looksNumeric, readNumberCell, shownField } from './number-cell';
import { DEFAULT_MAX_BYTES, DEFAULT_MIN_POINTS, formatBytes } from './parse';
import type { ParseOptions, SpectrumFileError, SpectrumFileResult } from './types';

const MAX_ERRORS = 25;
const WAVELENGTH_RANGE: [number, number] = [200, 2500];

function cellsOf(text: string, delimiter: string): string[] {
  return Papa.parse<string[]>(text, { delimiter }).data[0] ?? [];
}

/**
 * The first content line is a wavelength header (a name cell, then at least `minPoints` increasing
 * wavelengths) and the second starts with a part's name.
 */
export function looksLikeRowSpectra(text: string, minPoints = DEFAULT_MIN_POINTS): boolean {
  const { lines } = contentLines(text.slice(0, 200_000));
  if (lines.length < 2) return false;
  const delimiter = detectDelimiter(lines.slice(0, 2));
  const head = cellsOf(delimiter === 'whitespace' ? lines[0].text.trim().replace(/\s+/g, ' ') : lines[0].text, DELIMITER_CHAR[delimiter]);
  if (head.length < minPoints + 1 || looksNumeric(head[0] ?? '')) return false;
  // The next line starts with a part's name, not a wavelength (else it is the column layout with numeric part names).
  const next = cellsOf(delimiter === 'whitespace' ? lines[1].text.trim().replace(/\s+/g, ' ') : lines[1].text, DELIMITER_CHAR[delimiter]);
  if (looksNumeric(next[0] ?? '')) return false;
  let last = -Infinity;
  for (const c of head.slice(1)) {
    const v = Number(c.trim().replace(',', '.'));
    if (!Number.isFinite(v) || v <= last || v < WAVELENGTH_RANGE[0] || v > WAVELENGTH_RANGE[1]) return false;
    last = v;
  }
  return true;
}

export function parseRowSpectra(text: string, options: ParseOptions = {}): SpectrumFileResult {
  const maxBytes = options.maxBytes ?? DEFAULT_MAX_BYTES;
  const bytes = new TextEncoder().encode(text).length;
  if (bytes > maxBytes)
    return { ok: false, errors: [{ line: null, message: `The file is ${formatBytes(bytes)}; the limit is ${formatBytes(maxBytes)}.` }] };
  const { lines, comments } = contentLines(text);
  const delimiter = detectDelimiter(lines);
  const rows = lines.map((l) => ({
    line: l.line,
    cells: cellsOf(delimiter === 'whitespace' ? l.text.trim().replace(/\s+/g, ' ') : l.text, DELIMITER_CHAR[delimiter])
  }));
  const decimal = detectDecimal(
    delimiter,
    rows.slice(1, 20).map((r) => r.cells.slice(1))
  );
  const errors: SpectrumFileError[] = [];
  const header = rows[0];
  const wavelengths: number[] = [];
  for (let k = 1; k < header.cells.length; k++) {
    const r = readNumberCell(header.cells[k], decimal);
    if (!r.ok) errors.push({ line: header.line, message: `Line ${header.line}, wavelength ${k}: ${r.message}.` });
    else if (wavelengths.length && r.value <= wavelengths[wavelengths.length - 1])
      errors.push({
        line: header.line,
        message: `Line ${header.line}: wavelength ${r.value} nm does not increase after ${wavelengths[wavelengths.length - 1]} nm.`
      });
    else wavelengths.push(r.value);
  }
  if (errors.length) return { ok: false, errors };
  const columns: { name: string; values: number[] }[] = [];
  const names = new Map<string, number>();
  let clamped = 0;
  for (const row of rows.slice(1)) {
    if (errors.length >= MAX_ERRORS) break;
    const name = (row.cells[0] ?? '').trim().slice(0, 80) || `row ${row.line}`;
    if (row.cells.length - 1 !== wavelengths.length) {
      errors.push({
        line: row.line,
        message: `Line ${row.line}: part "${shownField(name)}" has ${row.cells.length - 1} values for ${wavelengths.length} wavelengths.`
      });
      continue;
    }
    const seen = names.get(name);
    if (seen !== undefined)
      errors.push({ line: row.line, message: `Line ${row.line}: part "${shownField(name)}" is already on line ${seen}.` });
    names.set(name, row.line);
    const values = new Array<number>(wavelengths.length);
    let max = 0;
    for (let k = 0; k < wavelengths.length; k++) {
      const r = readNumberCell(row.cells[k + 1], decimal);
      if (!r.ok) {
        errors.push({ line: row.line, message: `Line ${row.line}, ${wavelengths[k]} nm: ${r.message}.` });
        break;
      }
      values[k] = r.value;
      if (r.value > max) max = r.value;
    }
    if (errors.length && errors[errors.length - 1].line === row.line) continue;
    if (!(max > 0)) {
      errors.push({ line: row.line, message: `Line ${row.line}: part "${shownField(name)}" has no positive value.` });
      continue;
    }
    for (let k = 0; k < values.length; k++) {
      if (values[k] >= 0) continue;
      if (values[k] < -0.01 * max) {
        errors.push({
          line: row.line,
          message: `Line ${row.line}, ${wavelengths[k]} nm: ${values[k]} is negative (more than 1 % of the maximum).`
        });
        break;
      }
      values[k] = 0;
      clamped++;
    }
    columns.push({ name, values });
  }
  if (errors.length) return { ok: false, errors: errors.slice(0, MAX_ERRORS) };
  if (!columns.length)
    return { ok: false, errors: [{ line: header.line, message: `Line ${header.line}: no parts below the wavelength header.` }] };
  const warnings = [
    `Read as one part per row (${columns.length} parts, ${wavelengths.length} wavelengths), ` +
      `${delimiter === 'whitespace' ? 'space' : delimiter}-separated, ` +
      `decimal ${decimal === 'comma' ? 'commas' : 'points'}, wavelength header on line ${header.line}.`
  ];
  if (comments) warnings.push(`${comments} comment line${comments === 1 ? '' : 's'} skipped.`);
  if (clamped) warnings.push(`${clamped} small negative value${clamped === 1 ? '' : 's'} (noise, within 1 % of the maximum) set to 0.`);
  return { ok: true, wavelengths, columns, warnings, dialect: { delimiter, decimal, headerLine: header.line } };
}
