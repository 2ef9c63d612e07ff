/**
 * Parser of spectrum exports (CSV/TXT): a wavelength column (nm) and one intensity column
 * (or several with `multiColumn`), header optional, comma/semicolon/tab/space separated,
 * decimal point or comma, comment lines (#, //, %, !, *). Fields are split by papaparse;
 * every value and the spectrum as a whole are validated with zod. Any problem fails the
 * whole file and names its line; nothing is guessed beyond the documented dialect rules.
 * Pure: no I/O, runs on the server and in the browser.
 */
import Papa from 'papaparse';
import { contentLines, DELIMITER_CHAR, detectDecimal, detectDelimiter, type SourceLine } from './dialect';
import { looksNumeric, shownField } from './number-cell';
import { rowsSchema, spectrumSchema, type RawRow } from './table-schema';
import type { ParseOptions, SpectrumFileError, SpectrumFileResult } from './types';

export type * from './types';

export const DEFAULT_MAX_BYTES = 2 * 1024 * 1024;
export const DEFAULT_MIN_POINTS = 20;
export const DEFAULT_MAX_POINTS = 20_000;
/** Non-numeric rows accepted above the data (a title and a column header, say). */
const MAX_HEADER_ROWS = 3;
/** Errors listed before the rest are summarised. */
const MAX_LISTED_ERRORS = 25;

/** Line errors in file order first, then whole-file errors. */
const fail = (errors: SpectrumFileError[]): SpectrumFileResult => ({
  ok: false,
  errors: capped([...errors].sort((a, b) => (a.line ?? 1e12) - (b.line ?? 1e12)))
});

function capped(errors: SpectrumFileError[]): SpectrumFileError[] {
  if (errors.length <= MAX_LISTED_ERRORS) return errors;
  return [...errors.slice(0, MAX_LISTED_ERRORS), { line: null, message: `…and ${errors.length - MAX_LISTED_ERRORS} more problems.` }];
}

function byteLength(text: string): number {
  return new TextEncoder().encode(text).length;
}

export function formatBytes(n: number): string {
  return n >= 1024 * 1024 ? `${(n / 1024 / 1024).toFixed(1)} MB` : `${Math.ceil(n / 1024)} kB`;
}

function splitFields(lines: SourceLine[], delimiter: keyof typeof DELIMITER_CHAR): { rows: RawRow[]; errors: SpectrumFileError[] } {
  const texts = lines.map((l) => (delimiter === 'whitespace' ? l.text.trim().replace(/\s+/g, ' ') : l.text));
  const parsed = Papa.parse<string[]>(texts.join('\n'), { delimiter: DELIMITER_CHAR[delimiter], newline: '\n', skipEmptyLines: false });
  // A quote left open on one line swallows the following lines into one row: every row after it
  // would name the wrong line, so the file is refused there and later problems are not listed.
  const joined = parsed.data.findIndex((cells) => cells.some((c) => c.includes('\n')));
  const aligned = joined === -1 ? parsed.data.length : joined;
  const errors: SpectrumFileError[] = parsed.errors
    .filter((e) => e.row === undefined || e.row < aligned)
    .map((e) => {
      const line = e.row !== undefined && lines[e.row] ? lines[e.row].line : null;
      return { line, message: `Line ${line ?? '?'}: ${e.message}` };
    });
  if (joined !== -1) {
    const line = lines[joined].line;
    errors.push({
      line,
      message: `Line ${line}: a quoted field opens here and is not closed on the same line (a field may not span lines).`
    });
  }
  const rows = parsed.data.map((cells, i) => ({ line: lines[i]?.line ?? 0, cells: cells.map((c) => c.trim()) }));
  return { rows, errors };
}

