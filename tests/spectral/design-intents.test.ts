import { describe, expect, it } from 'vitest';
import { designIntents, describeIntent, evaluateSpectrum, planckSpd, type IntentLevel } from '../../src/lib/spectral/index';
import { CIE_ILLUMINANTS_F } from '../../src/lib/spectral/data/cie-illuminants';
import type { Tm30Result } from '../../src/lib/spectral/types';
import { gridSpd, tableSpd } from './helpers';

/** A TM-30 result with the given Rf, Rg and hue-bin-1 indices (the other bins do not enter Annex E). */
function result(rf: number, rg: number, rfh1: number, rcsh1: number): Tm30Result {
  const bin = { rf: rfh1, rcs: rcsh1, rhs: 0, testAB: [0, 0] as [number, number], refAB: [0, 0] as [number, number] };
  return { rf, rg, bins: [bin, ...Array.from({ length: 15 }, () => ({ ...bin, rf: 90, rcs: 0 }))] };
}
const meets = (r: Tm30Result, level: IntentLevel) => designIntents(r)!.checks.find((c) => c.level === level)!.met;

describe('TM-30-20 Annex E design intents', () => {
  // ANSI/ASHRAE/ICC/USGBC/IES Standard 189.1 (addendum to 2017, §8.3.5.3) quotes "TM-30 Annex E, P2 and F3" as:
  // Rf ≥ 85, Rf,h1 ≥ 85, Rg ≥ 92, −7 % ≤ Rcs,h1 ≤ +19 %. Meeting both levels must be exactly that.
  it('P2 and F3 together are the criteria Standard 189.1 quotes', () => {
    let seed = 7;
    const rnd = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
    for (let i = 0; i < 2000; i++) {
      const [rf, rg, rfh1, rcs] = [70 + 30 * rnd(), 80 + 30 * rnd(), 70 + 30 * rnd(), -0.2 + 0.5 * rnd()];
      const r = result(rf, rg, rfh1, rcs);
      const quoted = rf >= 85 && rfh1 >= 85 && rg >= 92 && rcs >= -0.07 && rcs <= 0.19;
      expect(meets(r, 'P2') && meets(r, 'F3')).toBe(quoted);
    }
  });

  it('names each criterion a level misses', () => {
    const report = designIntents(result(88, 100, 86, 0.2))!;
    expect(report.checks.find((c) => c.level === 'P2')!.misses).toEqual(['Rcs,h1 20 % > 19 %']);
    expect(report.best.fidelity).toBe('F3');
  });

  it('a Planckian source (the reference itself) meets F1 and not the saturating levels', () => {
    // CIE 224: test = reference gives Rf = 100, Rg = 100 and Rcs = 0 in every bin (by definition).
    const report = designIntents(evaluateSpectrum(gridSpd(planckSpd(3000))).tm30)!;
    expect(report.best.fidelity).toBe('F1');
    expect(report.best.vividness).toBeNull(); // vividness asks for more red chroma than the reference (Rcs,h1 > 0)
    expect(report.checks.find((c) => c.level === 'P1')!.misses[0]).toMatch(/^Rcs,h1 0 % < 7 %/);
  });

  it('CIE F2 (cool white fluorescent, Rf ≈ 70) meets no fidelity level', () => {
    // Rf of FL2 ≈ 70 (IES TM-30 reference calculations; from memory): below F3's Rf ≥ 85 (quoted by Standard 189.1).
    const f = CIE_ILLUMINANTS_F;
    const report = designIntents(evaluateSpectrum(tableSpd(f.series.F2, f.startNm, f.stepNm)).tm30)!;
    expect(report.best.fidelity).toBeNull();
  });

  it('is undefined (null) where TM-30 is undefined', () => {
    expect(designIntents(result(NaN, 100, 90, 0))).toBeNull();
  });

  it('marks recalled limits with † and quoted ones without', () => {
    expect(describeIntent('F3')).toBe('Rf ≥ 85, Rf,h1 ≥ 85');
    expect(describeIntent('P2')).toBe('Rf ≥ 75 †, Rg ≥ 92, -7 % ≤ Rcs,h1 ≤ 19 %');
  });
});
