import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cctDuvToUv, evaluateSpectrum, SpectrumInputError, uvToCctOhno2014, type Spd } from '../../src/lib/spectral/index';
import { bandsSpd } from './helpers';

const band = fc.tuple(
  fc.double({ min: 420, max: 680, noNaN: true }),
  fc.double({ min: 15, max: 130, noNaN: true }),
  fc.double({ min: 0.05, max: 2, noNaN: true })
);
const phosphor = fc.tuple(
  fc.double({ min: 520, max: 650, noNaN: true }),
  fc.double({ min: 40, max: 130, noNaN: true }),
  fc.double({ min: 0.5, max: 3, noNaN: true })
);
// Pump + one main phosphor band + up to two extra bands: white-ish LED-like spectra.
const whiteish = fc
  .tuple(fc.double({ min: 440, max: 460, noNaN: true }), phosphor, fc.array(band, { maxLength: 2 }))
  .map(([pump, main, rest]) => bandsSpd([[pump, 20, 1], main, ...rest]));

function rel(a: number, b: number): number {
  if (Number.isNaN(a) && Number.isNaN(b)) return 0;
  return Math.abs(a - b) / Math.max(1, Math.abs(b));
}

describe('property: scaling an SPD changes no metric', () => {
  it('holds for random pump + phosphor-band spectra', () => {
    fc.assert(
      fc.property(whiteish, fc.double({ min: 1e-6, max: 1e6, noNaN: true }), (spd, k) => {
        const a = evaluateSpectrum(spd);
        fc.pre(Math.abs(a.duv) < 0.05); // metrics are defined near the locus
        const b = evaluateSpectrum({ wavelengths: spd.wavelengths, values: spd.values.map((v) => v * k) });
        const pairs: [number, number][] = [
          [a.x, b.x],
          [a.y, b.y],
          [a.cct, b.cct],
          [a.duv, b.duv],
          [a.cri.ra, b.cri.ra],
          [a.cri.ri[8], b.cri.ri[8]],
          [a.tm30.rf, b.tm30.rf],
          [a.tm30.rg, b.tm30.rg],
          [a.ler, b.ler],
          [a.peakNm, b.peakNm],
          [a.fwhmNm, b.fwhmNm]
        ];
        for (const [p, q] of pairs) expect(rel(p, q)).toBeLessThan(1e-7);
      }),
      { numRuns: 60 }
    );
  });
});

describe('property: Duv sign flips across the locus (Ohno 2014)', () => {
  it('+d above, −d below', () => {
    fc.assert(
      fc.property(fc.double({ min: 1500, max: 15000, noNaN: true }), fc.double({ min: 0.0005, max: 0.03, noNaN: true }), (t, d) => {
        expect(uvToCctOhno2014(...cctDuvToUv(t, d)).duv).toBeGreaterThan(0);
        expect(uvToCctOhno2014(...cctDuvToUv(t, -d)).duv).toBeLessThan(0);
      }),
      { numRuns: 300 }
    );
  });
});

describe('property: bad input always throws SpectrumInputError, never another error', () => {
  const anyNumber = fc.oneof(fc.double(), fc.constant(Number.NaN), fc.constant(Infinity), fc.integer({ min: -1000, max: 1000 }));
  const garbage = fc.oneof(
    fc.anything(),
    fc.record({ wavelengths: fc.array(anyNumber, { maxLength: 12 }), values: fc.array(anyNumber, { maxLength: 12 }) }),
    fc.record({ wavelengths: fc.anything(), values: fc.anything() })
  );
  it('random garbage: either evaluates or throws SpectrumInputError', () => {
    fc.assert(
      fc.property(garbage, (input) => {
        try {
          evaluateSpectrum(input as Spd);
        } catch (e) {
          expect(e).toBeInstanceOf(SpectrumInputError);
        }
      }),
      { numRuns: 500 }
    );
  });
  it('inputs with one defect always throw SpectrumInputError', () => {
    const defect = fc.constantFrom('length', 'nan', 'order', 'range', 'negative');
    fc.assert(
      fc.property(whiteish, defect, fc.nat({ max: 390 }), (spd, kind, i) => {
        const w = [...spd.wavelengths];
        const v = [...spd.values];
        if (kind === 'length') v.pop();
        if (kind === 'nan') v[i] = Number.NaN;
        if (kind === 'order') [w[i], w[i + 1]] = [w[i + 1], w[i]];
        if (kind === 'range') w[w.length - 1] = 901 + i;
        if (kind === 'negative') v[i] = -0.5 * Math.max(...v);
        expect(() => evaluateSpectrum({ wavelengths: w, values: v })).toThrow(SpectrumInputError);
      }),
      { numRuns: 200 }
    );
  });
});
