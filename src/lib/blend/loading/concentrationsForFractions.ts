/**
 * Inverse of the loading model: phosphor concentrations (wt % of the slurry) that give wanted
 * optical fractions (pump leak first) at an effective path length L.
 *
 * Solved in optical depth (`opticalDepthsForFractions`: τᵢ from the pump leak, then the
 * split), then gᵢ = τᵢ/(αᵢ·L) (Beer–Lambert: the exponent is αᵢ·gᵢ·L), then wt % from gᵢ by the
 * dispense geometry (`dispenseGeometry.ts`). For a fixed slurry mass per package the wt %
 * scale exactly as 1/L. A mix is refused, with the reason, when the model cannot produce it
 * or when it needs 100 wt % of phosphor or more (or, in a fixed volume, the whole cavity).
 */
import { BlendInputError } from '../errors';
import type { LoadingBasis, LoadingResult } from './beerLambertPhotonBudget';
import { type DispenseGeometry, wtPctFromEffective } from './dispenseGeometry';
import { opticalDepthsForFractions } from './opticalDepthsForFractions';

export interface LoadingOptions {
  pathLengthMm: number;
  cascade?: boolean;
  cascadePathFactor?: number;
  geometry?: DispenseGeometry;
  siliconeDensityGPerCm3?: number;
  /** Accepted for compatibility and ignored: the solve always starts from the pump leak. */
  initialWtPct?: number[];
}

export interface ConcentrationSolution {
  concentrationsWtPct: number[];
  /** τᵢ at the pump reference. */
  opticalDepths: number[];
  result: LoadingResult;
  /** Max |wᵢ(c) − wᵢ*| over the fractions. */
  maxFractionError: number;
  /** The wt % reproduce the mix and can be weighed (Σ < 100 wt %). */
  converged: boolean;
  /** Plain sentence why the mix cannot be made, or null. */
  refusal: string | null;
}

/** A mix the loading model cannot turn into a recipe that can be weighed (API → 422). */
export class LoadingRefusedError extends BlendInputError {}

export function concentrationsForFractions(basis: LoadingBasis, wantedFractions: number[], opts: LoadingOptions): ConcentrationSolution {
  const n = basis.emission.length;
  if (wantedFractions.length !== n + 1) throw new BlendInputError('fractions: pump + one per phosphor expected');
  const total = wantedFractions.reduce((a, b) => a + Math.max(0, b), 0);
  const wanted = wantedFractions.map((w) => Math.max(0, w) / (total > 0 ? total : 1));
  const L = opts.pathLengthMm;
  const depth = opticalDepthsForFractions(basis, wanted, opts.cascade ?? false, opts.cascadePathFactor ?? 1);
  const g = depth.opticalDepths.map((t, i) => (t > 0 ? t / (basis.absorptionPerWtPctMm[i] * L) : 0));
  const where = `at ${L} mm`;
  let refusal: string | null = null;
  let c = g;
  if (!depth.converged) {
    refusal =
      wanted[0] <= 0
        ? 'The mix has no pump leak: it would need an infinitely thick phosphor layer.'
        : `The loading model cannot produce this mix ${where} (closest: off by ${depth.maxFractionError.toFixed(4)} in optical fraction).`;
  } else {
    const conv = wtPctForDepths(basis, depth.opticalDepths, opts);
    if (conv.ok) c = conv.concentrationsWtPct;
    else refusal = conv.reason;
  }
  return {
    concentrationsWtPct: c,
    opticalDepths: depth.opticalDepths,
    result: depth.result,
    maxFractionError: depth.maxFractionError,
    converged: refusal === null,
    refusal
  };
}

/** As `concentrationsForFractions`, but throws `LoadingRefusedError` with the reason when refused. */
export function requireConcentrations(basis: LoadingBasis, wantedFractions: number[], opts: LoadingOptions): ConcentrationSolution {
  const sol = concentrationsForFractions(basis, wantedFractions, opts);
  if (sol.refusal) throw new LoadingRefusedError(sol.refusal);
  return sol;
}

/** wt % for optical depths τ at a path length (gᵢ = τᵢ/(αᵢ·L), then the geometry), or the plain reason they cannot be weighed. */
export function wtPctForDepths(
  basis: LoadingBasis,
  opticalDepths: number[],
  opts: Pick<LoadingOptions, 'pathLengthMm' | 'geometry' | 'siliconeDensityGPerCm3'>
): { ok: true; concentrationsWtPct: number[] } | { ok: false; reason: string } {
  const L = opts.pathLengthMm;
  const g = opticalDepths.map((t, i) => (t > 0 ? t / (basis.absorptionPerWtPctMm[i] * L) : 0));
  const spec = { geometry: opts.geometry, densityGPerCm3: basis.densityGPerCm3, siliconeDensityGPerCm3: opts.siliconeDensityGPerCm3 };
  const conv = wtPctFromEffective(g, spec);
  if (conv.ok) return conv;
  const gSum = g.reduce((a, b) => a + b, 0);
  const shortest = ((L * gSum) / 100).toPrecision(3);
  const longer = (opts.geometry ?? 'fixedMass') === 'fixedMass' ? ` A path of at least ${shortest} mm would bring it under 100 wt %.` : '';
  return { ok: false, reason: `This mix cannot be made at ${L} mm: ${conv.reason}, and a slurry must stay below 100 wt %.${longer}` };
}
