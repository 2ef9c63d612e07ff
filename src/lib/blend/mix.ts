/**
 * `mix`: the SPD and every core metric of a blend given either optical fractions
 * (superposition model, Ohno 2005) or phosphor concentrations + path length (Beer–Lambert
 * loading model, with optional first-order cascade and the dispense geometry). Backs
 * `POST /api/v1/mix`; wt % adding up to 100 or more are refused (422).
 * Units: fractions dimensionless (normalised here), wt % of total slurry, mm.
 * The returned SPD is per unit radiant power of output (optical) or per unit pump power
 * (loading); only its shape matters to the metrics.
 */
import { BlendInputError } from './errors';
import { evaluateGrid } from '../spectral/evaluate';
import type { SpectrumEvaluation } from '../spectral/types';
import { prepareBasis } from './basis';
import type { Recipe } from './correction';
import { gridToSpd } from './grid';
import { beerLambertPhotonBudget } from './loading/beerLambertPhotonBudget';
import { LoadingRefusedError } from './loading/concentrationsForFractions';
import { type Sensitivity, loadingSensitivities, opticalSensitivities } from './sensitivities';
import { normaliseRatios, superposeSpd } from './superposition';
import type { BlendComponents, Spd } from './types';

export type MixRatios = Recipe;

export interface MixResult {
  spd: Spd;
  evaluation: SpectrumEvaluation;
  /** Radiant-power fractions of the output, pump leak first. */
  opticalFractions: number[];
  loading: { concentrationsWtPct: number[]; pumpTransmission: number; radiantEfficiency: number } | null;
  /** Δx, Δy, ΔCCT, ΔDuv per +1 % of each knob (components for optical, phosphors for loading). */
  sensitivities: Sensitivity[];
}

export function mix(components: BlendComponents, ratios: MixRatios): MixResult {
  const basis = prepareBasis(components);
  if (ratios.kind === 'optical') {
    if (ratios.fractions.length !== basis.components.length) {
      throw new BlendInputError(`fractions: expected ${basis.components.length} values (pump first), got ${ratios.fractions.length}`);
    }
    const w = normaliseRatios(ratios.fractions);
    const spd = superposeSpd(basis, w);
    return {
      spd: gridToSpd(spd),
      evaluation: evaluateGrid(spd),
      opticalFractions: w,
      loading: null,
      sensitivities: opticalSensitivities(basis, w)
    };
  }
  if (!basis.loading) throw new BlendInputError('loading ratios need absorptionPerWtPctMm on every phosphor');
  const c = ratios.concentrationsWtPct;
  if (c.length !== components.phosphors.length) {
    throw new BlendInputError(`concentrationsWtPct: expected ${components.phosphors.length} values, got ${c.length}`);
  }
  const total = c.reduce((a, b) => a + b, 0);
  if (!(total < 100)) throw new LoadingRefusedError(`the phosphors add up to ${total.toFixed(1)} wt %; a slurry must stay below 100 wt %`);
  const p = ratios.loading;
  const geometry = { geometry: p.geometry, siliconeDensityGPerCm3: p.siliconeDensityGPerCm3 };
  const res = beerLambertPhotonBudget(basis.loading, c, p.pathLengthMm, p.cascade ?? false, p.cascadePathFactor ?? 1, geometry);
  return {
    spd: gridToSpd(res.spd),
    evaluation: evaluateGrid(res.spd),
    opticalFractions: res.opticalFractions,
    loading: { concentrationsWtPct: c, pumpTransmission: res.pumpTransmission, radiantEfficiency: res.radiantEfficiency },
    sensitivities: loadingSensitivities(basis, c, p)
  };
}
