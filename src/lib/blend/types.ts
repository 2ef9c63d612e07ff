/**
 * Shared types of the blend model and solver (Phosforge).
 *
 * Spectra are plain `{ wavelengths, values }` records (nm, relative power per nm),
 * exactly the spectral core's `Spd`, so they cross the API as JSON. Internally every
 * component is resampled onto the core's 1 nm grid, 360–830 nm (see `grid.ts`).
 *
 * Component order everywhere in this module: index 0 is the pump, indices 1..n are
 * the phosphors in the order given. Ratio vectors follow that order.
 */
import type { Spd } from '../spectral/types';

export type { Spd };

/** Parametric pump: a split Gaussian in wavelength (asymmetry 0 = symmetric). */
export interface ParametricPump {
  peakNm: number;
  fwhmNm: number;
  /**
   * −0.9…0.9: the blue (short) half-width is fwhm/2·(1 − asymmetry), the red (long)
   * half-width fwhm/2·(1 + asymmetry). InGaN emission has a longer red tail, so 0.1–0.3
   * is typical [from memory].
   */
  asymmetry?: number;
}

export interface PumpSpec {
  id: string;
  name: string;
  /** A measured SPD; takes precedence over `parametric`. */
  spectrum?: Spd;
  parametric?: ParametricPump;
}

export interface PhosphorSpec {
  id: string;
  name: string;
  /** Generic chemistry description, e.g. "garnet, Ce-activated". */
  family?: string;
  /** Emission SPD (any scale; normalised internally to unit radiant power). */
  emission: Spd;
  /** Relative excitation/absorption spectrum (any scale). Needed for the cascade. */
  excitation?: Spd;
  /** Internal quantum efficiency, 0–1. */
  iqe: number;
  /**
   * Absorption coefficient per (wt % · mm) of effective path, at `absorptionReferenceNm`
   * (default: the pump peak). Rescaled to the pump through the excitation spectrum.
   */
  absorptionPerWtPctMm?: number;
  absorptionReferenceNm?: number;
  densityGPerCm3?: number;
  costPerKg?: number;
}

export interface BlendComponents {
  pump: PumpSpec;
  /** 1–5 phosphors for mixing; the solver needs 2–5. */
  phosphors: PhosphorSpec[];
}

/** Parameters of the loading (Beer–Lambert photon budget) model. */
export interface LoadingParams {
  /** Effective optical path length through the phosphor layer (mm). */
  pathLengthMm: number;
  /** First-order re-absorption of phosphor emission by phosphors with an excitation spectrum. */
  cascade?: boolean;
  /**
   * Path of converted light relative to the pump path, for the cascade (default 1:
   * both are effective, scattering-lengthened paths) [from memory; calibratable].
   */
  cascadePathFactor?: number;
  /** Silicone density (g/cm³), default 1.1 [from memory]. */
  siliconeDensityGPerCm3?: number;
  /**
   * Dispense geometry (see loading/dispenseGeometry.ts): 'fixedMass' (default; a fixed slurry
   * mass per package, exponent linear in wt %) or 'fixedVolume' (a cavity filled to a fixed
   * volume; volume fractions from the phosphor and silicone densities).
   */
  geometry?: 'fixedMass' | 'fixedVolume';
  /**
   * Pump optical power per area of the layer (W/mm²), used only to turn wt % into
   * grams per lumen for the cost objective. Default 0.05 [invented order of magnitude
   * for a mid-power package].
   */
  pumpIrradianceWPerMm2?: number;
}
