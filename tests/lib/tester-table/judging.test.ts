/**
 * Parts from a tester table are judged on what they carry: a floor whose metric the table lacks is
 * "not measured" (no failure, nothing computed), a floor the table carries is judged as for spectra.
 * Target: ANSI C78.377 3000 K bin; part values invented.
 */
import { describe, expect, it } from 'vitest';
import { judgePart } from '../../../src/lib/measurements/acceptance';
import { resolveTarget } from '../../../src/lib/aim/target';
import { testerPartMetrics } from '../../../src/lib/tester-table/part-metrics';
import type { TesterRow } from '../../../src/lib/tester-table/parse';

const target = resolveTarget({ kind: 'ansiBin', nominalCct: 3000 });
const row = (over: Partial<TesterRow> = {}): TesterRow => ({
  label: 'P1',
  line: 2,
  chromaticity: [target.x, target.y],
  cct: null,
  duv: null,
  ra: null,
  r9: null,
  fluxLm: 120,
  forwardVoltageV: 2.9,
  peakNm: null,
  bin: null,
  ...over
});
const acceptance = {
  tolerance: { kind: 'sdcm' as const, steps: 3 },
  floors: { raMin: 90, r9Min: 50, lerMin: 300 },
  requireTargetBin: true
};

describe('judging a tester part', () => {
  it('passes on colour with the floors it cannot carry marked "not measured"', () => {
    const v = judgePart(testerPartMetrics(row(), 'xy'), target, acceptance);
    expect(v.pass).toBe(true);
    expect(v.notMeasured).toEqual(['Ra ≥ 90: not measured', 'R9 ≥ 50: not measured', 'LER ≥ 300: not measured']);
  });

  it('fails a floor the table carries', () => {
    const v = judgePart(testerPartMetrics(row({ ra: 86.5, r9: 55 }), 'xy'), target, acceptance);
    expect(v.pass).toBe(false);
    expect(v.failures.map((f) => f.message)).toEqual(['Ra 86.5 < 90']);
    expect(v.notMeasured).toEqual(['LER ≥ 300: not measured']);
  });

  it('judges colour as for spectra: far from the target fails', () => {
    const v = judgePart(testerPartMetrics(row({ chromaticity: [target.x + 0.01, target.y] }), 'xy'), target, acceptance);
    expect(v.failures.some((f) => f.code === 'colour')).toBe(true);
  });
});
