/**
 * Which model produced a candidate's spectrum and metrics, with a plain label for the
 * designer: the optical superposition (Ohno, Opt. Eng. 44 (2005) 111302), or the Beer–Lambert
 * loading model with first-order re-absorption at a path length (loading/beerLambertPhotonBudget.ts).
 */
import type { Basis } from '../basis';
import type { LoadingParams } from '../types';

export interface SpectrumModel {
  kind: 'opticalSuperposition' | 'loadingWithReabsorption';
  /** e.g. "loading model with re-absorption, 0.30 mm" or "optical superposition". */
  label: string;
}

export function spectrumModelOf(basis: Basis, loading: LoadingParams | undefined): SpectrumModel {
  if (loading?.cascade && basis.loading) {
    const geometry = loading.geometry === 'fixedVolume' ? ', cavity of fixed volume' : '';
    const label = `loading model with re-absorption, ${loading.pathLengthMm.toFixed(2)} mm${geometry}`;
    return { kind: 'loadingWithReabsorption', label };
  }
  if (loading && basis.loading) {
    const label = `optical superposition; wt % from the loading model at ${loading.pathLengthMm.toFixed(2)} mm`;
    return { kind: 'opticalSuperposition', label };
  }
  return { kind: 'opticalSuperposition', label: 'optical superposition' };
}
