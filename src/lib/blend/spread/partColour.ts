/**
 * Fast colour of one built part: the Beer–Lambert photon budget of `loading/beerLambertPhotonBudget.ts`
 * (no re-absorption cascade) folded straight into tristimulus sums, CIE 15:2004 eq. 7.1–7.3, so a part costs
 * one pass over the pump's support instead of full spectra.
 *   pump leak:  Σ_λ P(λ−δ) e^(−k(λ)) x̄(λ),  k(λ) = Σᵢ τᵢ exᵢ(λ)                (Beer–Lambert)
 *   phosphor i: qᵢ = IQEᵢ Σ_λ P(λ−δ) λ (1 − e^(−k)) τᵢ exᵢ(λ)/k;  XYZᵢ = qᵢ Σ eᵢ(λ−s)/λ · x̄(λ)  (Stokes loss per λ)
 * δ = pump shift, s = phosphor peak shift (translations, linear interpolation on the 1 nm grid).
 * The phosphor tables are precomputed on a 0.25 nm grid of peak shifts (±PEAK_RANGE_NM).
 */
import { GRID_LENGTH, GRID_NM } from '../grid';
import { photonShapeOf, type LoadingBasis } from '../loading/beerLambertPhotonBudget';
import { CMF_1931_2DEG } from '../../spectral/colorimetry/cmf';

export const PEAK_RANGE_NM = 15;
const PEAK_STEP_NM = 0.25;
const PEAK_STEPS = Math.round((2 * PEAK_RANGE_NM) / PEAK_STEP_NM) + 1;
/** Channels per table entry: X, Y, Z, radiant power. */
const CH = 4;

export interface PartModel {
  n: number;
  /** Pump support: grid indices where P > 0 and P there. */
  pumpIdx: Int32Array;
  pumpVal: Float64Array;
  /** Per phosphor, excitation (or 1) on the whole grid. */
  excitation: Float64Array[];
  iqe: number[];
  /** Per phosphor, XYZ + power per absorbed photon at PEAK_STEPS peak shifts. */
  emissionTable: Float64Array[];
  /** Scratch: photons absorbed per phosphor. */
  absorbed: Float64Array;
  /** CMF + 1 on the grid, interleaved X,Y,Z,1. */
  cmf4: Float64Array;
}

function cmf4(): Float64Array {
  const { xBar: x, yBar: y, zBar: z } = CMF_1931_2DEG;
  const out = new Float64Array(GRID_LENGTH * CH);
  for (let l = 0; l < GRID_LENGTH; l++) {
    out[l * CH] = x[l];
    out[l * CH + 1] = y[l];
    out[l * CH + 2] = z[l];
    out[l * CH + 3] = 1;
  }
  return out;
}

/** Linear interpolation of a gridded array at fractional index f (0 outside). */
function at(values: ArrayLike<number>, f: number): number {
  const i = Math.floor(f);
  if (i < 0 || i >= GRID_LENGTH - 1) return i === GRID_LENGTH - 1 && f === i ? values[i] : 0;
  const w = f - i;
  return values[i] * (1 - w) + values[i + 1] * w;
}

export function buildPartModel(basis: LoadingBasis): PartModel {
  const c4 = cmf4();
  const idx: number[] = [];
  const val: number[] = [];
  // Pump values below 1e-12 of its peak are dropped: they move x,y by far less than 1e-9.
  const floor = 1e-12 * basis.pump.reduce((a, b) => Math.max(a, b), 0);
  for (let l = 0; l < GRID_LENGTH; l++) {
    if (basis.pump[l] > floor) {
      idx.push(l);
      val.push(basis.pump[l]);
    }
  }
  const n = basis.emission.length;
  const excitation = basis.excitationAtPump1.map((e) => e ?? new Float64Array(GRID_LENGTH).fill(1));
  const emissionTable = basis.emission.map((e) => {
    const shape = photonShapeOf(e);
    const t = new Float64Array(PEAK_STEPS * CH);
    for (let k = 0; k < PEAK_STEPS; k++) {
      const s = -PEAK_RANGE_NM + k * PEAK_STEP_NM;
      for (let l = 0; l < GRID_LENGTH; l++) {
        const photons = at(shape, l - s);
        if (photons === 0) continue;
        const p = photons / GRID_NM[l];
        for (let c = 0; c < CH; c++) t[k * CH + c] += p * c4[l * CH + c];
      }
    }
    return t;
  });
  return {
    n,
    pumpIdx: Int32Array.from(idx),
    pumpVal: Float64Array.from(val),
    excitation,
    iqe: [...basis.iqe],
    emissionTable,
    absorbed: new Float64Array(n),
    cmf4: c4
  };
}

/**
 * XYZ and radiant power of one part into `out` (length 4): optical depths τ (at the pump reference),
 * pump shift δ (nm) and per-phosphor peak shifts (nm, clamped to ±PEAK_RANGE_NM).
 */
export function partXyz(
  m: PartModel,
  tau: ArrayLike<number>,
  pumpShiftNm: number,
  peakShiftNm: ArrayLike<number>,
  out: Float64Array
): void {
  const n = m.n;
  const absorbed = m.absorbed.fill(0);
  let X = 0;
  let Y = 0;
  let Z = 0;
  let P = 0;
  const c4 = m.cmf4;
  for (let j = 0; j < m.pumpIdx.length; j++) {
    const f = m.pumpIdx[j] + pumpShiftNm;
    const i0 = Math.floor(f);
    if (i0 < 0 || i0 >= GRID_LENGTH - 1) continue;
    const w = f - i0;
    const p = m.pumpVal[j];
    let k = 0;
    for (let i = 0; i < n; i++) {
      const ex = m.excitation[i];
      k += tau[i] * (ex[i0] * (1 - w) + ex[i0 + 1] * w);
    }
    const t = Math.exp(-k);
    const leak = p * t;
    X += leak * (c4[i0 * CH] * (1 - w) + c4[(i0 + 1) * CH] * w);
    Y += leak * (c4[i0 * CH + 1] * (1 - w) + c4[(i0 + 1) * CH + 1] * w);
    Z += leak * (c4[i0 * CH + 2] * (1 - w) + c4[(i0 + 1) * CH + 2] * w);
    P += leak;
    if (k < 1e-12) continue;
    const photonsAbsorbed = (p * (GRID_NM[i0] + w) * (1 - t)) / k;
    for (let i = 0; i < n; i++) {
      const ex = m.excitation[i];
      absorbed[i] += photonsAbsorbed * tau[i] * (ex[i0] * (1 - w) + ex[i0 + 1] * w);
    }
  }
  for (let i = 0; i < n; i++) {
    const q = m.iqe[i] * absorbed[i];
    const s = Math.min(PEAK_RANGE_NM, Math.max(-PEAK_RANGE_NM, peakShiftNm[i] ?? 0));
    const kf = (s + PEAK_RANGE_NM) / PEAK_STEP_NM;
    const k0 = Math.min(PEAK_STEPS - 2, Math.floor(kf));
    const w = kf - k0;
    const tab = m.emissionTable[i];
    X += q * (tab[k0 * CH] * (1 - w) + tab[(k0 + 1) * CH] * w);
    Y += q * (tab[k0 * CH + 1] * (1 - w) + tab[(k0 + 1) * CH + 1] * w);
    Z += q * (tab[k0 * CH + 2] * (1 - w) + tab[(k0 + 1) * CH + 2] * w);
    P += q * (tab[k0 * CH + 3] * (1 - w) + tab[(k0 + 1) * CH + 3] * w);
  }
  out[0] = X;
  out[1] = Y;
  out[2] = Z;
  out[3] = P;
}
