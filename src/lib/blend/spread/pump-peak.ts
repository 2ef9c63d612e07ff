/** The pump's peak on the working grid: where the variation model counts chip wavelengths from. */
import { GRID_NM } from '../grid';
import type { LoadingBasis } from '../loading/beerLambertPhotonBudget';

export function pumpPeakNm(basis: Pick<LoadingBasis, 'pump'>): number {
  let peak = 0;
  for (let l = 1; l < basis.pump.length; l++) if (basis.pump[l] > basis.pump[peak]) peak = l;
  return GRID_NM[peak];
}
