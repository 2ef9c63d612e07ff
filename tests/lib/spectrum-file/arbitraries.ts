/**
 * fast-check generator of valid spectrum files for the fuzz tests (parser and upload routes):
 * `spectrumModel` draws an export in one of the documented dialects — separator, decimal mark,
 * quoting, titles and header, comment and blank lines, BOM, line ends, values from 1e-310 to 1e306 —
 * from which `renderSpectrum` writes the text and the values a parser must read back. Files stay
 * small (20–120 data lines) so thousands run in seconds. Part names are invented (Kestrel Hollow
 * Lighting). Malformed files are made from these in corruptions.ts.
 */
import fc from 'fast-check';
import type { SpectrumFileDialect } from '../../../src/lib/spectrum-file/types';

export type Separator = 'comma' | 'semicolon' | 'tab' | 'spaces';
export const SEPARATOR_CHAR: Record<Separator, string> = { comma: ',', semicolon: ';', tab: '\t', spaces: ' ' };
const STEPS = [0.5, 1, 2, 2.5, 5, 10];

export interface PartBand {
  centreFrac: number;
  widthFrac: number;
  amplitude: number;
  baseline: number;
  noise: number;
}

export interface SpectrumModel {
  sep: Separator;
  spaces: number;
  decimalComma: boolean;
  quoted: boolean;
  header: boolean;
  titles: string[];
  /** Wavelength column name, then one name per part column. */
  labels: string[];
  step: number;
  n: number;
  start: number;
  parts: PartBand[];
  /** Powers of ten the values are scaled by (0 mostly; −310…306 tests the far ends of the number range). */
  magnitude: number;
  digits: number;
  exponent: boolean;
  /** Comment or blank lines, each put before content line `at` (modulo). */
  comments: { at: number; text: string }[];
  eol: '\n' | '\r\n' | '\r';
  trailingEol: boolean;
  bom: boolean;
}

export interface RenderedSpectrum {
  lines: string[];
  eols: string[];
  bom: boolean;
  /** 1-based file lines of the data rows, in order. */
  dataLines: number[];
  /** What the parser must read: the printed numbers, negatives (noise) set to 0. */
  wavelengths: number[];
  columns: { name: string; values: number[] }[];
  /** The numbers before printing, for the precision check. */
  exact: number[][];
  dialect: SpectrumFileDialect;
}

const WAVELENGTH_LABELS = ['Wavelength (nm)', 'nm', 'lambda/nm', 'WL[nm]', 'λ (nm)', 'Wellenlänge [nm]'];
const INTENSITY_LABELS = ['Intensity', 'Counts', 'Intensity (a.u.)', 'rel. power', 'W/nm'];
const TITLE_WORDS = ['Kestrel', 'Hollow', 'sphere', 'export', 'integration', 'operator', 'lot', 'dark', 'corrected'];
const COMMENTS = [
  '# exported by the sphere',
  '// integration 100 ms',
  '% dark subtracted',
  '! Kestrel Hollow Lighting',
  '* lot KH-2611',
  '',
  '   ',
  '\t'
];

const frac = fc.double({ min: 0, max: 1, noNaN: true });

/** A valid spectrum export with `parts` intensity columns. */
export function spectrumModel(parts: { min: number; max: number }): fc.Arbitrary<SpectrumModel> {
  return fc
    .record({
      sep: fc.constantFrom<Separator>('comma', 'semicolon', 'tab', 'spaces'),
      spaces: fc.integer({ min: 1, max: 4 }),
      decimalComma: fc.boolean(),
      quoted: fc.boolean(),
      header: fc.boolean(),
      titles: fc.array(
        fc.array(fc.constantFrom(...TITLE_WORDS), { minLength: 1, maxLength: 4 }).map((w) => w.join(' ')),
        { maxLength: 2 }
      ),
      wavelengthLabel: fc.constantFrom(...WAVELENGTH_LABELS),
      intensityLabel: fc.constantFrom(...INTENSITY_LABELS),
      firstPart: fc.integer({ min: 1, max: 9000 }),
      step: fc.constantFrom(...STEPS),
      nFrac: frac,
      startFrac: frac,
      parts: fc.array(
        fc.record({
          centreFrac: frac,
          widthFrac: frac,
          amplitude: fc.double({ min: 0.01, max: 10, noNaN: true }),
          baseline: fc.double({ min: 0, max: 0.05, noNaN: true }),
          noise: fc.double({ min: 0, max: 0.004, noNaN: true })
        }),
        { minLength: parts.min, maxLength: parts.max }
      ),
      magnitude: fc.oneof(
        { arbitrary: fc.constant(0), weight: 6 },
        { arbitrary: fc.integer({ min: -300, max: 300 }), weight: 1 },
        { arbitrary: fc.constantFrom(-310, -305, 303, 305, 306), weight: 1 } // subnormal; sums over the grid overflow
      ),
      digits: fc.integer({ min: 3, max: 8 }),
      exponent: fc.boolean(),
      comments: fc.array(fc.record({ at: fc.nat(), text: fc.constantFrom(...COMMENTS) }), { maxLength: 3 }),
      eol: fc.constantFrom<SpectrumModel['eol']>('\n', '\r\n', '\r'),
      trailingEol: fc.boolean(),
      bom: fc.boolean()
    })
    .map((r): SpectrumModel => {
      const quoted = r.sep === 'comma' && r.quoted;
      const header = r.header || r.parts.length > 1;
      const noSpaces = (s: string) => (r.sep === 'spaces' ? s.replace(/\s+/g, '_') : s);
      const nMax = Math.min(120, Math.floor(600 / r.step) + 1);
      const n = 20 + Math.floor(r.nFrac * (nMax - 20));
      const span = (n - 1) * r.step;
      // The range reaches at least 420 nm, starts by 560 nm and ends by 900 nm (core: power inside 360–830 nm).
      const lo = Math.max(300, Math.ceil(420 - span));
      const hi = Math.floor(Math.min(560, 900 - span));
      const names = r.parts.length === 1 ? [r.intensityLabel] : r.parts.map((_, k) => `KH-${r.firstPart + k}`);
      return {
        sep: r.sep,
        spaces: r.spaces,
        quoted,
        decimalComma: r.decimalComma && (r.sep !== 'comma' || quoted),
        header,
        // Titles only above a header, and not with quoted fields (their spaces would make the file look space-separated).
        titles: header && !quoted ? r.titles.map(noSpaces) : [],
        labels: [r.wavelengthLabel, ...names].map(noSpaces),
        step: r.step,
        n,
        start: lo + Math.floor(r.startFrac * (hi - lo)),
        parts: r.parts,
        magnitude: r.magnitude,
        digits: r.digits,
        exponent: r.exponent,
        comments: r.comments,
        eol: r.eol,
        trailingEol: r.trailingEol,
        bom: r.bom
      };
    });
}

