/**
 * Package loading model: the Beer–Lambert photon budget of `beerLambertPhotonBudget`
 * (Beer 1852; Lambert 1760; photon budget with Stokes loss as in Schubert, *Light-Emitting
 * Diodes*, 2nd ed., 2006, white-LED chapter) with two package factors, applied around the
 * unchanged forward model:
 *   S_pkg(λ) = S(λ; α, IQE·s) + (e − 1)·P(λ)·T(λ)
 * e = pump escape: extraction of unconverted blue relative to the model (1 = as modelled);
 * s = IQE scale: the phosphors' effective quantum efficiency relative to the datasheet
 * (it also scales the cascade's re-emission). P·T is the leaked pump, with the same
 * Beer–Lambert exponent as the forward model. Units: S per unit pump radiant power (W/nm per W of pump).
 * Semi-empirical package factors fitted to builds are common practice; they lump
 * scattering and extraction that the layer model leaves out.
 */
import { KM_LM_PER_W } from '../../spectral/metrics/ler';
import { xyzToXy } from '../../spectral/colorimetry/chromaticity';
import { tristimulus } from '../basis';
import { GRID_LENGTH, radiantPower } from '../grid';
import { CIE1931_2DEG_CMF } from '../../spectral/data/cie1931-2deg-cmf';
import { beerLambertPhotonBudget, opticalDepthsOf, type LoadingBasis } from '../loading/beerLambertPhotonBudget';
import type { DispenseGeometry, GeometrySpec } from '../loading/dispenseGeometry';

export interface PackageParameters {
  /** Absorption at the pump per phosphor, 1/(wt %·mm). */
  absorptionPerWtPctMm: number[];
  /** Pump escape factor e (1 = as modelled). */
  pumpEscape: number;
  /** IQE scale s on every phosphor (1 = datasheet). */
  iqeScale: number;
}

export interface PackageOptics {
  cascade?: boolean;
  cascadePathFactor?: number;
  /** How the package is dispensed (default 'fixedMass'); 'fixedVolume' needs the phosphors' densities in the basis. */
  geometry?: DispenseGeometry;
  siliconeDensityGPerCm3?: number;
}

export interface PackageOutput {
  spd: Float64Array;
  xy: [number, number];
  /** Output radiant power per watt of pump. */
  wPerPumpW: number;
  /** Output luminous flux per watt of pump (K_m = 683.002 lm/W, CIE 018:2019). */
  lmPerPumpW: number;
}

export function packageSpd(
  basis: LoadingBasis,
  params: PackageParameters,
  concentrationsWtPct: number[],
  pathLengthMm: number,
  optics: PackageOptics = {}
): Float64Array {
  const alpha = params.absorptionPerWtPctMm;
  const geometry: GeometrySpec = {
    geometry: optics.geometry ?? 'fixedMass',
    ...(optics.siliconeDensityGPerCm3 !== undefined ? { siliconeDensityGPerCm3: optics.siliconeDensityGPerCm3 } : {})
  };
  const full = beerLambertPhotonBudget(
    { ...basis, absorptionPerWtPctMm: alpha, iqe: basis.iqe.map((q) => q * params.iqeScale) },
    concentrationsWtPct,
    pathLengthMm,
    optics.cascade ?? false,
    optics.cascadePathFactor ?? 1,
    geometry
  );
  if (params.pumpEscape === 1) return full.spd;
  // τᵢ = αᵢ·gᵢ·L with gᵢ the effective loading of the dispense geometry, as in the forward model.
  const loading = concentrationsWtPct.map((c) => Math.max(0, c));
  const aL = opticalDepthsOf({ ...basis, absorptionPerWtPctMm: alpha }, loading, pathLengthMm, geometry);
  const out = Float64Array.from(full.spd);
  for (let l = 0; l < GRID_LENGTH; l++) {
    const p = basis.pump[l];
    if (p === 0) continue;
    let k = 0;
    for (let i = 0; i < aL.length; i++) k += aL[i] * (basis.excitationAtPump1[i]?.[l] ?? 1);
    out[l] += (params.pumpEscape - 1) * p * Math.exp(-k); // the leaked pump P·T, Beer–Lambert as in the forward model
  }
  return out;
}

/** Colour point (CIE 15:2004 §7, CIE 1931 2°) and output of a package SPD. */
export function packageObservables(spd: Float64Array): PackageOutput {
  const [X, Y, Z] = tristimulus(spd);
  const yBar = CIE1931_2DEG_CMF.yBar;
  let v = 0;
  for (let l = 0; l < GRID_LENGTH; l++) v += spd[l] * yBar[l];
  return { spd, xy: xyzToXy(X, Y, Z), wPerPumpW: radiantPower(spd), lmPerPumpW: KM_LM_PER_W * v };
}
