/**
 * Malformed spectrum files for the fuzz tests, made by corrupting a valid one (arbitraries.ts):
 * numbers swapped for text, non-finite or extreme values, lines deleted, duplicated or reordered,
 * wrong separators, mixed line ends, a BOM, NUL or quote in the middle, a huge line, bytes that are
 * not UTF-8, extra columns, a truncated, empty or header-only file (`malformedFile`); and files with
 * faults on known lines (`badLines`), for checking which lines a refusal names.
 */
import fc from 'fast-check';
import { fileText, renderSpectrum, SEPARATOR_CHAR, spectrumModel, type RenderedSpectrum, type SpectrumModel } from './arbitraries';

/** A number as the dialect writes it (so a comma-separated line is not read as one decimal-comma number). */
const numberPattern = (decimalComma: boolean) =>
  decimalComma ? /[+-]?(\d+,?\d*|,\d+)([eE][+-]?\d+)?/g : /[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?/g;
const NOT_NUMBERS = [
  'n/a',
  'abc',
  'NaN',
  'Infinity',
  '-Infinity',
  'inf',
  '1e400',
  '-1e400',
  '1.2.3',
  '12abc',
  '0x1A',
  '１２',
  '--5',
  '+',
  '.',
  'e5',
  '1 000',
  '∞',
  '1_000',
  '',
  '""',
  '"',
  "'5'",
  '5%',
  '4,5,6',
  '450nm',
  'null'
];
const EXTREMES = [
  '1.7976931348623157e308',
  '1e308',
  '1e306',
  '-1e306',
  '5e-324',
  '1e-310',
  '1e-300',
  '9'.repeat(400),
  '0.' + '0'.repeat(400) + '1',
  '-0',
  '+0.5',
  '00000450',
  '4.5e2'
];
const INSERTS = ['\uFEFF', '\u0000', '"', "'", '\uFFFD', '\uD800', 'µ°', '\u00A0', '\t', ' ', '#', '\u200B', ';', ',', '\u2028', '\u0085'];
const LINE_ENDS = ['\n', '\r\n', '\r', '\n\r', '\r\r\n', '\u2028', '\u0085', ''];
const WRONG_SEPARATORS = ['; ', '\t', ' ', '|', ',,', ':', ';', ',', '\t\t', ', '];
const HUGE_UNITS = ['x', '1,', '4', '0.5;', 'a b ', '9\t'];
const EMPTY_FILES = [
  '',
  '\n',
  '   \r\n',
  '\uFEFF',
  '# only a comment\n',
  '\r\r\r',
  'wavelength,intensity',
  'Wavelength (nm);Counts\r\n# no data\r\n'
];

export type Corruption =
  | { kind: 'cell' | 'extreme' | 'negate'; at: number; token: number; text: string }
  | { kind: 'delete' | 'duplicate' | 'decimalSwap'; at: number }
  | { kind: 'swap'; at: number; other: number }
  | { kind: 'reverse'; at: number; length: number }
  | { kind: 'separator' | 'eol' | 'garbageLine'; at: number; text: string }
  | { kind: 'insert'; at: number; pos: number; text: string }
  | { kind: 'hugeLine'; at: number; unit: string; length: number }
  | { kind: 'extraColumns'; at: number; count: number; all: boolean }
  | { kind: 'truncate'; pos: number }
  | { kind: 'headerOnly' }
  | { kind: 'empty'; text: string }
  | { kind: 'bytes'; pos: number; bytes: number[] };

const corruption: fc.Arbitrary<Corruption> = fc.oneof(
  fc.record({ kind: fc.constant('cell' as const), at: fc.nat(), token: fc.nat(), text: fc.constantFrom(...NOT_NUMBERS) }),
  fc.record({ kind: fc.constant('extreme' as const), at: fc.nat(), token: fc.nat(), text: fc.constantFrom(...EXTREMES) }),
  fc.record({ kind: fc.constant('negate' as const), at: fc.nat(), token: fc.nat(), text: fc.constant('-') }),
  fc.record({ kind: fc.constantFrom('delete' as const, 'duplicate' as const, 'decimalSwap' as const), at: fc.nat() }),
  fc.record({ kind: fc.constant('swap' as const), at: fc.nat(), other: fc.nat() }),
  fc.record({ kind: fc.constant('reverse' as const), at: fc.nat(), length: fc.integer({ min: 2, max: 6 }) }),
  fc.record({ kind: fc.constant('separator' as const), at: fc.nat(), text: fc.constantFrom(...WRONG_SEPARATORS) }),
  fc.record({ kind: fc.constant('eol' as const), at: fc.nat(), text: fc.constantFrom(...LINE_ENDS) }),
  fc.record({ kind: fc.constant('garbageLine' as const), at: fc.nat(), text: fc.string({ unit: 'binary', maxLength: 60 }) }),
  fc.record({ kind: fc.constant('insert' as const), at: fc.nat(), pos: fc.nat(), text: fc.constantFrom(...INSERTS) }),
  fc.record({
    kind: fc.constant('hugeLine' as const),
    at: fc.nat(),
    unit: fc.constantFrom(...HUGE_UNITS),
    length: fc.integer({ min: 500, max: 20_000 })
  }),
  fc.record({ kind: fc.constant('extraColumns' as const), at: fc.nat(), count: fc.integer({ min: 1, max: 3 }), all: fc.boolean() }),
  fc.record({ kind: fc.constant('truncate' as const), pos: fc.nat() }),
  fc.record({ kind: fc.constant('headerOnly' as const) }),
  fc.record({ kind: fc.constant('empty' as const), text: fc.constantFrom(...EMPTY_FILES) }),
  fc.record({
    kind: fc.constant('bytes' as const),
    pos: fc.nat(),
    bytes: fc.array(fc.integer({ min: 0x80, max: 0xff }), { minLength: 1, maxLength: 3 })
  })
);

interface Draft {
  lines: string[];
  eols: string[];
  bom: boolean;
  sep: string;
  decimalComma: boolean;
  text?: string;
  truncateAt?: number;
  byteOps: { pos: number; bytes: number[] }[];
}

function replaceToken(line: string, decimalComma: boolean, token: number, text: string, negate: boolean): string {
  const matches = [...line.matchAll(numberPattern(decimalComma))];
  if (matches.length === 0) return line + text;
  const m = matches[token % matches.length];
  const i = m.index ?? 0;
  return line.slice(0, i) + (negate ? `-${m[0]}` : text) + line.slice(i + m[0].length);
}

function apply(d: Draft, c: Corruption): void {
  const n = d.lines.length;
  if (c.kind === 'empty') {
    d.text = c.text;
    return;
  }
  if (c.kind === 'truncate') {
    d.truncateAt = c.pos;
    return;
  }
  if (c.kind === 'bytes') {
    d.byteOps.push(c);
    return;
  }
  if (c.kind === 'headerOnly') {
    const kept = d.lines.map((l, i) => [l, d.eols[i]] as const).filter(([l]) => !/^\s*"?[+-]?[\d.,]/.test(l));
    d.lines = kept.map(([l]) => l);
    d.eols = kept.map(([, e]) => e);
    return;
  }
  if (n === 0) return;
  const at = c.at % n;
  switch (c.kind) {
    case 'cell':
    case 'extreme':
    case 'negate':
      d.lines[at] = replaceToken(d.lines[at], d.decimalComma, c.token, c.text, c.kind === 'negate');
      break;
    case 'delete':
      d.lines.splice(at, 1);
      d.eols.splice(at, 1);
      break;
    case 'duplicate':
      d.lines.splice(at, 0, d.lines[at]);
      d.eols.splice(at, 0, d.eols[at] || '\n');
      break;
    case 'decimalSwap':
      d.lines[at] = /\./.test(d.lines[at]) ? d.lines[at].replace('.', ',') : d.lines[at].replace(',', '.');
      break;
    case 'swap': {
      const o = c.other % n;
      [d.lines[at], d.lines[o]] = [d.lines[o], d.lines[at]];
      break;
    }
    case 'reverse':
      d.lines.splice(at, c.length, ...d.lines.slice(at, at + c.length).reverse());
      break;
    case 'separator': {
      const line = d.lines[at];
      const i = d.sep === ' ' ? line.search(/\S\s/) + 1 : line.indexOf(d.sep);
      const end = d.sep === ' ' ? i + line.slice(i).search(/\S|$/) : i + 1;
      d.lines[at] = i > 0 ? line.slice(0, i) + c.text + line.slice(end) : line + c.text;
      break;
    }
    case 'eol':
      d.eols[at] = c.text;
      break;
    case 'garbageLine':
      d.lines.splice(at, 0, c.text);
      d.eols.splice(at, 0, '\n');
      break;
    case 'insert': {
      const p = c.pos % (d.lines[at].length + 1);
      d.lines[at] = d.lines[at].slice(0, p) + c.text + d.lines[at].slice(p);
      break;
    }
    case 'hugeLine':
      d.lines.splice(at, 0, c.unit.repeat(Math.ceil(c.length / c.unit.length)));
      d.eols.splice(at, 0, '\n');
      break;
    case 'extraColumns': {
      const extra =
        (d.sep === ' ' ? '  ' : d.sep) +
        Array(c.count)
          .fill('0.5')
          .join(d.sep === ' ' ? '  ' : d.sep);
      d.lines = d.lines.map((l, i) => (c.all || i === at ? l + extra : l));
      break;
    }
  }
}

const encoder = new TextEncoder();

/** The bytes of a valid file after the corruptions, in order. */
export function corruptedBytes(file: RenderedSpectrum, model: SpectrumModel, corruptions: Corruption[]): Uint8Array<ArrayBuffer> {
  const d: Draft = {
    lines: [...file.lines],
    eols: [...file.eols],
    bom: file.bom,
    sep: SEPARATOR_CHAR[model.sep],
    decimalComma: model.decimalComma,
    byteOps: []
  };
  for (const c of corruptions) apply(d, c);
  let text = d.text ?? fileText(d);
  if (d.truncateAt !== undefined) text = text.slice(0, d.truncateAt % (text.length + 1));
  let bytes = encoder.encode(text);
  for (const op of d.byteOps) {
    const p = op.pos % (bytes.length + 1);
    bytes = Uint8Array.from([...bytes.subarray(0, p), ...op.bytes, ...bytes.subarray(p)]);
  }
  return bytes;
}

export interface MalformedFile {
  model: SpectrumModel;
  corruptions: Corruption[];
  bytes: Uint8Array<ArrayBuffer>;
}

/** A valid file with one to three corruptions (most are refused; some, like a deleted comment, are not). */
export function malformedFile(parts: { min: number; max: number }): fc.Arbitrary<MalformedFile> {
  return fc.tuple(spectrumModel(parts), fc.array(corruption, { minLength: 1, maxLength: 3 })).map(([model, corruptions]) => ({
    model,
    corruptions,
    bytes: corruptedBytes(renderSpectrum(model), model, corruptions)
  }));
}

const PLAIN_NOT_NUMBERS = ['n/a', 'abc', 'NaN', 'Infinity', 'inf', '1e400', '12abc', '0x1A', '--5', '∞', '5%', 'null', '450nm', '１２'];
type LineFault = 'word' | 'duplicate' | 'quote';

/**
 * A valid file with faults on one to three data lines (never the first, which could pass for a header):
 * a field replaced by text that is no number (no separator, quote or decimal mark in it), the line
 * written twice (the copy is at fault), or a quote opened before its last field and, perhaps, closed
 * at the end of a later line. `lines` are the file lines at fault; a parser may stop at the first
 * problem of a stage, so it must name some of them and nothing else.
 */
export function badLines(parts: { min: number; max: number }): fc.Arbitrary<{ text: string; lines: number[]; faults: string[] }> {
  return fc
    .tuple(
      spectrumModel(parts),
      fc.array(
        fc.record({ pick: fc.nat(), kind: fc.constantFrom<LineFault>('word', 'duplicate', 'quote'), span: fc.integer({ min: 0, max: 3 }) }),
        { minLength: 1, maxLength: 3 }
      ),
      fc.constantFrom(...PLAIN_NOT_NUMBERS),
      fc.nat()
    )
    .map(([model, picks, word, token]) => {
      const f = renderSpectrum(model);
      const rows = f.lines.map((text, i) => ({ text, eol: f.eols[i], fault: '' }));
      const candidates = f.dataLines.slice(1).map((l) => l - 1);
      const chosen = [...new Map(picks.map((p) => [candidates[p.pick % candidates.length], p] as const))].sort((a, b) => b[0] - a[0]);
      // Bottom up, so a copied line does not move the lines still to be changed.
      for (const [index, { kind, span }] of chosen) {
        const row = rows[index];
        if (kind === 'duplicate') {
          rows.splice(index + 1, 0, { text: row.text, eol: row.eol, fault: 'written again' });
          row.eol = model.eol;
        } else if (kind === 'quote' && !model.quoted) {
          const at = model.sep === 'spaces' ? row.text.search(/\S+\s*$/) : row.text.lastIndexOf(SEPARATOR_CHAR[model.sep]) + 1;
          row.text = `${row.text.slice(0, at)}"${row.text.slice(at)}`;
          row.fault = 'quote opened';
          const closing = rows[index + span];
          if (span > 0 && closing) closing.text += '"';
        } else {
          row.text = replaceToken(row.text, model.decimalComma, token, word, false);
          row.fault = `"${word}"`;
        }
      }
      const text = fileText({ lines: rows.map((r) => r.text), eols: rows.map((r) => r.eol), bom: f.bom });
      const faulty = rows.flatMap((r, i) => (r.fault ? [{ line: i + 1, fault: r.fault }] : []));
      return { text, lines: faulty.map((x) => x.line), faults: faulty.map((x) => `line ${x.line}: ${x.fault}`) };
    });
}
