/**
 * Emission band that is Gaussian in photon energy, expressed as power per nm.
 *
 * Broad-band Ce³⁺/Eu²⁺ emission (5d→4f) is close to Gaussian on an energy scale
 * (configurational-coordinate model; Blasse & Grabmaier, *Luminescent Materials*,
 * Springer 1994, ch. 2) [from memory]; on a wavelength scale it is skewed to the red.
 * E = hc/λ with hc = 1239.84198 eV·nm (CODATA 2018).
 *
 *   G(E) = exp(−(E − E₀)² / (2σ²)),  σ = ΔE_FWHM / (2√(2 ln 2))
 *   S(λ) = G(E(λ)) · |dE/dλ| = G(E(λ)) · hc/λ²       (power per nm)
 *
 * `fwhmNm` is converted to an energy width at the peak, ΔE = hc/(λₚ − f/2) − hc/(λₚ + f/2).
 * `peakNm` is the peak of S(λ) (what a datasheet quotes): setting dS/dλ = 0 gives
 *   E₀ = hc/λₚ − 2σ²λₚ/hc
 * exactly (the hc/λ² Jacobian would otherwise pull the maximum ≈ 2σ_λ²/λₚ to the blue,
 * ≈ 9 nm for a 115 nm wide band at 555 nm). The FWHM in nm is approximate for broad
 * bands (the band is asymmetric in λ). Range: peak 250–1000 nm, FWHM 1–300 nm.
 */
import { GRID_LENGTH, GRID_NM } from '../grid';

export const HC_EV_NM = 1239.84198;

export function gaussianInEnergy(peakNm: number, fwhmNm: number): Float64Array {
  const half = Math.min(fwhmNm / 2, peakNm * 0.95);
  const dE = HC_EV_NM / (peakNm - half) - HC_EV_NM / (peakNm + half);
  const sigma = dE / (2 * Math.sqrt(2 * Math.LN2));
  const e0 = HC_EV_NM / peakNm - (2 * sigma * sigma * peakNm) / HC_EV_NM;
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) {
    const lam = GRID_NM[i];
    const e = HC_EV_NM / lam;
    const z = (e - e0) / sigma;
    out[i] = Math.exp(-0.5 * z * z) * (HC_EV_NM / (lam * lam));
  }
  return out;
}
