/**
 * Recognises the dialect of a two-or-more-column spectrum export: comment lines, field
 * separator (comma, semicolon, tab or runs of spaces) and decimal mark (point or comma).
 * Rules (common practice for instrument exports): tab wins over semicolon, semicolon over
 * comma; a comma inside space-separated fields is a decimal comma; with comma-separated
 * fields the decimal mark is the point (a quoted "450,5" is still read as a decimal comma).
 */
import type { SpectrumFileDialect } from './types';

/** Lines starting with one of these (after blanks) are comments. */
const COMMENT_PREFIXES = ['#', '//', '%', '!', '*'];

export function isCommentOrBlank(line: string): boolean {
  const t = line.trim();
  return t === '' || COMMENT_PREFIXES.some((p) => t.startsWith(p));
}

export interface SourceLine {
  /** 1-based line number in the file. */
  line: number;
  text: string;
}

/** Splits the text into lines (LF, CRLF or CR) and keeps the non-comment, non-blank ones with their numbers. */
export function contentLines(text: string): { lines: SourceLine[]; comments: number } {
  const all = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  const lines: SourceLine[] = [];
  let comments = 0;
  all.forEach((t, i) => {
    if (isCommentOrBlank(t)) {
      if (t.trim() !== '') comments++;
    } else lines.push({ line: i + 1, text: t });
  });
  return { lines, comments };
}

export type Delimiter = SpectrumFileDialect['delimiter'];

export const DELIMITER_CHAR: Record<Delimiter, string> = { comma: ',', semicolon: ';', tab: '\t', whitespace: ' ' };

export function detectDelimiter(lines: SourceLine[]): Delimiter {
  // Judge by rows that start like data (a header such as "Wavelength (nm),Intensity" may hold spaces).
  const data = lines.map((l) => l.text.trim()).filter((t) => /^[+-]?[\d.,]/.test(t));
  const sample = (data.length ? data : lines.map((l) => l.text.trim())).slice(0, 200);
  if (sample.some((t) => t.includes('\t'))) return 'tab';
  if (sample.some((t) => t.includes(';'))) return 'semicolon';
  const hasComma = sample.some((t) => t.includes(','));
  const hasSpaces = sample.some((t) => /\S\s+\S/.test(t.replace(/"[^"]*"/g, 'x')));
  if (hasComma && !hasSpaces) return 'comma';
  return 'whitespace';
}

/** The decimal mark: comma when a separator other than the comma is used and some field holds a comma. */
export function detectDecimal(delimiter: Delimiter, cells: string[][]): SpectrumFileDialect['decimal'] {
  if (delimiter === 'comma') return cells.some((row) => row.some((c) => /^[+-]?\d+,\d+/.test(c.trim()))) ? 'comma' : 'point';
  return cells.some((row) => row.some((c) => c.includes(','))) ? 'comma' : 'point';
}
