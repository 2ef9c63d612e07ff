/**
 * Measured builds of a package and how the fit compares the model with them.
 *
 * Colour residual in MacAdam steps: n² = g11Δx² + 2g12ΔxΔy + g22Δy² (MacAdam, JOSA 32
 * (1942) 247; 1-step ellipse shapes from IEC 60081 interpolated at the build's CCT, as in
 * spectral/ansi/macadam.ts), written as two residuals through the Cholesky factor of g so
 * that their squares add up to n². CCT of the measured point by Ohno (2014).
 * Spectral shape (when an SPD is measured): unit-power spectra compared on 380–780 nm at
 * 2 nm; an RMS misfit of 1 % of the measured peak counts as one step [weighting chosen for
 * this fit]. Output (W or lm per pump W, when measured): a 2 % error counts as one step
 * [weighting chosen for this fit; sphere flux is rarely better than a few per cent, from memory].
 * Path per build: given, or from the dispense mass at a fixed footprint (layer thickness ∝
 * dispensed mass, 'fixedMass' geometry), or the package's reference path.
 */
import { BlendInputError } from '../errors';
import { gridIndex } from '../../spectral/grid';
import { xyToUv } from '../../spectral/colorimetry/chromaticity';
import { uvToCct } from '../../spectral/cct/index';
import { ellipseForCct } from '../../spectral/ansi/macadam';
import { normaliseToUnitPower } from '../grid';
import type { PackageOutput } from './packageLoadingModel';

export interface PackageBuild {
  label: string;
  concentrationsWtPct: number[];
  pathLengthMm?: number;
  dispenseMassMg?: number;
  /** Measured CIE 1931 x,y (from the SPD when only the SPD is given). */
  measuredXy: [number, number];
  /** Measured SPD on the 1 nm grid (any scale). */
  measuredSpd?: Float64Array;
  outputWPerPumpW?: number;
  outputLmPerPumpW?: number;
}

export interface PackageGeometry {
  /** Effective optical path at the reference dispense mass (mm). */
  pathLengthMm: number;
  /** Reference dispense mass per package (mg); needed when builds give a dispense mass. */
  dispenseMassMg?: number;
}

const FIT_START = gridIndex(380);
const FIT_END = gridIndex(780);
const FIT_STEP = 2;
const SPECTRAL_STEPS_PER_RELATIVE_RMS = 100;
const OUTPUT_STEPS_PER_RELATIVE_ERROR = 50;

export function pathForBuild(build: PackageBuild, geometry: PackageGeometry): number {
  if (build.pathLengthMm !== undefined) return build.pathLengthMm;
  if (build.dispenseMassMg !== undefined) {
    if (!geometry.dispenseMassMg) throw new BlendInputError(`${build.label}: a dispense mass needs the package's reference dispense mass`);
    return (geometry.pathLengthMm * build.dispenseMassMg) / geometry.dispenseMassMg;
  }
  return geometry.pathLengthMm;
}

/** Per-build comparison, prepared once (ellipse metric, normalised measured SPD). */
export interface BuildComparator {
  residuals(model: PackageOutput): number[];
  steps(model: PackageOutput): number;
}

export function comparatorFor(build: PackageBuild): BuildComparator {
  const [x0, y0] = build.measuredXy;
  const { cct: cctK } = uvToCct(...xyToUv(x0, y0));
  const e = ellipseForCct(Number.isFinite(cctK) ? cctK : 4000);
  const th = (e.thetaDeg * Math.PI) / 180;
  const c = Math.cos(th);
  const s = Math.sin(th);
  const g11 = (c * c) / (e.a * e.a) + (s * s) / (e.b * e.b);
  const g12 = s * c * (1 / (e.a * e.a) - 1 / (e.b * e.b));
  const g22 = (s * s) / (e.a * e.a) + (c * c) / (e.b * e.b);
  const l11 = Math.sqrt(g11);
  const l21 = g12 / l11;
  const l22 = Math.sqrt(g22 - l21 * l21);
  const measured = build.measuredSpd ? normaliseToUnitPower(build.measuredSpd, build.label) : null;
  let peak = 0;
  let points = 0;
  if (measured) for (let l = FIT_START; l <= FIT_END; l += FIT_STEP, points++) peak = Math.max(peak, measured[l]);
  const colour = (m: PackageOutput): [number, number] => {
    const dx = m.xy[0] - x0;
    const dy = m.xy[1] - y0;
    return [l11 * dx + l21 * dy, l22 * dy];
  };
  return {
    steps: (m) => Math.hypot(...colour(m)),
    residuals(m) {
      const r = colour(m);
      if (measured) {
        const s = normaliseToUnitPower(m.spd, 'model');
        const w = SPECTRAL_STEPS_PER_RELATIVE_RMS / (peak * Math.sqrt(points));
        for (let l = FIT_START; l <= FIT_END; l += FIT_STEP) r.push((s[l] - measured[l]) * w);
      }
      if (build.outputWPerPumpW !== undefined) r.push((m.wPerPumpW / build.outputWPerPumpW - 1) * OUTPUT_STEPS_PER_RELATIVE_ERROR);
      if (build.outputLmPerPumpW !== undefined) r.push((m.lmPerPumpW / build.outputLmPerPumpW - 1) * OUTPUT_STEPS_PER_RELATIVE_ERROR);
      return r;
    }
  };
}

export const hasOutput = (b: PackageBuild): boolean => b.outputWPerPumpW !== undefined || b.outputLmPerPumpW !== undefined;
