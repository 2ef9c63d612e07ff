/**
 * Luminous efficacy of radiation (LER), CIE 15:2004 / CIE S 017 (ILV 17-729) [CIE15-2004]:
 *   K = K_m · Σ V(λ) S(λ) Δλ / Σ S(λ) Δλ,   K_m = 683.002 lm/W (CIE 018:2019, photopic) [CIE018-2019]
 * with V(λ) = ȳ(λ) of the CIE 1931 2° observer.
 * Range: BOTH sums over 360–830 nm at 1 nm (the working grid); radiant power outside
 * 360–830 nm is not counted. (380–780 nm is also common practice; it gives higher
 * values for spectra with power in 360–380 or 780–830 nm.) Units: lm/W.
 */
import { CMF_1931_2DEG } from '../colorimetry/cmf';

export const KM_LM_PER_W = 683.002;

export function lerLmPerW(spd: Float64Array): number {
  const v = CMF_1931_2DEG.yBar;
  let num = 0;
  let den = 0;
  for (let i = 0; i < spd.length; i++) {
    num += spd[i] * v[i];
    den += spd[i];
  }
  return (KM_LM_PER_W * num) / den;
}
