import { describe, expect, it } from 'vitest';
import { judgeBatch, measureParts, measurePartsPaced } from '../../../src/lib/measurements/index';
import { CIE_ILLUMINANT_A } from '../../../src/lib/spectral/data/cie-illuminants';
import { CIE_D65 } from '../../../src/lib/spectral/data/cie-d65';

// A multi-part file of two CIE standard illuminant A and two D65 spectra (CIE 15:2004 tables, 300–780 nm
// at 5 nm; both tables start at 300 nm with the same step). Published chromaticities (CIE 15:2004):
// A (0.44757, 0.40745), D65 (0.31272, 0.32903). Tolerance 0.0003: 5 nm tables integrated at 1 nm.
const wavelengths = CIE_ILLUMINANT_A.values.map((_, i) => CIE_ILLUMINANT_A.startNm + i * CIE_ILLUMINANT_A.stepNm);
const a = [...CIE_ILLUMINANT_A.values];
const d = CIE_D65.values.slice(0, a.length);
const file = {
  wavelengths,
  columns: [
    { name: 'A-1', values: a },
    { name: 'D65-1', values: d },
    { name: 'A-2', values: a.map((v) => v * 2) },
    { name: 'D65-2', values: d.map((v) => v / 3) }
  ]
};

describe('measuring a multi-part file', () => {
  it('measures every part and reports progress', () => {
    const seen: number[] = [];
    const res = measureParts(file, (done) => seen.push(done));
    expect(res.ok).toBe(true);
    if (!res.ok) return;
    expect(seen).toEqual([1, 2, 3, 4]);
    expect(res.parts.map((p) => p.label)).toEqual(['A-1', 'D65-1', 'A-2', 'D65-2']);
    expect(Math.abs(res.parts[0].metrics.x - 0.44757)).toBeLessThan(3e-4);
    expect(Math.abs(res.parts[1].metrics.y - 0.32903)).toBeLessThan(3e-4);
  });

  it('batch mean and spread of x, worked by hand from the published points', () => {
    const res = measureParts(file);
    if (!res.ok) throw new Error('parts');
    const s = judgeBatch(
      res.parts,
      { kind: 'cctDuv', cct: 4000, duv: 0 },
      { tolerance: { kind: 'sdcm', steps: 7 }, floors: {}, requireTargetBin: false }
    ).summary;
    // x̄ = (2·0.44757 + 2·0.31272)/4 = 0.380145; deviations ±0.067425 → s = √(4·0.067425²/3) = 0.077856.
    expect(Math.abs(s.stats.x!.mean - 0.380145)).toBeLessThan(3e-4);
    expect(Math.abs(s.stats.x!.sd - 0.077856)).toBeLessThan(3e-4);
    // ȳ = (2·0.40745 + 2·0.32903)/4 = 0.36824.
    expect(Math.abs(s.stats.y!.mean - 0.36824)).toBeLessThan(3e-4);
    // Ra = 100 for both (each is its own CIE 13.3 reference), so spread 0 within rounding.
    expect(s.stats.ra!.mean).toBeGreaterThan(99.4);
  });

  it('a bad part column is named and nothing is measured', () => {
    const bad = {
      wavelengths,
      columns: [
        { name: 'A-1', values: a },
        { name: 'dark', values: a.map(() => 0) },
        { name: 'A-1', values: a }
      ]
    };
    const res = measureParts(bad);
    expect(res.ok).toBe(false);
    if (res.ok) return;
    expect(res.errors).toEqual([
      { part: 'dark', column: 3, message: 'spectrum has zero power (no positive value)' },
      { part: 'A-1', column: 4, message: 'part name repeats column 2' }
    ]);
  });

  it('the paced form pauses every n parts and gives the same parts', async () => {
    let pauses = 0;
    const res = await measurePartsPaced(
      file,
      async () => {
        pauses++;
      },
      undefined,
      2
    );
    expect(pauses).toBe(2);
    expect(res.ok && res.parts.map((p) => p.label)).toEqual(['A-1', 'D65-1', 'A-2', 'D65-2']);
  });

  it('a file without part columns is refused', () => {
    const res = measureParts({ wavelengths, columns: [] });
    expect(res.ok).toBe(false);
  });
});
