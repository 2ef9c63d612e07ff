/**
 * Split (two-sided) Gaussian in wavelength: a common empirical model of LED chip
 * emission, which has a steeper short-wavelength edge and a longer red tail
 * (Schubert, *Light-Emitting Diodes*, 2nd ed., Cambridge 2006, ch. 5 on emission
 * spectra — line shapes) [from memory; the split form itself is common practice].
 *
 *   S(λ) = exp(−(λ − λ₀)² / (2σ_b²))  for λ ≤ λ₀,   σ_b = f(1 − a) / (2√(2 ln 2))
 *   S(λ) = exp(−(λ − λ₀)² / (2σ_r²))  for λ > λ₀,   σ_r = f(1 + a) / (2√(2 ln 2))
 *
 * so the FWHM stays f for any asymmetry a (−0.9…0.9) and the peak stays at λ₀.
 * Units nm; range λ₀ 250–1000 nm, f 0.5–300 nm.
 */
import { GRID_LENGTH, GRID_NM } from '../grid';

const FWHM_TO_SIGMA = 1 / (2 * Math.sqrt(2 * Math.LN2));

export function splitGaussian(peakNm: number, fwhmNm: number, asymmetry = 0): Float64Array {
  const a = Math.max(-0.9, Math.min(0.9, asymmetry));
  const sb = fwhmNm * (1 - a) * FWHM_TO_SIGMA;
  const sr = fwhmNm * (1 + a) * FWHM_TO_SIGMA;
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) {
    const d = GRID_NM[i] - peakNm;
    const s = d <= 0 ? sb : sr;
    out[i] = Math.exp(-0.5 * (d / s) * (d / s));
  }
  return out;
}
