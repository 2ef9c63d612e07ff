/**
 * Does an emission file hold the whole band? An emission spectrum must fall to a small fraction of
 * its peak at both ends of the file; otherwise its FWHM is measured on a cut-off band and its colour
 * is computed without part of the light (values outside the file count as zero). Thresholds are
 * common practice for spectroradiometer exports: a tail under 2 % of the peak is baseline; an end at
 * 20 % or more inside the visible band (380–780 nm, where the CIE 1931 colour-matching functions of
 * CIE 15:2004 carry the colour) means the emission band itself is missing.
 */
import type { Spd } from '../spectral/types';

export const BASELINE_FRACTION = 0.02;
export const CUT_OFF_FRACTION = 0.2;
export const VISIBLE_BAND_NM: readonly [number, number] = [380, 780];

export interface CoverageCheck {
  /** Why the file cannot be used, or null. */
  refusal: string | null;
  warnings: string[];
}

const pct = (f: number) => `${Math.round(f * 100)} %`;

export function emissionCoverage(spd: Spd): CoverageCheck {
  const n = spd.values.length;
  const peak = Math.max(...spd.values);
  if (!(peak > 0) || n < 2) return { refusal: null, warnings: [] };
  const ends = [
    { side: 'short', nm: spd.wavelengths[0], fraction: spd.values[0] / peak },
    { side: 'long', nm: spd.wavelengths[n - 1], fraction: spd.values[n - 1] / peak }
  ] as const;
  const [lo, hi] = VISIBLE_BAND_NM;
  const cut = ends.filter((e) => e.fraction >= CUT_OFF_FRACTION && e.nm > lo && e.nm < hi);
  if (cut.length) {
    const where = cut.map((e) => `at ${e.nm} nm (${e.side}-wavelength end, still ${pct(e.fraction)} of the peak)`).join(' and ');
    return {
      refusal:
        `the emission is cut off ${where}. The colour computation needs the whole emission band within ${lo}–${hi} nm: ` +
        `export the file over the full band, until the emission falls below ${pct(BASELINE_FRACTION)} of its peak at both ends`,
      warnings: []
    };
  }
  const warnings = ends
    .filter((e) => e.fraction > BASELINE_FRACTION)
    .map(
      (e) =>
        `The emission is still at ${pct(e.fraction)} of its peak at ${e.nm} nm (the ${e.side}-wavelength end of the file): ` +
        'part of the band may be missing, and FWHM and colour may be off.'
    );
  return { refusal: null, warnings };
}
