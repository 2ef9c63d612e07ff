/**
 * Phosphor cost per 1,000 lm of output (currency of `costPerKg`).
 *
 * Loading model (when α for every phosphor and L are given): concentrations cᵢ for the
 * optical mix (Beer–Lambert inverse), then per watt of pump optical power
 *   slurry areal mass  m″ = ρ_slurry · L / E_pump                  (g per pump W)
 *   1/ρ_slurry = Σ (cᵢ/100)/ρᵢ + (1 − Σcᵢ/100)/ρ_silicone          (mass-fraction mixing)
 *   phosphor mass      mᵢ = (cᵢ/100) · m″
 *   lumens             Φ_v = η_rad · LER          (η_rad = output W / pump W)
 *   cost / 1000 lm     = 1000 · Σ mᵢ·priceᵢ/1000 / Φ_v
 * L (mm) doubles as the layer thickness here — a simplification: L is an effective,
 * scattering-lengthened path, so absolute costs are indicative; ratios between recipes hold.
 *
 * Thin-layer proxy (no loading parameters): a phosphor that emits Pᵢ watts absorbed
 * Pᵢ/(IQEᵢ·λ̄_pump/λ̄ᵢ) watts of pump light; with the same absorbed power per gram for all
 * phosphors (ABSORBED_W_PER_G, invented scale) the mass per 1,000 lm is
 *   mᵢ = wᵢ · (1000/LER) / (IQEᵢ · λ̄_pump/λ̄ᵢ) / ABSORBED_W_PER_G.
 * The scale drops out of any ranking; only relative costs are meaningful.
 * Sources: Beer–Lambert photon budget [from memory]; densities [common practice].
 */
import type { Basis } from '../basis';
import { concentrationsForFractions } from '../loading/concentrationsForFractions';
import { slurryDensityGPerCm3 } from '../loading/dispenseGeometry';
import type { LoadingParams } from '../types';

export const ABSORBED_W_PER_G = 10;
export const DEFAULT_SILICONE_DENSITY = 1.1;
export const DEFAULT_PUMP_IRRADIANCE_W_PER_MM2 = 0.05;

export type CostBasis = 'loadingModel' | 'thinLayerProxy';

export function costBasisFor(basis: Basis, loading: LoadingParams | undefined): CostBasis {
  return loading && basis.loading && basis.densityGPerCm3.every((d) => d !== null) ? 'loadingModel' : 'thinLayerProxy';
}

/** Cost per 1,000 lm, or null when a price is missing or the mix cannot be weighed (never priced on unconverged wt %). */
export function phosphorCostPer1000Lm(basis: Basis, fractions: number[], ler: number, loading: LoadingParams | undefined): number | null {
  if (basis.costPerKg.some((c) => c === null) || !(ler > 0)) return null;
  const price = basis.costPerKg as number[];
  if (costBasisFor(basis, loading) === 'loadingModel' && loading && basis.loading) {
    const sol = concentrationsForFractions(basis.loading, fractions, loading);
    return sol.converged ? loadingCostPer1000Lm(basis, sol.concentrationsWtPct, sol.result.radiantEfficiency, ler, loading) : null;
  }
  const pumpCentroid = basis.components[0].centroidNm;
  let cost = 0;
  for (let i = 1; i < basis.components.length; i++) {
    const stokes = pumpCentroid / basis.components[i].centroidNm;
    const grams = (fractions[i] * (1000 / ler)) / (basis.iqe[i - 1] * stokes) / ABSORBED_W_PER_G;
    cost += grams * (price[i - 1] / 1000);
  }
  return cost;
}

/** Cost per 1,000 lm of a recipe in wt % (loading model), or null when a price or density is missing. */
export function loadingCostPer1000Lm(
  basis: Basis,
  concentrationsWtPct: number[],
  radiantEfficiency: number,
  ler: number,
  loading: LoadingParams
): number | null {
  if (basis.costPerKg.some((c) => c === null) || basis.densityGPerCm3.some((d) => d === null) || !(ler > 0)) return null;
  const price = basis.costPerKg as number[];
  const c = concentrationsWtPct;
  const rho = slurryDensityGPerCm3(c, basis.densityGPerCm3 as number[], loading.siliconeDensityGPerCm3 ?? DEFAULT_SILICONE_DENSITY);
  const slurryGPerPumpW = (rho * 1e-3 * loading.pathLengthMm) / (loading.pumpIrradianceWPerMm2 ?? DEFAULT_PUMP_IRRADIANCE_W_PER_MM2);
  const lmPerPumpW = radiantEfficiency * ler;
  const costPerPumpW = c.reduce((s, ci, i) => s + (ci / 100) * slurryGPerPumpW * (price[i] / 1000), 0);
  return (1000 * costPerPumpW) / lmPerPumpW;
}
