import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { judgeBatch, type MeasuredPart } from '../../../src/lib/measurements/index';
import { metricsAt } from './support';

// A fixed file of five measured parts (per-part values as a spectrometer export lists them; invented
// Kestrel Hollow parts). Expected values are worked by hand below: mean x̄ = Σx/n, sample SD
// s = √(Σ(x − x̄)²/(n − 1)) (ISO 3534-1:2006 §1.17, Bessel's correction).
const text = readFileSync(fileURLToPath(new URL('./fixtures/five-parts.csv', import.meta.url)), 'utf8');
const rows = Papa.parse<Record<string, string>>(text.trim(), { header: true }).data;
const num = (s: string) => (s === '' ? null : Number(s));
const parts: MeasuredPart[] = rows.map((r) => ({
  label: r.part,
  metrics: metricsAt(Number(r.x), Number(r.y), {
    cct: Number(r.cct),
    duv: Number(r.duv),
    ra: num(r.ra),
    r9: num(r.r9),
    rf: num(r.rf),
    rg: num(r.rg),
    ler: Number(r.ler)
  })
}));
// Target: ANSI C78.377 3000 K bin; floors of a "90 CRI" part (Ra ≥ 90) [common practice].
const batch = judgeBatch(
  parts,
  { kind: 'ansiBin', nominalCct: 3000 },
  { tolerance: { kind: 'sdcm', steps: 7 }, floors: { raMin: 90 }, requireTargetBin: true }
);
const s = batch.summary;

describe('summary statistics of five-parts.csv (worked by hand)', () => {
  const cases = [
    // x: 0.4330 … 0.4370 → x̄ = 0.4350; deviations −2,−1,0,1,2 (×10⁻³) → Σd² = 10×10⁻⁶; s = √(2.5×10⁻⁶) = 0.0015811.
    { q: 'x', n: 5, mean: 0.435, sd: 0.0015811, min: 0.433, max: 0.437, tol: 1e-7 },
    // y: 0.4020, 0.4030, 0.4030, 0.4040, 0.4030 → ȳ = 0.4030; Σd² = 2×10⁻⁶; s = √(0.5×10⁻⁶) = 0.00070711.
    { q: 'y', n: 5, mean: 0.403, sd: 0.00070711, min: 0.402, max: 0.404, tol: 1e-8 },
    // CCT: 3000, 3050, 2950, 3100, 2900 → 3000 K; Σd² = 0 + 2500 + 2500 + 10000 + 10000 = 25000; s = √6250 = 79.057 K.
    { q: 'cct', n: 5, mean: 3000, sd: 79.057, min: 2900, max: 3100, tol: 1e-3 },
    // Duv: 0.0010, 0, −0.0010, 0.0020, 0.0030 → 0.0010; Σd² = 10×10⁻⁶; s = 0.0015811.
    { q: 'duv', n: 5, mean: 0.001, sd: 0.0015811, min: -0.001, max: 0.003, tol: 1e-7 },
    // Ra: 90, 92, 88, 91, 89 → 90; Σd² = 0 + 4 + 4 + 1 + 1 = 10; s = √2.5 = 1.5811.
    { q: 'ra', n: 5, mean: 90, sd: 1.5811, min: 88, max: 92, tol: 1e-4 },
    // R9: 50, 60, 40, 55, 45 → 50; Σd² = 0 + 100 + 100 + 25 + 25 = 250; s = √62.5 = 7.9057.
    { q: 'r9', n: 5, mean: 50, sd: 7.9057, min: 40, max: 60, tol: 1e-4 },
    // Rf: 90, 91, (missing), 89, 90 → n = 4, 90; Σd² = 2; s = √(2/3) = 0.8165.
    { q: 'rf', n: 4, mean: 90, sd: 0.8165, min: 89, max: 91, tol: 1e-4 },
    // Rg: 100, 101, 99, 100, 100 → 100; Σd² = 2; s = √0.5 = 0.7071.
    { q: 'rg', n: 5, mean: 100, sd: 0.7071, min: 99, max: 101, tol: 1e-4 },
    // LER: 300, 310, 290, 305, 295 → 300 lm/W; Σd² = 250; s = 7.9057.
    { q: 'ler', n: 5, mean: 300, sd: 7.9057, min: 290, max: 310, tol: 1e-4 }
  ] as const;
  it.each(cases)('$q', ({ q, n, mean, sd, min, max, tol }) => {
    const st = s.stats[q]!;
    expect(st.n).toBe(n);
    expect(Math.abs(st.mean - mean)).toBeLessThanOrEqual(tol);
    expect(Math.abs(st.sd - sd)).toBeLessThanOrEqual(tol);
    expect(st.min).toBeCloseTo(min, 10);
    expect(st.max).toBeCloseTo(max, 10);
  });

  it('yield: Ra 88 and 89 miss the Ra ≥ 90 floor, so 3 of 5 pass (60 %)', () => {
    expect(s.parts).toBe(5);
    expect(s.passed).toBe(3);
    expect(s.yieldFraction).toBeCloseTo(0.6, 12);
    expect(batch.parts.filter((p) => !p.verdict.pass).map((p) => p.label)).toEqual(['KH-P003', 'KH-P005']);
    expect(s.failures).toEqual([{ code: 'raMin', count: 2 }]);
    expect(batch.parts[2].verdict.failures[0].message).toBe('Ra 88.0 < 90');
  });

  it('every part lies in the 3000 K quadrangle (corners of ANSI C78.377-2015)', () => {
    expect(s.inTargetBin).toBe(5);
    expect(s.bins).toEqual([{ nominalCct: 3000, count: 5 }]);
  });

  it('mean point and its offset from the 3000 K bin centre (0.4339, 0.4033; ANSI C78.377-2015)', () => {
    expect(s.meanPoint!.x).toBeCloseTo(0.435, 10);
    expect(s.meanPoint!.y).toBeCloseTo(0.403, 10);
    // 0.4350 − 0.4339 = +0.0011; 0.4030 − 0.4033 = −0.0003 (bin centre to the transcription's 4 decimals).
    expect(s.meanOffset!.dx).toBeCloseTo(0.0011, 4);
    expect(s.meanOffset!.dy).toBeCloseTo(-0.0003, 4);
  });

  it('histograms hold every part', () => {
    expect(s.histograms.cct.reduce((a, b) => a + b.count, 0)).toBe(5);
    expect(s.histograms.ra.reduce((a, b) => a + b.count, 0)).toBe(5);
  });
});

describe('an empty batch', () => {
  it('has no statistics and no yield', () => {
    const e = judgeBatch(
      [],
      { kind: 'ansiBin', nominalCct: 3000 },
      { tolerance: { kind: 'sdcm', steps: 7 }, floors: {}, requireTargetBin: true }
    ).summary;
    expect(e.yieldFraction).toBeNull();
    expect(e.stats.x).toBeNull();
    expect(e.meanPoint).toBeNull();
  });
});
