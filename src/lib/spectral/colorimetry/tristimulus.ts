/**
 * Tristimulus values X, Y, Z of a spectrum on the working grid.
 * CIE 15:2004 §7.1 eq. 7.1–7.3 [CIE15-2004]: X = k Σ S(λ) x̄(λ) Δλ, etc., with Δλ = 1 nm,
 * summed over 360–830 nm (the full CMF range); k chosen so that Y = 100 for the source itself.
 * Input: Float64Array of length 471 (see `grid.ts`), relative power. Output: [X, Y, Z], Y = 100.
 */
import { cmfFor, type Observer } from './cmf';

export type Xyz = [number, number, number];

/** Unnormalised sums Σ S x̄, Σ S ȳ, Σ S z̄ (Δλ = 1 nm). */
export function tristimulusSums(spd: Float64Array, observer: Observer = '2deg'): Xyz {
  const { xBar, yBar, zBar } = cmfFor(observer);
  let x = 0;
  let y = 0;
  let z = 0;
  for (let i = 0; i < spd.length; i++) {
    const s = spd[i];
    x += s * xBar[i];
    y += s * yBar[i];
    z += s * zBar[i];
  }
  return [x, y, z];
}

/** CIE 15:2004 eq. 7.1–7.3 with k = 100 / Σ S ȳ (light-source colours, Y = 100). */
export function spdToXyz(spd: Float64Array, observer: Observer = '2deg'): Xyz {
  const [x, y, z] = tristimulusSums(spd, observer);
  const k = 100 / y;
  return [x * k, 100, z * k];
}
