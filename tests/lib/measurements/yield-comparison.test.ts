/**
 * Measured against predicted yield. Interval: Wilson score, 95 % (Newcombe 1998, Table I, example
 * 81/263: 0.2553–0.3662 [from memory]); steps with the IEC 60081 ellipse of the aim's target.
 */
import { describe, expect, it } from 'vitest';
import { yieldComparison } from '../../../src/lib/measurements/yield-comparison';
import { resolveTarget } from '../../../src/lib/aim';

const target = resolveTarget({ kind: 'cctDuv', cct: 3000, duv: 0 });
const tolerance = { kind: 'sdcm' as const, steps: 3 };
const at = (dx: number) => ({ x: target.x + dx, y: target.y });

describe('measured against predicted yield', () => {
  it('counts parts inside the tolerance and gives the Wilson interval of the share', () => {
    // 81 parts on target and 182 far off: 81 of 263 inside, as in Newcombe's example.
    const parts = [...Array.from({ length: 81 }, () => at(0)), ...Array.from({ length: 182 }, () => at(0.05))];
    const r = yieldComparison(parts, target, tolerance, { inTolerance: 0.3, parts: 10_000, computedAt: new Date(0) })!;
    expect(r.inside).toBe(81);
    expect(r.measured.low).toBeCloseTo(0.2553, 4);
    expect(r.measured.high).toBeCloseTo(0.3662, 4);
    expect(r.verdict).toBe('consistent');
  });

  it('says whether the forecast was too high or too low, or missing', () => {
    const parts = Array.from({ length: 50 }, () => at(0));
    expect(yieldComparison(parts, target, tolerance, { inTolerance: 0.5, parts: 10_000, computedAt: new Date(0) })!.verdict).toBe(
      'forecastLow'
    );
    const half = [...Array.from({ length: 25 }, () => at(0)), ...Array.from({ length: 25 }, () => at(0.05))];
    expect(yieldComparison(half, target, tolerance, { inTolerance: 0.99, parts: 10_000, computedAt: new Date(0) })!.verdict).toBe(
      'forecastHigh'
    );
    expect(yieldComparison(half, target, tolerance, null)!.verdict).toBe('noForecast');
    expect(yieldComparison([], target, tolerance, null)).toBeNull();
  });
});
