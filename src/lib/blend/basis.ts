/**
 * Prepared component basis: every component resampled to the 1 nm grid, normalised
 * to unit radiant power (Êₖ, ∫Êₖ dλ = 1 W), with its CIE 1931 XYZ precomputed.
 *
 * Because XYZ is linear in the spectrum, a mix S = Σ wₖÊₖ has XYZ = M·w with the 3×k
 * matrix M = [XYZ(Ê₀) … XYZ(Ê_{k−1})] (CIE 15:2004 §7, tristimulus integrals; the
 * optical-superposition use is Ohno, Opt. Eng. 44 (2005) 111302) — so chromaticity of
 * any mix costs 3k multiply-adds. XYZ here are Σ S·x̄ Δλ (unscaled, Δλ = 1 nm).
 * CMFs: CIE 1931 2° observer, 1 nm, 360–830 nm, from the core's data tables.
 */
import { BlendInputError } from './errors';
import { gridIndex } from '../spectral/grid';
import { CIE1931_2DEG_CMF } from '../spectral/data/cie1931-2deg-cmf';
import { GRID_LENGTH, GRID_NM, centroidNm, normaliseToUnitPower, toGrid } from './grid';
import { splitGaussian } from './shapes/splitGaussian';
import type { LoadingBasis } from './loading/beerLambertPhotonBudget';
import type { BlendComponents, PumpSpec } from './types';

export interface PreparedComponent {
  id: string;
  name: string;
  role: 'pump' | 'phosphor';
  /** Unit-radiant-power SPD on the grid. */
  spd: Float64Array;
  xyz: [number, number, number];
  centroidNm: number;
  peakNm: number;
}

export interface Basis {
  components: PreparedComponent[];
  /** Inputs of the loading model; null when a phosphor lacks an absorption coefficient. */
  loading: LoadingBasis | null;
  densityGPerCm3: (number | null)[];
  costPerKg: (number | null)[];
  iqe: number[];
}

export function tristimulus(spd: ArrayLike<number>): [number, number, number] {
  let X = 0;
  let Y = 0;
  let Z = 0;
  const { xBar, yBar, zBar } = CIE1931_2DEG_CMF;
  for (let i = 0; i < GRID_LENGTH; i++) {
    const s = spd[i];
    if (s === 0) continue;
    X += s * xBar[i];
    Y += s * yBar[i];
    Z += s * zBar[i];
  }
  return [X, Y, Z];
}

export function pumpGrid(pump: PumpSpec): Float64Array {
  if (pump.spectrum) return toGrid(pump.spectrum);
  if (pump.parametric) {
    const { peakNm, fwhmNm, asymmetry } = pump.parametric;
    return splitGaussian(peakNm, fwhmNm, asymmetry ?? 0);
  }
  throw new BlendInputError(`pump ${pump.name}: give a measured spectrum or parametric { peakNm, fwhmNm }`);
}

function argmax(a: Float64Array): number {
  let best = 0;
  for (let i = 1; i < a.length; i++) if (a[i] > a[best]) best = i;
  return best;
}

function prepared(id: string, name: string, role: 'pump' | 'phosphor', raw: Float64Array): PreparedComponent {
  const spd = normaliseToUnitPower(raw, name);
  return { id, name, role, spd, xyz: tristimulus(spd), centroidNm: centroidNm(spd), peakNm: GRID_NM[argmax(spd)] };
}

export function prepareBasis(input: BlendComponents): Basis {
  const pump = prepared(input.pump.id, input.pump.name, 'pump', pumpGrid(input.pump));
  const phosphors = input.phosphors.map((p) => prepared(p.id, p.name, 'phosphor', toGrid(p.emission)));
  const pumpPeak = argmax(pump.spd);
  const hasAlpha = input.phosphors.every((p) => typeof p.absorptionPerWtPctMm === 'number');
  const alphaAtPump = input.phosphors.map((p) => p.absorptionPerWtPctMm ?? 0);
  const excitation = input.phosphors.map((p, i) => {
    if (!p.excitation) return null;
    const ex = toGrid(p.excitation);
    const atPump = ex[pumpPeak];
    const max = ex[argmax(ex)];
    if (!(atPump > 1e-6 * max)) {
      throw new BlendInputError(`${p.name}: excitation spectrum is ~0 at the pump peak (${GRID_NM[pumpPeak]} nm)`);
    }
    if (p.absorptionReferenceNm !== undefined) {
      const ref = ex[gridIndex(Math.round(p.absorptionReferenceNm))];
      if (!(ref > 0)) throw new BlendInputError(`${p.name}: excitation is 0 at the absorption reference wavelength`);
      alphaAtPump[i] *= atPump / ref;
    }
    for (let l = 0; l < ex.length; l++) ex[l] /= atPump;
    return ex;
  });
  return {
    components: [pump, ...phosphors],
    loading: hasAlpha
      ? {
          pump: pump.spd,
          emission: phosphors.map((p) => p.spd),
          excitationAtPump1: excitation,
          iqe: input.phosphors.map((p) => p.iqe),
          absorptionPerWtPctMm: alphaAtPump,
          densityGPerCm3: input.phosphors.map((p) => p.densityGPerCm3 ?? null)
        }
      : null,
    densityGPerCm3: input.phosphors.map((p) => p.densityGPerCm3 ?? null),
    costPerKg: input.phosphors.map((p) => p.costPerKg ?? null),
    iqe: input.phosphors.map((p) => p.iqe)
  };
}
