/**
 * The designer's live loop (pure; runs in the browser): the component basis is prepared once
 * per component set (`prepareBasis`: resampled to the 1 nm grid, unit radiant power, XYZ), then
 * every change of the shares superposes the basis (Ohno, Opt. Eng. 44 (2005) 111302) and
 * evaluates the result with the full spectral core (`evaluateGrid`: CCT/Duv, CIE 13.3, TM-30, LER)
 * plus the colour sensitivity of each share (`opticalSensitivities`: ΔCCT, ΔDuv per +1 %).
 */
import { prepareBasis, type Basis } from '../blend/basis';
import { opticalSensitivities, type Sensitivity } from '../blend/sensitivities';
import { superposeSpd } from '../blend/superposition';
import { evaluateGrid } from '../spectral/evaluate';
import { xyzToXy, type Pair } from '../spectral/colorimetry/chromaticity';
import type { SpectrumEvaluation } from '../spectral/types';
import type { BlendComponents } from '../blend/types';
import { normaliseShares } from './shares';

export interface LiveFrame {
  /** Optical fractions used, pump leak first, Σ = 1. */
  fractions: number[];
  /** Total SPD on the 360–830 nm, 1 nm grid (unit radiant power). */
  spd: Float64Array;
  evaluation: SpectrumEvaluation;
  /** Δx, Δy, ΔCCT, ΔDuv for +1 % (relative) of each component's share, pump first. */
  sensitivities: Sensitivity[];
  /** Wall time of superposition + evaluation, ms. */
  computeMs: number;
}

export interface LiveEvaluator {
  basis: Basis;
  /** CIE 1931 x,y of each component, pump first. */
  componentsXy: Pair[];
  evaluate(fractions: readonly number[]): LiveFrame;
}

const now = () => (typeof performance !== 'undefined' ? performance.now() : Date.now());

export function createLiveEvaluator(components: BlendComponents): LiveEvaluator {
  const basis = prepareBasis(components);
  return {
    basis,
    componentsXy: basis.components.map((c) => xyzToXy(...c.xyz)),
    evaluate(raw) {
      if (raw.length !== basis.components.length) throw new RangeError(`expected ${basis.components.length} shares, got ${raw.length}`);
      const started = now();
      const fractions = normaliseShares(raw);
      const spd = superposeSpd(basis, fractions);
      const evaluation = evaluateGrid(spd);
      const sensitivities = opticalSensitivities(basis, fractions);
      return { fractions, spd, evaluation, sensitivities, computeMs: now() - started };
    }
  };
}
