/**
 * `evaluateSpectrum`: all metrics of one spectrum (the public entry point of the core).
 * Steps: validate and resample to 360–830 nm at 1 nm (`resample.ts`: linear inside the measured
 * range, zero outside) → XYZ (CIE 1931 2°, Y = 100) and chromaticities → CCT/Duv (Ohno 2014)
 * → CIE 13.3 CRI → CIE 224 / TM-30 → LER → α-opic (CIE S 026) → peak, centroid, FWHM.
 * `evaluateGrid` does the same for a spectrum already on the working grid (solver fast path).
 */
import { uvToCctOhno2014 } from './cct/ohno2014';
import { xyzToUv, xyzToUvPrime, xyzToXy } from './colorimetry/chromaticity';
import { spdToXyz } from './colorimetry/tristimulus';
import { criCie133 } from './cri/cie13-3';
import { SpectrumInputError } from './errors';
import { GRID_LENGTH } from './grid';
import { alphaOpicCieS026 } from './metrics/alpha-opic';
import { lerLmPerW } from './metrics/ler';
import { spectralShape } from './metrics/spectral-shape';
import { resampleToGrid } from './resample';
import { tm30Cie224 } from './tm30/cie224';
import type { EvaluateOptions, PartialSpectrumEvaluation, Spd, SpectrumEvaluation } from './types';

/** Options that keep every metric (the full result type). */
export interface FullEvaluateOptions {
  cri?: true;
  tm30?: true;
}

export function evaluateGrid(grid: Float64Array, options?: FullEvaluateOptions): SpectrumEvaluation;
export function evaluateGrid(grid: Float64Array, options: EvaluateOptions): PartialSpectrumEvaluation;
export function evaluateGrid(grid: Float64Array, options: EvaluateOptions = {}): PartialSpectrumEvaluation {
  if (!(grid instanceof Float64Array) || grid.length !== GRID_LENGTH) {
    throw new SpectrumInputError(`grid spectrum must be a Float64Array of ${GRID_LENGTH} values (360–830 nm, 1 nm)`);
  }
  let total = 0;
  for (let i = 0; i < GRID_LENGTH; i++) {
    const p = grid[i];
    if (!Number.isFinite(p) || p < 0) {
      throw new SpectrumInputError(`grid value at ${360 + i} nm must be finite and ≥ 0`);
    }
    total += p;
  }
  if (!(total > 0)) throw new SpectrumInputError('spectrum has no power inside 360–830 nm');
  const XYZ = spdToXyz(grid);
  if (!Number.isFinite(XYZ[0]) || !Number.isFinite(XYZ[2])) {
    throw new SpectrumInputError('spectrum has no luminous power (Y = 0): chromaticity undefined');
  }
  const [x, y] = xyzToXy(...XYZ);
  const [u, v] = xyzToUv(...XYZ);
  const [uPrime, vPrime] = xyzToUvPrime(...XYZ);
  const { cct, duv } = uvToCctOhno2014(u, v);
  const shape = spectralShape(grid);
  return {
    XYZ,
    x,
    y,
    u,
    v,
    uPrime,
    vPrime,
    cct,
    duv,
    cri: options.cri === false ? null : criCie133(grid, cct),
    tm30: options.tm30 === false ? null : tm30Cie224(grid, cct),
    ler: lerLmPerW(grid),
    alphaOpic: alphaOpicCieS026(grid),
    ...shape
  };
}

/** Evaluates a relative SPD on any increasing wavelength grid (nm). Throws SpectrumInputError. */
export function evaluateSpectrum(spd: Spd, options?: FullEvaluateOptions): SpectrumEvaluation;
export function evaluateSpectrum(spd: Spd, options: EvaluateOptions): PartialSpectrumEvaluation;
export function evaluateSpectrum(spd: Spd, options: EvaluateOptions = {}): PartialSpectrumEvaluation {
  return evaluateGrid(resampleToGrid(spd), options);
}
