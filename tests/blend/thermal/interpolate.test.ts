/**
 * Thermal curve interpolation: piecewise linear, monotone between points (Fritsch & Carlson,
 * SIAM J. Numer. Anal. 17 (1980) 238), refusing temperatures outside the data; schema refusals.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { interpolateThermal, phosphorThermalSchema, pumpThermalSchema, relativeCurveSchema } from '../../../src/lib/blend/thermal';

const CURVE = relativeCurveSchema.parse([
  { temperatureC: 25, value: 1 },
  { temperatureC: 85, value: 0.96 },
  { temperatureC: 125, value: 0.91 },
  { temperatureC: 150, value: 0.87 }
]);

describe('thermal interpolation', () => {
  it('returns the data at the points and the straight line between them (hand calculation)', () => {
    expect(interpolateThermal(CURVE, 25, 'red')).toBe(1);
    expect(interpolateThermal(CURVE, 125, 'red')).toBe(0.91);
    // Halfway 85→125 °C: (0.96 + 0.91) / 2 = 0.935.
    expect(interpolateThermal(CURVE, 105, 'red')).toBeCloseTo(0.935, 12);
  });

  it('is monotone wherever the data are, and stays within the neighbouring values', () => {
    const pointsArb = fc.array(fc.double({ min: 0.01, max: 1, noNaN: true }), { minLength: 1, maxLength: 6 }).map((drops) => {
      const values = [1];
      for (const d of drops) values.push(values[values.length - 1] * (1 - d * 0.2));
      return values.map((value, i) => ({ temperatureC: 25 + 25 * i, value }));
    });
    fc.assert(
      fc.property(pointsArb, fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (pts, a, b) => {
        const top = pts[pts.length - 1].temperatureC;
        const [t1, t2] = [25 + a * (top - 25), 25 + b * (top - 25)].sort((p, q) => p - q);
        const v1 = interpolateThermal(pts, t1, 'x');
        const v2 = interpolateThermal(pts, t2, 'x');
        expect(v2).toBeLessThanOrEqual(v1 + 1e-12);
        expect(v1).toBeLessThanOrEqual(1);
        expect(v2).toBeGreaterThanOrEqual(pts[pts.length - 1].value - 1e-12);
      })
    );
  });

  it('refuses temperatures outside the data with a clear message', () => {
    expect(() => interpolateThermal(CURVE, 160, 'RD-625 relative emission')).toThrow(
      'RD-625 relative emission: 160 °C is outside the characterised range 25–150 °C'
    );
    expect(() => interpolateThermal(CURVE, 0, 'x')).toThrow(/outside the characterised range/);
    expect(() => interpolateThermal(CURVE, Number.NaN, 'x')).toThrow(/outside the characterised range/);
  });

  it('refuses curves that do not rise in temperature or lack the 25 °C anchor', () => {
    const unsorted = relativeCurveSchema.safeParse([
      { temperatureC: 85, value: 0.9 },
      { temperatureC: 25, value: 1 }
    ]);
    expect(unsorted.success).toBe(false);
    const noAnchor = relativeCurveSchema.safeParse([
      { temperatureC: 30, value: 1 },
      { temperatureC: 85, value: 0.9 }
    ]);
    expect(noAnchor.success || noAnchor.error.issues[0].message).toBe('relative curve: must include 25 °C with the value 1');
    expect(phosphorThermalSchema.safeParse({ kind: 'phosphor', relativeEmission: CURVE, peakShiftNm: { perK: 5 } }).success).toBe(false);
    const pump = pumpThermalSchema.safeParse({ kind: 'pump', peakDriftNmPerK: 0.04, peakDriftNmPerMa: 0.005, relativeOutput: CURVE });
    expect(pump.success || pump.error.issues[0].message).toBe('a drift per mA needs the reference current it is measured from');
  });
});
