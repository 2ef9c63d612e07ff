/** A small made-up loading basis (Gaussian pump and phosphors) for the spread tests. */
import { GRID_LENGTH, GRID_NM } from '../../../src/lib/blend/grid';
import type { LoadingBasis } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';

function gaussian(peak: number, sigma: number): Float64Array {
  const g = new Float64Array(GRID_LENGTH);
  for (let l = 0; l < GRID_LENGTH; l++) g[l] = Math.exp(-0.5 * ((GRID_NM[l] - peak) / sigma) ** 2);
  return g;
}

function unitPower(g: Float64Array): Float64Array {
  const s = g.reduce((a, b) => a + b, 0);
  return g.map((v) => v / s);
}

function excitation(peak: number, sigma: number, pumpNm: number): Float64Array {
  const g = gaussian(peak, sigma);
  const ref = Math.exp(-0.5 * ((pumpNm - peak) / sigma) ** 2);
  return g.map((v) => v / ref);
}

export const PUMP_PEAK_NM = 450;

/** Blue pump + green and red phosphors with sloping excitation across the blue. */
export function testBasis(): LoadingBasis {
  return {
    pump: unitPower(gaussian(PUMP_PEAK_NM, 9)),
    emission: [unitPower(gaussian(535, 32)), unitPower(gaussian(630, 30))],
    excitationAtPump1: [excitation(430, 35, PUMP_PEAK_NM), excitation(470, 45, PUMP_PEAK_NM)],
    iqe: [0.92, 0.85],
    absorptionPerWtPctMm: [0.1, 0.05]
  };
}

export const TEST_CONCENTRATIONS = [9, 6];
export const TEST_PATH_MM = 1;
