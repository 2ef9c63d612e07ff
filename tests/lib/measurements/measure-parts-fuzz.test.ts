/**
 * Fuzz of the measurement reader's pure half (fast-check): bytes decoded as the server decodes an
 * upload, parsed with the server's options (part columns, the file limit), then every part measured by the
 * spectral core. Files are malformed ones (see tests/lib/spectrum-file/corruptions.ts) and valid
 * ones with odd part names and values from 1e-300 to 1e300. Proves: measuring never throws — a part
 * the core refuses is a typed error naming a column the file has — and every measured part has a
 * unique, non-empty name and finite values for each metric the measurement table requires (x, y,
 * CCT, Duv, LER), so a file that gets this far can be saved.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseSpectrumFile } from '../../../src/lib/spectrum-file/parse';
import { decodeText } from '../../../src/lib/spectrum-file/decode';
import { measureParts } from '../../../src/lib/measurements/measureParts';
import { findAnsiBin } from '../../../src/lib/spectral/ansi/c78377';
import { MAX_MEASUREMENT_FILE_BYTES } from '../../../src/lib/measurements/schema';
import { fileText, renderSpectrum, spectrumModel } from '../spectrum-file/arbitraries';
import { malformedFile } from '../spectrum-file/corruptions';

const RUNS = 1000;
const PARTS = { min: 1, max: 4 };
const ODD_NAMES = [' ', 'KH-1', 'kh-1', 'KH-1 ', 'x'.repeat(120), 'Λ-ü 1', '  padded  ', '#1', '123', '"q"', 'a;b', 'a,b', 'a\tb'];

const renamed = fc
  .tuple(spectrumModel(PARTS), fc.array(fc.oneof(fc.constantFrom(...ODD_NAMES), fc.string({ maxLength: 12 })), { maxLength: 4 }))
  .map(([m, names]) =>
    new TextEncoder().encode(
      fileText(renderSpectrum({ ...m, labels: m.labels.map((l, i) => (i > 0 && names[i - 1] !== undefined ? names[i - 1] : l)) }, true))
    )
  );

const uploads = fc.oneof(
  malformedFile(PARTS).map((f) => f.bytes),
  renamed
);

describe('measurement reader fuzz: parse, then measure every part', () => {
  it(`${RUNS} files: measuring never throws; measured parts are named and have finite metrics`, () => {
    const t0 = performance.now();
    const tally = { refusedByParser: 0, refusedByCore: 0, measured: 0, parts: 0 };
    fc.assert(
      fc.property(uploads, (bytes) => {
        const parsed = parseSpectrumFile(decodeText(bytes), { multiColumn: true, maxBytes: MAX_MEASUREMENT_FILE_BYTES });
        if (!parsed.ok) {
          tally.refusedByParser++;
          return;
        }
        const r = measureParts(parsed);
        if (!r.ok) {
          tally.refusedByCore++;
          expect(r.errors.length).toBeGreaterThan(0);
          for (const e of r.errors) {
            expect(e.column).toBeGreaterThanOrEqual(1);
            expect(e.column).toBeLessThanOrEqual(parsed.columns.length + 1);
            expect(e.message.length).toBeGreaterThan(0);
          }
          return;
        }
        tally.measured++;
        tally.parts += r.parts.length;
        expect(r.parts).toHaveLength(parsed.columns.length);
        const labels = r.parts.map((p) => p.label);
        expect(new Set(labels).size).toBe(labels.length);
        for (const p of r.parts) {
          expect(p.label.trim()).toBe(p.label);
          expect(p.label.length).toBeGreaterThan(0);
          for (const key of ['x', 'y', 'cct', 'duv', 'ler'] as const)
            expect(Number.isFinite(p.metrics[key]), `${p.label}: ${key} = ${p.metrics[key]}`).toBe(true);
          findAnsiBin(p.metrics.x, p.metrics.y);
          JSON.stringify(p.metrics);
        }
      }),
      { numRuns: RUNS }
    );
    console.log(
      `measurement reader fuzz: ${RUNS} files, ${tally.refusedByParser} refused by the ` +
        `parser, ${tally.refusedByCore} by the core, ${tally.measured} measured ` +
        `(${tally.parts} parts), ${Math.round(performance.now() - t0)} ms`
    );
    expect(tally.measured).toBeGreaterThan(0);
  });
});
