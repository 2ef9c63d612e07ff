/**
 * Fuzz of the spectrum-file parser (fast-check) in both of its uses: two columns (a material's
 * spectrum) and part columns (the measured parts of a batch, with the server's size limit). Over
 * thousands of generated files it proves: a malformed file never makes the parser throw — the answer
 * is always its typed result — and every error names a line the file has (or none, for a whole-file
 * problem); a file it accepts holds finite, strictly increasing wavelengths in 300–900 nm and finite,
 * non-negative intensities with a positive maximum, within the point limits; a file with bad lines
 * is refused naming only lines at fault (a quote left open must not shift the lines named after
 * it); a valid file in any documented dialect is accepted and reads back the printed numbers
 * exactly. Bytes are decoded as the server decodes uploads.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DEFAULT_MAX_POINTS,
  DEFAULT_MIN_POINTS,
  parseSpectrumFile,
  type ParseOptions,
  type SpectrumFileResult
} from '../../../src/lib/spectrum-file/parse';
import { decodeText } from '../../../src/lib/spectrum-file/decode';
import { MAX_MEASUREMENT_FILE_BYTES } from '../../../src/lib/measurements/schema';
import { fileText, lineCount, renderSpectrum, spectrumModel } from './arbitraries';
import { badLines, malformedFile } from './corruptions';

const RUNS = 1000;
/** The parser lists at most 25 problems and a summary line. */
const MAX_ERRORS = 26;

const MODES: { name: string; options: ParseOptions; parts: { min: number; max: number } }[] = [
  { name: 'two columns', options: {}, parts: { min: 1, max: 1 } },
  { name: 'part columns', options: { multiColumn: true, maxBytes: MAX_MEASUREMENT_FILE_BYTES }, parts: { min: 1, max: 4 } }
];

/** The parser's contract for any input; returns whether the file was accepted. */
function expectContract(text: string, r: SpectrumFileResult, multiColumn: boolean): boolean {
  if (!r.ok) {
    expect(r.errors.length).toBeGreaterThan(0);
    expect(r.errors.length).toBeLessThanOrEqual(MAX_ERRORS);
    const lines = lineCount(text);
    for (const e of r.errors) {
      expect(typeof e.message).toBe('string');
      expect(e.message.length).toBeGreaterThan(0);
      if (e.line === null) continue;
      expect(Number.isInteger(e.line)).toBe(true);
      expect(e.line).toBeGreaterThanOrEqual(1);
      expect(e.line, `${e.message} (the file has ${lines} lines)`).toBeLessThanOrEqual(lines);
      expect(e.message.startsWith(`Line ${e.line}:`), e.message).toBe(true);
    }
    return false;
  }
  const wl = r.wavelengths;
  expect(wl.length).toBeGreaterThanOrEqual(DEFAULT_MIN_POINTS);
  expect(wl.length).toBeLessThanOrEqual(DEFAULT_MAX_POINTS);
  wl.forEach((w, i) => {
    expect(Number.isFinite(w) && w >= 300 && w <= 900, `wavelength ${w}`).toBe(true);
    if (i > 0) expect(w).toBeGreaterThan(wl[i - 1]);
  });
  if (!multiColumn) expect(r.columns).toHaveLength(1);
  expect(r.columns.length).toBeGreaterThanOrEqual(1);
  for (const c of r.columns) {
    expect(c.values).toHaveLength(wl.length);
    expect(
      c.values.every((v) => Number.isFinite(v) && v >= 0),
      c.name
    ).toBe(true);
    expect(Math.max(...c.values)).toBeGreaterThan(0);
  }
  return true;
}

const zeroSigned = (values: number[]) => values.map((v) => v + 0); // −0 (a printed "-0.00" of noise) reads as 0

describe.each(MODES)('spectrum-file parser fuzz: $name', ({ name, options, parts }) => {
  const multi = Boolean(options.multiColumn);

  it(`${RUNS} malformed files: a typed result, errors on lines that exist, accepted data within the rules`, () => {
    const t0 = performance.now();
    const tally = { accepted: 0, refused: 0, namingLine: 0 };
    fc.assert(
      fc.property(malformedFile(parts), ({ bytes }) => {
        const text = decodeText(bytes);
        const r = parseSpectrumFile(text, options);
        if (expectContract(text, r, multi)) tally.accepted++;
        else {
          tally.refused++;
          if (!r.ok && r.errors.some((e) => e.line !== null)) tally.namingLine++;
        }
      }),
      { numRuns: RUNS }
    );
    console.log(
      `parser fuzz, ${name}: ${RUNS} malformed files, ${tally.refused} refused ` +
        `(${tally.namingLine} naming a line), ${tally.accepted} accepted, ` +
        `${Math.round(performance.now() - t0)} ms`
    );
    expect(tally.refused).toBeGreaterThan(RUNS * 0.8);
  });

  it(`${RUNS} files with bad lines: refused, naming only lines at fault`, () => {
    fc.assert(
      fc.property(badLines(parts), ({ text, lines, faults }) => {
        const r = parseSpectrumFile(text, options);
        expect(r.ok, faults.join('; ')).toBe(false);
        if (r.ok) return;
        const named = r.errors.flatMap((e) => (e.line === null ? [] : [e.line]));
        expect(named.length, `${faults.join('; ')}: ${JSON.stringify(r.errors)}`).toBeGreaterThan(0);
        for (const line of named) expect(lines, `${faults.join('; ')}: ${JSON.stringify(r.errors)}`).toContain(line);
        expectContract(text, r, multi);
      }),
      { numRuns: RUNS }
    );
  });

  it(`${RUNS} valid files in every dialect: accepted, the printed numbers read back exactly`, () => {
    fc.assert(
      fc.property(spectrumModel(parts), (model) => {
        const f = renderSpectrum(model, multi);
        const text = fileText(f);
        const r = parseSpectrumFile(text, options);
        if (!r.ok) throw new Error(`refused: ${JSON.stringify(r.errors.slice(0, 3))}\n${text.slice(0, 400)}`);
        expectContract(text, r, multi);
        expect(r.dialect).toEqual(f.dialect);
        expect(r.wavelengths).toEqual(f.wavelengths);
        expect(r.columns.map((c) => c.name)).toEqual(f.columns.map((c) => c.name));
        r.columns.forEach((c, k) => {
          expect(zeroSigned(c.values)).toEqual(f.columns[k].values);
          // Within the printed precision of the values before printing (negatives, noise, read as 0;
          // subnormal numbers below 1e-300 carry fewer digits than printed).
          const tolerance = 10 ** (1 - model.digits);
          c.values.forEach((v, i) => {
            const exact = f.exact[k][i];
            if (exact > 1e-300) expect(Math.abs(v - exact)).toBeLessThanOrEqual(exact * tolerance);
          });
        });
      }),
      { numRuns: RUNS }
    );
  });
});
