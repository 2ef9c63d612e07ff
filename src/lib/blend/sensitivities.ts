/**
 * Colour sensitivities of a recipe: Δx, Δy, ΔCCT (K) and ΔDuv for a +1 % relative change
 * of each knob, by a forward difference of exactly that size (so the numbers mean what
 * they say, including curvature).
 *   optical basis: wₖ → 1.01·wₖ, then renormalised to Σw = 1 (pump included as a knob);
 *   loading basis: cᵢ → 1.01·cᵢ (wt %), through the Beer–Lambert model.
 * These are the columns of the Jacobian used by formulators' two-knob corrections
 * (common practice). CCT/Duv: Ohno 2014 (core).
 */
import { BlendInputError } from './errors';
import { uvToCct } from '../spectral/cct/index';
import { xyToUv } from '../spectral/colorimetry/chromaticity';
import type { Basis } from './basis';
import { tristimulus } from './basis';
import { beerLambertPhotonBudget } from './loading/beerLambertPhotonBudget';
import { normaliseRatios, superposeXyz, xyOf } from './superposition';
import type { LoadingParams } from './types';

export interface Sensitivity {
  id: string;
  name: string;
  dx: number;
  dy: number;
  dCct: number;
  dDuv: number;
}

export const RELATIVE_STEP = 0.01;

export type ColourModel = (knobs: number[]) => [number, number];

export function opticalColourModel(basis: Basis): ColourModel {
  return (w) => xyOf(superposeXyz(basis, normaliseRatios(w)));
}

export function loadingColourModel(basis: Basis, loading: LoadingParams): ColourModel {
  if (!basis.loading) throw new BlendInputError('loading model needs an absorption coefficient for every phosphor');
  const lb = basis.loading;
  return (c) =>
    xyOf(tristimulus(beerLambertPhotonBudget(lb, c, loading.pathLengthMm, loading.cascade ?? false, loading.cascadePathFactor ?? 1).spd));
}

export function sensitivitiesOf(model: ColourModel, knobs: number[], labels: { id: string; name: string }[]): Sensitivity[] {
  const [x0, y0] = model(knobs);
  const c0 = uvToCct(...xyToUv(x0, y0));
  return knobs.map((k, i) => {
    const p = knobs.slice();
    p[i] = k * (1 + RELATIVE_STEP);
    const [x, y] = model(p);
    const c = uvToCct(...xyToUv(x, y));
    // Only the label of the knob: a prepared component also carries its spectra, which an answer must not repeat.
    return { id: labels[i].id, name: labels[i].name, dx: x - x0, dy: y - y0, dCct: c.cct - c0.cct, dDuv: c.duv - c0.duv };
  });
}

/** Per +1 % of each component's optical fraction (pump first). */
export function opticalSensitivities(basis: Basis, fractions: number[]): Sensitivity[] {
  return sensitivitiesOf(opticalColourModel(basis), normaliseRatios(fractions), basis.components);
}

/** Per +1 % of each phosphor's concentration (wt %). */
export function loadingSensitivities(basis: Basis, concentrationsWtPct: number[], loading: LoadingParams): Sensitivity[] {
  return sensitivitiesOf(loadingColourModel(basis, loading), concentrationsWtPct, basis.components.slice(1));
}
