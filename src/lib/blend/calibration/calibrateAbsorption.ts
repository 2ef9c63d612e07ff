/**
 * Calibration of the loading model: fit each phosphor's absorption coefficient at the
 * pump, αᵢ (1/(wt %·mm)), from measured builds (recipe concentrations + measured SPD),
 * by Levenberg–Marquardt (Levenberg 1944; Marquardt 1963) on spectral residuals.
 *
 * Identifiability: the model sees αᵢ and L only through the products αᵢ·L (Beer–Lambert
 * exponent αᵢcᵢL; the cascade uses αⱼcⱼLκ too), so α and L cannot be fitted together.
 * L is held at the given value and αᵢ is fitted; the products αᵢ·L are what the data
 * determine (report them; re-scale α if L is later changed). IQE is held fixed: with
 * builds at one loading, IQE and α trade off; builds spanning ≥ 2 loadings separate them
 * only weakly, so IQE should come from the supplier datasheet [common practice].
 * One build with n phosphors already gives n spectral shares for n unknowns; more builds
 * average out noise and test the model.
 *
 * Residual: rᵢ(λ) = Ŝ_model(λ) − Ŝ_meas(λ) on 380–780 nm at 2 nm, both normalised to unit
 * power on 360–830 nm. Parameters θᵢ = ln αᵢ keep αᵢ > 0; standard errors by the delta
 * method, se(αᵢ) = αᵢ·se(θᵢ).
 */
import { BlendInputError } from '../errors';
import { gridIndex } from '../../spectral/grid';
import { xyzToXy } from '../../spectral/colorimetry/chromaticity';
import { tristimulus } from '../basis';
import { normaliseToUnitPower } from '../grid';
import { beerLambertPhotonBudget, type LoadingBasis } from '../loading/beerLambertPhotonBudget';
import { levenbergMarquardt, type LmStopReason } from './levenbergMarquardt';

export interface CalibrationBuild {
  concentrationsWtPct: number[];
  /** Measured SPD on the 1 nm grid (any scale). */
  measured: Float64Array;
}

export interface CalibrationReport {
  absorptionPerWtPctMm: number[];
  standardErrors: number[];
  /** αᵢ·L, the identifiable quantities (1/wt %). */
  alphaLProducts: number[];
  pathLengthMm: number;
  builds: {
    rmsSpectralResidual: number;
    /** RMS residual relative to the measured peak of the normalised SPD. */
    relativeRms: number;
    measuredXy: [number, number];
    predictedXy: [number, number];
    predictedFractions: number[];
  }[];
  iterations: number;
  converged: boolean;
  /** Why the fit stopped (Levenberg–Marquardt stopping test or failure). */
  reason: LmStopReason;
}

const FIT_START = gridIndex(380);
const FIT_END = gridIndex(780);
const FIT_STEP = 2;
/** ln of the largest α tried, 1000 per (wt %·mm): keeps a wandering fit finite. */
const MAX_LN_ALPHA = Math.log(1000);

export function calibrateAbsorption(
  basis: LoadingBasis,
  builds: CalibrationBuild[],
  opts: { pathLengthMm: number; cascade?: boolean; cascadePathFactor?: number; initialAlpha?: number[] }
): CalibrationReport {
  if (builds.length === 0) throw new BlendInputError('calibration needs at least one measured build');
  const n = basis.emission.length;
  const measured = builds.map((b, i) => normaliseToUnitPower(b.measured, `build ${i + 1}`));
  const start = (opts.initialAlpha ?? basis.absorptionPerWtPctMm).map((a) => Math.log(a > 0 ? a : 0.1));
  const modelWith = (cascade: boolean) => (theta: number[], b: CalibrationBuild) =>
    beerLambertPhotonBudget(
      { ...basis, absorptionPerWtPctMm: theta.map((t) => Math.exp(Math.min(t, MAX_LN_ALPHA))) },
      b.concentrationsWtPct,
      opts.pathLengthMm,
      cascade,
      opts.cascadePathFactor ?? 1
    );
  const residualWith =
    (cascade: boolean) =>
    (theta: number[]): number[] => {
      const model = modelWith(cascade);
      const r: number[] = [];
      builds.forEach((b, k) => {
        const s = normaliseToUnitPower(model(theta, b).spd, 'model');
        for (let l = FIT_START; l <= FIT_END; l += FIT_STEP) r.push(s[l] - measured[k][l]);
      });
      return r;
    };
  const cascade = opts.cascade ?? false;
  const model = modelWith(cascade);
  // Robust start: scan a common factor on α (0.01–100×) and keep the best, then LM with
  // steps limited to a factor e per iteration (the saturated regime is flat and LM can
  // otherwise run off along it).
  const fit = residualWith(cascade);
  const cost = (t: number[]) => fit(t).reduce((a, v) => a + v * v, 0);
  let best = start;
  let bestCost = cost(start);
  for (let k = -8; k <= 8; k++) {
    const t = start.map((v) => v + (k / 4) * Math.LN10);
    const c = cost(t);
    if (c < bestCost) {
      best = t;
      bestCost = c;
    }
  }
  const lm = levenbergMarquardt(fit, best, { maxIterations: 100, tolerance: 1e-12, maxStep: 1 });
  const alpha = lm.params.map((t) => Math.exp(Math.min(t, MAX_LN_ALPHA)));
  const perBuild = builds.map((b, k) => {
    const res = model(lm.params, b);
    const s = normaliseToUnitPower(res.spd, 'model');
    let ss = 0;
    let count = 0;
    let peak = 0;
    for (let l = FIT_START; l <= FIT_END; l += FIT_STEP) {
      ss += (s[l] - measured[k][l]) ** 2;
      count++;
      peak = Math.max(peak, measured[k][l]);
    }
    const rms = Math.sqrt(ss / count);
    const [Xm, Ym, Zm] = tristimulus(measured[k]);
    const [Xp, Yp, Zp] = tristimulus(s);
    return {
      rmsSpectralResidual: rms,
      relativeRms: peak > 0 ? rms / peak : NaN,
      measuredXy: xyzToXy(Xm, Ym, Zm),
      predictedXy: xyzToXy(Xp, Yp, Zp),
      predictedFractions: res.opticalFractions
    };
  });
  return {
    absorptionPerWtPctMm: alpha,
    standardErrors: lm.standardErrors.map((se, i) => alpha[i] * se),
    alphaLProducts: alpha.map((a) => a * opts.pathLengthMm),
    pathLengthMm: opts.pathLengthMm,
    builds: perBuild,
    iterations: lm.iterations,
    converged: lm.converged && alpha.length === n,
    reason: lm.reason
  };
}
