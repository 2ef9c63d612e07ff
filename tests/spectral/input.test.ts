import { describe, expect, it } from 'vitest';
import { evaluateSpectrum, resampleToGrid, SpectrumInputError, type Spd } from '../../src/lib/spectral/index';
import { bandsSpd } from './helpers';

const wl = [400, 450, 500, 550, 600, 650, 700];
const ok = [1, 2, 3, 4, 3, 2, 1];
const cases: { name: string; input: unknown; expected: RegExp }[] = [
  { name: 'lengths differ', input: { wavelengths: wl, values: ok.slice(1) }, expected: /differ in length/ },
  { name: 'fewer than 5 points', input: { wavelengths: [400, 500, 600, 700], values: [1, 1, 1, 1] }, expected: /at least 5/ },
  {
    name: 'non-increasing wavelengths',
    input: { wavelengths: [400, 450, 450, 550, 600, 650, 700], values: ok },
    expected: /increase strictly/
  },
  { name: 'decreasing wavelengths', input: { wavelengths: [...wl].reverse(), values: ok }, expected: /increase strictly/ },
  { name: 'NaN value', input: { wavelengths: wl, values: [1, 2, Number.NaN, 4, 3, 2, 1] }, expected: /not a finite number/ },
  {
    name: 'Infinity wavelength',
    input: { wavelengths: [400, 450, 500, 550, 600, 650, Infinity], values: ok },
    expected: /not a finite number/
  },
  { name: 'negative beyond noise', input: { wavelengths: wl, values: [1, 2, 3, 4, -0.5, 2, 1] }, expected: /below −1 %/ },
  { name: 'zero power', input: { wavelengths: wl, values: [0, 0, 0, 0, 0, 0, 0] }, expected: /zero power/ },
  { name: 'wavelength below 300 nm', input: { wavelengths: [250, 450, 500, 550, 600, 650, 700], values: ok }, expected: /outside 300–900/ },
  { name: 'wavelength above 900 nm', input: { wavelengths: [400, 450, 500, 550, 600, 650, 950], values: ok }, expected: /outside 300–900/ },
  {
    name: 'no power inside 360–830 nm',
    input: { wavelengths: [300, 310, 320, 330, 340], values: [1, 1, 1, 1, 1] },
    expected: /inside 360–830/
  },
  { name: 'not an object', input: null, expected: /must be an object/ },
  { name: 'values not an array', input: { wavelengths: wl, values: 'abc' }, expected: /arrays of numbers/ },
  { name: 'string inside values', input: { wavelengths: wl, values: [1, 2, '3', 4, 3, 2, 1] }, expected: /not a finite number/ }
];

describe('input validation (SpectrumInputError, message says what is wrong)', () => {
  it.each(cases)('$name', ({ input, expected }) => {
    let caught: unknown;
    try {
      evaluateSpectrum(input as Spd);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(SpectrumInputError);
    expect((caught as Error).message).toMatch(expected);
  });

  it('clamps small negatives from dark subtraction (≥ −1 % of max) to 0', () => {
    const g = resampleToGrid({ wavelengths: wl, values: [1, 2, 3, 4, 3, 2, -0.03] });
    expect(Math.min(...g)).toBe(0);
    expect(g[700 - 360]).toBe(0);
  });

  it('zero outside the measured range, linear inside', () => {
    const g = resampleToGrid({ wavelengths: wl, values: ok });
    expect(g[399 - 360]).toBe(0);
    expect(g[701 - 360]).toBe(0);
    expect(g[425 - 360]).toBeCloseTo(1.5, 12);
  });
});

// Found by the upload fuzz: a file of finite but huge values (1e306) gave LER = Infinity, which the
// measurement table cannot store (an error 500), and 1e308 or 1e-310 were refused as "no luminous power".
describe('extreme magnitudes: every metric is scale-free, so finite input gives the same finite metrics', () => {
  const band = bandsSpd([
    [450, 20, 1],
    [560, 110, 2.5]
  ]);
  const peak = Math.max(...band.values);
  const white = { wavelengths: band.wavelengths, values: band.values.map((v) => v / peak) }; // maximum 1
  const reference = evaluateSpectrum(white);
  it.each([1e306, 1.7e308, 1e-200, 1e-310])('values × %s', (k) => {
    const e = evaluateSpectrum({ wavelengths: white.wavelengths, values: white.values.map((v) => v * k) });
    for (const key of ['x', 'y', 'cct', 'duv', 'ler', 'peakNm', 'fwhmNm', 'centroidNm'] as const) {
      expect(Number.isFinite(e[key]), key).toBe(true);
      expect(e[key]).toBeCloseTo(reference[key], 6);
    }
    expect(e.cri.ra).toBeCloseTo(reference.cri.ra, 6);
  });

  it('ordinary magnitudes pass through the resampler unchanged', () => {
    expect(resampleToGrid({ wavelengths: wl, values: ok.map((v) => v * 1e100) })[425 - 360]).toBe(1e100 * 0.5 + 2e100 * 0.5);
  });
});
