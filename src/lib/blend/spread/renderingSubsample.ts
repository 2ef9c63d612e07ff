/**
 * Colour rendering of the predicted parts on a subsample: Ra and R9 (CIE 13.3-1995) need each part's full
 * spectrum, so they are computed for the first `count` parts of the run only (default 200; the parts are
 * independent draws, so the first ones are a simple random sample). Each part's spectrum is the photon budget
 * of `loading/beerLambertPhotonBudget.ts` (no cascade) with the pump and each emission translated by the
 * part's drawn shifts (linear interpolation on the 1 nm grid).
 */
import { GRID_LENGTH, GRID_NM } from '../grid';
import { photonBudgetForDepths, photonShapeOf, type LoadingBasis } from '../loading/beerLambertPhotonBudget';
import { evaluateGrid } from '../../spectral/evaluate';
import { distributionOf, type Distribution } from './figures';
import type { PartDraw } from './simulate';

export const DEFAULT_RENDERING_SUBSAMPLE = 200;

function translate(values: Float64Array, shiftNm: number): Float64Array {
  if (shiftNm === 0) return values;
  const out = new Float64Array(GRID_LENGTH);
  for (let l = 0; l < GRID_LENGTH; l++) {
    const f = l - shiftNm;
    const i = Math.floor(f);
    if (i < 0 || i >= GRID_LENGTH - 1) continue;
    const w = f - i;
    out[l] = values[i] * (1 - w) + values[i + 1] * w;
  }
  return out;
}

export interface RenderingFigures {
  parts: number;
  ra: Distribution;
  r9: Distribution;
}

export function renderingOfDraws(basis: LoadingBasis, draws: readonly PartDraw[]): RenderingFigures {
  const ra = new Float64Array(draws.length);
  const r9 = new Float64Array(draws.length);
  draws.forEach((d, k) => {
    const shifted: LoadingBasis = {
      ...basis,
      pump: translate(basis.pump, d.pumpShiftNm),
      // The photon shape is translated (as in partColour.ts) and turned back into power (÷ λ).
      emission: basis.emission.map((e, i) =>
        d.peakShiftNm[i] === 0 ? e : translate(photonShapeOf(e), d.peakShiftNm[i]).map((v, l) => v / GRID_NM[l])
      ),
      excitationAtPump1: basis.excitationAtPump1
    };
    const cri = evaluateGrid(photonBudgetForDepths(shifted, d.opticalDepths).spd, { tm30: false }).cri;
    ra[k] = cri?.ra ?? NaN;
    r9[k] = cri?.ri[8] ?? NaN;
  });
  return { parts: draws.length, ra: distributionOf(ra), r9: distributionOf(r9) };
}
