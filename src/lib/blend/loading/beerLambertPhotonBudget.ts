/**
 * Loading model: phosphor mass fractions in silicone → output SPD and optical fractions,
 * by a Beer–Lambert photon budget with an optional first-order re-absorption cascade.
 *
 * Sources: Beer–Lambert attenuation (Beer 1852; Lambert 1760); the photon-budget form
 * used for phosphor-converted LEDs as in Tan et al., Sci. Rep. 8 (2018) (Beer–Lambert +
 * Mie layer model) and Schubert, *Light-Emitting Diodes*, 2nd ed. (2006), ch. on white
 * LEDs (Stokes loss) [equations below written from memory].
 *
 * Per wavelength λ on the 1 nm grid (c in wt %, L in mm, α in 1/(wt %·mm)):
 *   αᵢ(λ) = αᵢ · exᵢ(λ)/exᵢ(λ_pump)       (αᵢ alone if no excitation spectrum is given)
 *   k(λ)  = Σᵢ αᵢ(λ) cᵢ L,   T(λ) = exp(−k(λ))                     (Beer–Lambert)
 *   N_p(λ) = P(λ)·λ                                 (photons ∝ power × λ / hc)
 *   aᵢ    = Σ_λ N_p(λ) (1 − T(λ)) · αᵢ(λ)cᵢL / k(λ)      (share ∝ αᵢcᵢ)
 *   qᵢ    = IQEᵢ · aᵢ,   nᵢ(λ) = qᵢ · eᵢ(λ)   (eᵢ = photon emission shape, Σ = 1)
 * Cascade (first order, only absorbers with an excitation spectrum; κ = cascadePathFactor):
 *   k′(λ) = Σⱼ αⱼ(λ) cⱼ L κ;  nᵢ escapes as nᵢ(λ)e^(−k′);  j absorbs nᵢ(λ)(1 − e^(−k′))αⱼcⱼ/Σ
 *   and re-emits IQEⱼ × that with its own shape; secondary light is not re-absorbed.
 * Power out: S(λ) = P(λ)T(λ) + Σᵢ n_i,out(λ)/λ, so the Stokes loss λ_pump/λ_em is applied
 * per wavelength. Scattering, extraction and package losses are not modelled; they are
 * absorbed into the calibrated α·L products (see calibration/calibrateAbsorption.ts).
 * The output depends on c and L only through the optical depths τᵢ = αᵢ·gᵢ·L (gᵢ = cᵢ for a
 * fixed slurry mass per package; see dispenseGeometry.ts for a cavity of fixed volume), so
 * `photonBudgetForDepths` is the model proper and the same τ at any L gives the same light.
 */
import { GRID_LENGTH, GRID_NM } from '../grid';
import { type GeometrySpec, effectiveWtPct } from './dispenseGeometry';

export interface LoadingBasis {
  /** Pump SPD, unit radiant power on the grid. */
  pump: Float64Array;
  /** Phosphor emission SPDs, unit radiant power on the grid. */
  emission: Float64Array[];
  /** Relative excitation on the grid, scaled to 1 at the pump peak; null = none given. */
  excitationAtPump1: (Float64Array | null)[];
  iqe: number[];
  absorptionPerWtPctMm: number[];
  /** Phosphor densities (g/cm³), for a cavity filled to a fixed volume. */
  densityGPerCm3?: (number | null)[];
}

export interface LoadingResult {
  /** Output SPD per unit pump radiant power. */
  spd: Float64Array;
  /** Radiant power of each component in the output (pump leak first). */
  componentPower: number[];
  /** Output SPD of each component (pump leak first); Σ = spd. */
  componentSpd: Float64Array[];
  /** Optical (radiant power) fractions, pump leak first; Σ = 1. */
  opticalFractions: number[];
  /** Power-weighted pump transmission. */
  pumpTransmission: number;
  /** Output radiant power / pump radiant power. */
  radiantEfficiency: number;
}

const SMALL_K = 1e-12;

/** Optical depths τᵢ = αᵢ·gᵢ·L at the pump reference (Beer–Lambert exponent per phosphor). */
export function opticalDepthsOf(
  basis: LoadingBasis,
  concentrationsWtPct: number[],
  pathLengthMm: number,
  geometry: GeometrySpec = {}
): number[] {
  const g = effectiveWtPct(concentrationsWtPct, { densityGPerCm3: basis.densityGPerCm3, ...geometry });
  return basis.absorptionPerWtPctMm.map((a, i) => a * g[i] * pathLengthMm);
}

