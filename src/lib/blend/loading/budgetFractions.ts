/**
 * Output fractions only (pump leak first) of the photon budget in `beerLambertPhotonBudget.ts`,
 * for the inner loops of the inverse: the same equations (Beer–Lambert pump absorption,
 * photon budget with Stokes loss, first-order re-absorption), with everything that does not
 * depend on τ precomputed once per basis and the cascade summed over absorbers in O(n) per
 * wavelength. No SPD is built. Tests hold it equal to the full model.
 */
import { GRID_LENGTH, GRID_NM } from '../grid';
import { type LoadingBasis, photonShapeOf } from './beerLambertPhotonBudget';

interface Prepared {
  pumpIdx: Int32Array;
  pumpPower: Float64Array;
  pumpPhotons: Float64Array;
  /** exᵢ at the pump support, per phosphor (1 where no spectrum). */
  exAtPump: Float64Array[];
  /** Σ shapeᵢ(λ)/λ: radiant power per emitted photon of phosphor i. */
  powerPerPhoton: Float64Array;
  /** shapeᵢ(λ), per phosphor, full grid. */
  shape: Float64Array[];
}

const PUMP_TAIL = 1e-12;
const cache = new WeakMap<LoadingBasis, Prepared>();

function prepare(basis: LoadingBasis): Prepared {
  const hit = cache.get(basis);
  if (hit) return hit;
  const idx: number[] = [];
  let pumpMax = 0;
  for (let l = 0; l < GRID_LENGTH; l++) pumpMax = Math.max(pumpMax, basis.pump[l]);
  // The pump's far tails (< 1e-12 of its peak) change fractions by < 1e-10: skipped here.
  for (let l = 0; l < GRID_LENGTH; l++) if (basis.pump[l] > PUMP_TAIL * pumpMax) idx.push(l);
  const pumpIdx = Int32Array.from(idx);
  const shape = basis.emission.map(photonShapeOf);
  const prepared: Prepared = {
    pumpIdx,
    pumpPower: Float64Array.from(idx, (l) => basis.pump[l]),
    pumpPhotons: Float64Array.from(idx, (l) => basis.pump[l] * GRID_NM[l]),
    exAtPump: basis.excitationAtPump1.map((ex) => Float64Array.from(idx, (l) => (ex ? ex[l] : 1))),
    powerPerPhoton: Float64Array.from(shape, (s) => {
      let p = 0;
      for (let l = 0; l < GRID_LENGTH; l++) p += s[l] / GRID_NM[l];
      return p;
    }),
    shape
  };
  cache.set(basis, prepared);
  return prepared;
}

const SMALL_K = 1e-12;

/** Optical fractions (pump leak first, Σ = 1) for optical depths τ. */
export function budgetFractionsForDepths(basis: LoadingBasis, tau: number[], cascade = false, cascadePathFactor = 1): number[] {
  const p = prepare(basis);
  const n = tau.length;
  const absorbed = new Float64Array(n);
  let pumpOut = 0;
  for (let s = 0; s < p.pumpIdx.length; s++) {
    let k = 0;
    for (let i = 0; i < n; i++) k += tau[i] * p.exAtPump[i][s];
    const t = Math.exp(-k);
    pumpOut += p.pumpPower[s] * t;
    if (k < SMALL_K) continue;
    const share = (p.pumpPhotons[s] * (1 - t)) / k;
    for (let i = 0; i < n; i++) absorbed[i] += share * tau[i] * p.exAtPump[i][s];
  }
  const primary = Array.from(absorbed, (a, i) => basis.iqe[i] * a);
  const power = new Array<number>(n).fill(0);
  if (!cascade) {
    for (let i = 0; i < n; i++) power[i] = primary[i] * p.powerPerPhoton[i];
  } else {
    const secondary = new Float64Array(n);
    const ex = basis.excitationAtPump1;
    for (let l = 0; l < GRID_LENGTH; l++) {
      let k = 0;
      for (let j = 0; j < n; j++) if (ex[j]) k += tau[j] * (ex[j] as Float64Array)[l] * cascadePathFactor;
      const esc = Math.exp(-k);
      let lost = 0;
      for (let i = 0; i < n; i++) {
        const photons = primary[i] * p.shape[i][l];
        power[i] += (photons * esc) / GRID_NM[l];
        lost += photons * (1 - esc);
      }
      if (k < SMALL_K) continue;
      for (let j = 0; j < n; j++) if (ex[j]) secondary[j] += (lost * tau[j] * (ex[j] as Float64Array)[l] * cascadePathFactor) / k;
    }
    for (let j = 0; j < n; j++) power[j] += basis.iqe[j] * secondary[j] * p.powerPerPhoton[j];
  }
  const total = pumpOut + power.reduce((a, b) => a + b, 0);
  return total > 0 ? [pumpOut / total, ...power.map((v) => v / total)] : [1, ...power.map(() => 0)];
}