export function parseSpectrumFile(text: string, options: ParseOptions = {}): SpectrumFileResult {
  const maxBytes = options.maxBytes ?? DEFAULT_MAX_BYTES;
  const bytes = byteLength(text);
  if (bytes > maxBytes) return fail([{ line: null, message: `The file is ${formatBytes(bytes)}; the limit is ${formatBytes(maxBytes)}.` }]);
  if (text.includes('\u0000'))
    return fail([{ line: null, message: 'This is not a text file (it contains binary data). Export the spectrum as CSV or TXT.' }]);

  const { lines, comments } = contentLines(text);
  if (lines.length === 0) return fail([{ line: null, message: 'The file holds no data rows (only blank or comment lines).' }]);
  const delimiter = detectDelimiter(lines);
  const split = splitFields(lines, delimiter);
  if (split.errors.length) return fail(split.errors);

  // Header rows: non-numeric rows above the first data row.
  let first = 0;
  while (first < split.rows.length && !looksNumeric(split.rows[first].cells[0] ?? '')) first++;
  if (first === split.rows.length)
    return fail([
      {
        line: split.rows[0].line,
        message: `Line ${split.rows[0].line}: no numeric data found in the file; expected wavelength and intensity columns.`
      }
    ]);
  if (first > MAX_HEADER_ROWS) {
    const r = split.rows[MAX_HEADER_ROWS];
    return fail([
      {
        line: r.line,
        message:
          `Line ${r.line}: "${shownField(r.cells[0])}" is not a number; at most ` +
          `${MAX_HEADER_ROWS} header lines may precede the data (mark other lines as ` +
          `comments with #).`
      }
    ]);
  }
  const header = first > 0 ? split.rows[first - 1] : null;
  const dataRows = split.rows.slice(first);

  const width = options.multiColumn
    ? Math.max(2, dataRows[0].cells.filter((c, i, a) => c !== '' || a.slice(i).some((x) => x !== '')).length)
    : 2;
  const names = columnNames(header?.cells ?? [], width, Boolean(options.multiColumn));
  const decimal = detectDecimal(
    delimiter,
    dataRows.map((r) => r.cells)
  );

  const numeric = rowsSchema(decimal, names).safeParse(dataRows);
  if (!numeric.success) return fail(numeric.error.issues.map((i) => lineIssue(dataRows, i.path, i.message)));

  const limits = { minPoints: options.minPoints ?? DEFAULT_MIN_POINTS, maxPoints: options.maxPoints ?? DEFAULT_MAX_POINTS };
  const checked = spectrumSchema(names, limits).safeParse(numeric.data);
  if (!checked.success) return fail(checked.error.issues.map((i) => lineIssue(dataRows, i.path, i.message)));

  const rows = checked.data;
  const warnings: string[] = [];
  warnings.push(
    `Read as ${delimiter === 'whitespace' ? 'space' : delimiter}-separated columns ` +
      `with decimal ` +
      `${decimal === 'comma' ? 'commas' : 'points'}${header ? `, header on line ${header.line}` : ', no header'}.`
  );
  if (comments) warnings.push(`${comments} comment line${comments === 1 ? '' : 's'} skipped.`);
  const columns = names.slice(1).map((name, k) => {
    const values = rows.map((r) => r.values[k + 1]);
    const clamped = values.filter((v) => v < 0).length;
    if (clamped)
      warnings.push(`${clamped} small negative value${clamped === 1 ? '' : 's'} in ${name} (noise, within 1 % of the maximum) set to 0.`);
    return { name, values: values.map((v) => (v < 0 ? 0 : v)) };
  });
  return {
    ok: true,
    wavelengths: rows.map((r) => r.values[0]),
    columns,
    warnings,
    dialect: { delimiter, decimal, headerLine: header?.line ?? null }
  };
}

function lineIssue(rows: RawRow[], path: PropertyKey[], message: string): SpectrumFileError {
  const index = typeof path[0] === 'number' ? path[0] : null;
  if (index === null) return { line: null, message };
  const line = rows[index].line;
  return { line, message: `Line ${line}: ${message}.`.replace(/\.\.$/, '.') };
}

function columnNames(headerCells: string[], width: number, multi: boolean): string[] {
  return Array.from({ length: width }, (_, i) => {
    const h = (headerCells[i] ?? '').trim();
    if (h) return h.slice(0, 80);
    if (i === 0) return 'wavelength';
    return multi ? `column ${i + 1}` : 'intensity';
  });
}