function printNumber(v: number, m: SpectrumModel): string {
  const s = m.exponent ? v.toExponential(m.digits - 1) : v.toPrecision(m.digits);
  return m.decimalComma ? s.replace('.', ',') : s;
}

const readBack = (s: string) => Number(s.replace(',', '.'));

export function partValues(m: SpectrumModel, wavelengths: number[]): number[][] {
  const end = wavelengths[wavelengths.length - 1];
  return m.parts.map((p, k) => {
    const cLo = Math.max(m.start, 400);
    const centre = cLo + p.centreFrac * (Math.min(end, 700) - cLo);
    // At least one step wide: the sampled maximum stays ≥ 78 % of the amplitude, so the noise stays within 1 % of it.
    const width = Math.max(m.step, 5) + p.widthFrac * 60;
    const scale = p.amplitude * 10 ** m.magnitude;
    return wavelengths.map((w, i) => scale * (Math.exp(-(((w - centre) / width) ** 2)) + p.baseline + p.noise * Math.sin(1.7 * i + k)));
  });
}

/** The file text and what the parser must read from it (`multiColumn` as the parser is called: it names header-less columns). */
export function renderSpectrum(m: SpectrumModel, multiColumn = m.parts.length > 1): RenderedSpectrum {
  const sep = m.sep === 'spaces' ? ' '.repeat(m.spaces) : SEPARATOR_CHAR[m.sep];
  const cell = (s: string) => (m.quoted ? `"${s}"` : s);
  const row = (cells: string[]) => (m.sep === 'spaces' && m.spaces > 2 ? ' ' : '') + cells.map(cell).join(sep);
  const wavelengthText = Array.from({ length: m.n }, (_, i) => {
    const s = (m.start + i * m.step).toFixed(m.step % 1 ? 1 : 0);
    return m.decimalComma ? s.replace('.', ',') : s;
  });
  const wavelengths = wavelengthText.map(readBack);
  const exact = partValues(m, wavelengths);
  const printed = exact.map((col) => col.map((v) => printNumber(v, m)));
  const content = [
    ...m.titles,
    ...(m.header ? [row(m.labels)] : []),
    ...wavelengthText.map((w, i) => row([w, ...printed.map((c) => c[i])]))
  ];
  const firstData = content.length - m.n;
  const kinds: ('data' | 'header' | 'title' | 'comment')[] = content.map((_, i) =>
    i >= firstData ? 'data' : i === firstData - 1 && m.header ? 'header' : 'title'
  );
  for (const c of m.comments) {
    const at = c.at % (content.length + 1);
    content.splice(at, 0, c.text);
    kinds.splice(at, 0, 'comment');
  }
  const eols = content.map((_, i) => (i < content.length - 1 || m.trailingEol ? m.eol : ''));
  const names = m.header ? m.labels.slice(1) : m.parts.map((_, k) => (multiColumn ? `column ${k + 2}` : 'intensity'));
  return {
    lines: content,
    eols,
    bom: m.bom,
    dataLines: kinds.flatMap((k, i) => (k === 'data' ? [i + 1] : [])),
    wavelengths,
    columns: printed.map((col, k) => ({ name: names[k], values: col.map((s) => Math.max(0, readBack(s))) })),
    exact,
    dialect: {
      delimiter: m.sep === 'spaces' ? 'whitespace' : m.sep,
      decimal: m.decimalComma ? 'comma' : 'point',
      headerLine: m.header ? kinds.indexOf('header') + 1 : null
    }
  };
}

export function fileText(f: { lines: string[]; eols: string[]; bom: boolean }): string {
  return (f.bom ? '\uFEFF' : '') + f.lines.map((l, i) => l + (f.eols[i] ?? '')).join('');
}

/** Lines of a text as the format counts them (LF, CRLF or CR end a line; a leading BOM is not content). */
export function lineCount(text: string): number {
  return text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/).length;
}