export function beerLambertPhotonBudget(
  basis: LoadingBasis,
  concentrationsWtPct: number[],
  pathLengthMm: number,
  cascade = false,
  cascadePathFactor = 1,
  geometry: GeometrySpec = {}
): LoadingResult {
  return photonBudgetForDepths(basis, opticalDepthsOf(basis, concentrationsWtPct, pathLengthMm, geometry), cascade, cascadePathFactor);
}

/** The photon budget for given optical depths τᵢ (≥ 0) at the pump reference. */
export function photonBudgetForDepths(basis: LoadingBasis, opticalDepths: number[], cascade = false, cascadePathFactor = 1): LoadingResult {
  const n = basis.emission.length;
  const aL = opticalDepths.map((t) => Math.max(0, t));
  const absorbed = new Float64Array(n);
  const pumpOut = new Float64Array(GRID_LENGTH);
  let pumpPower = 0;
  for (let l = 0; l < GRID_LENGTH; l++) {
    const p = basis.pump[l];
    if (p === 0) continue;
    let k = 0;
    for (let i = 0; i < n; i++) k += aL[i] * (basis.excitationAtPump1[i]?.[l] ?? 1);
    const t = Math.exp(-k);
    pumpOut[l] = p * t;
    pumpPower += p * t;
    const photonsAbsorbed = p * GRID_NM[l] * (1 - t);
    if (k < SMALL_K) continue;
    for (let i = 0; i < n; i++) {
      absorbed[i] += (photonsAbsorbed * aL[i] * (basis.excitationAtPump1[i]?.[l] ?? 1)) / k;
    }
  }
  const primary = Array.from({ length: n }, (_, i) => basis.iqe[i] * absorbed[i]);
  const secondary = new Float64Array(n);
  const esc = new Float64Array(GRID_LENGTH).fill(1);
  const photonShape = basis.emission.map(photonShapeOf);
  if (cascade) {
    const ex = basis.excitationAtPump1;
    for (let l = 0; l < GRID_LENGTH; l++) {
      let k = 0;
      for (let j = 0; j < n; j++) if (ex[j]) k += aL[j] * (ex[j] as Float64Array)[l] * cascadePathFactor;
      const e = Math.exp(-k);
      esc[l] = e;
      if (k < SMALL_K) continue;
      // Photons of every primary emitter lost at λ, shared among the absorbers ∝ αⱼ(λ)cⱼ.
      let lost = 0;
      for (let i = 0; i < n; i++) lost += primary[i] * photonShape[i][l] * (1 - e);
      for (let j = 0; j < n; j++) {
        if (ex[j]) secondary[j] += (basis.iqe[j] * lost * aL[j] * (ex[j] as Float64Array)[l] * cascadePathFactor) / k;
      }
    }
  }
  const spd = Float64Array.from(pumpOut);
  const componentPower = [pumpPower];
  const componentSpd = [pumpOut];
  for (let i = 0; i < n; i++) {
    let power = 0;
    const shape = photonShape[i];
    const own = new Float64Array(GRID_LENGTH);
    componentSpd.push(own);
    for (let l = 0; l < GRID_LENGTH; l++) {
      const photons = primary[i] * shape[l] * esc[l] + secondary[i] * shape[l];
      const s = photons / GRID_NM[l];
      spd[l] += s;
      own[l] = s;
      power += s;
    }
    componentPower.push(power);
  }
  const total = componentPower.reduce((a, b) => a + b, 0);
  let pumpIn = 0;
  for (let l = 0; l < GRID_LENGTH; l++) pumpIn += basis.pump[l];
  return {
    spd,
    componentPower,
    componentSpd,
    opticalFractions: componentPower.map((p) => (total > 0 ? p / total : 0)),
    pumpTransmission: pumpIn > 0 ? pumpPower / pumpIn : 0,
    radiantEfficiency: pumpIn > 0 ? total / pumpIn : 0
  };
}

const shapeCache = new WeakMap<Float64Array, Float64Array>();

/** Photon-number shape of a power SPD (∝ S·λ), normalised to Σ = 1; cached per array. */
export function photonShapeOf(power: Float64Array): Float64Array {
  const hit = shapeCache.get(power);
  if (hit) return hit;
  const out = new Float64Array(GRID_LENGTH);
  let s = 0;
  for (let l = 0; l < GRID_LENGTH; l++) {
    out[l] = power[l] * GRID_NM[l];
    s += out[l];
  }
  if (s > 0) for (let l = 0; l < GRID_LENGTH; l++) out[l] /= s;
  shapeCache.set(power, out);
  return out;
}
