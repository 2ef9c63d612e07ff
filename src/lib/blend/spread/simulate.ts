/**
 * Monte Carlo of production spread: N parts of one recipe, each drawn from the variation model and
 * put through the loading model's photon budget (`partColour.ts`). Per part, independently:
 *   pump peak shift δ (from the pump spread), slurry mass factor m ~ N(1, CV) (all τ scale with the
 *   phosphor mass in the package), weighing factor wᵢ ~ U(1 ± tol) per line, absorption factor
 *   aᵢ ~ N(1, CV) per phosphor, emission peak shift sᵢ ~ N(0, σ) per phosphor; τᵢ = τ⁰ᵢ·m·wᵢ·aᵢ.
 * Lot and weighing draws are per part, i.e. each part is treated as from its own lot and batch — the
 * widest reading of those sources. Measurement noise is added in u′v′ (CIE 15:2004 §8.1), isotropic.
 * Random numbers: sfc32, seeded (`prng.ts`); the same seed and inputs give bit-identical clouds.
 */
import { xyzToUvPrime, uvPrimeToXy } from '../../spectral/colorimetry/chromaticity';
import { seededRandom, type Random } from './prng';
import { partXyz, type PartModel } from './partColour';
import type { PumpSpread, VariationModel } from './model';

export interface SpreadRecipe {
  /** Nominal optical depths τ⁰ᵢ at the pump reference (see `opticalDepthsOf`). */
  opticalDepths: number[];
  /** Peak wavelength of the basis pump (nm): the zero of the pump shift. */
  pumpPeakNm: number;
}

/** What was drawn for one part (kept for the first parts, for the rendering subsample). */
export interface PartDraw {
  pumpShiftNm: number;
  opticalDepths: number[];
  peakShiftNm: number[];
}

export interface SpreadCloud {
  x: Float64Array;
  y: Float64Array;
  /** Luminous efficacy of radiation per part (lm/W), 683 Σ S ȳ / Σ S (CIE 15:2004). */
  ler: Float64Array;
  /** Draws of the first `keepDraws` parts. */
  draws: PartDraw[];
}

export const DEFAULT_PARTS = 10_000;
export const MAX_PARTS = 100_000;
const KM = 683;

function pumpDraw(spread: PumpSpread, peakNm: number, rnd: Random): () => number {
  if (spread.kind === 'uniform') return () => (2 * rnd.next() - 1) * spread.halfRangeNm;
  if (spread.kind === 'normal') return () => spread.meanOffsetNm + spread.sigmaNm * rnd.normal();
  if (spread.kind === 'empirical') {
    const w = spread.wavelengthsNm;
    return () => w[Math.min(w.length - 1, Math.floor(rnd.next() * w.length))] - peakNm;
  }
  const bins = spread.bins;
  const shares = bins.every((b) => b.sharePct !== null) ? bins.map((b) => b.sharePct as number) : bins.map(() => 1);
  const total = shares.reduce((a, b) => a + b, 0) || 1;
  return () => {
    let r = rnd.next() * total;
    let i = 0;
    while (i < bins.length - 1 && r >= shares[i]) r -= shares[i++];
    const b = bins[i];
    return b.fromNm + rnd.next() * (b.toNm - b.fromNm) - peakNm;
  };
}

export function simulateSpread(
  part: PartModel,
  recipe: SpreadRecipe,
  model: VariationModel,
  parts: number,
  seed: number,
  keepDraws = 0
): SpreadCloud {
  const rnd = seededRandom(seed);
  const n = part.n;
  const x = new Float64Array(parts);
  const y = new Float64Array(parts);
  const ler = new Float64Array(parts);
  const tau = new Float64Array(n);
  const peak = new Float64Array(n);
  const xyz = new Float64Array(4);
  const pump = pumpDraw(model.pump, recipe.pumpPeakNm, rnd);
  const massCv = model.slurryMassCvPct / 100;
  const tol = model.weighingTolerancePct / 100;
  const absCv = model.absorptionLotCvPct / 100;
  const peakSd = model.peakLotSigmaNm;
  const noise = model.measurementSigmaUvPrime;
  const draws: PartDraw[] = [];
  for (let p = 0; p < parts; p++) {
    const delta = pump();
    const m = massCv > 0 ? Math.max(0, 1 + massCv * rnd.normal()) : 1;
    for (let i = 0; i < n; i++) {
      const w = tol > 0 ? 1 + tol * (2 * rnd.next() - 1) : 1;
      const a = absCv > 0 ? Math.max(0, 1 + absCv * rnd.normal()) : 1;
      tau[i] = recipe.opticalDepths[i] * m * w * a;
      peak[i] = peakSd > 0 ? peakSd * rnd.normal() : 0;
    }
    partXyz(part, tau, delta, peak, xyz);
    if (p < keepDraws) draws.push({ pumpShiftNm: delta, opticalDepths: Array.from(tau), peakShiftNm: Array.from(peak) });
    let [u, v] = xyzToUvPrime(xyz[0], xyz[1], xyz[2]);
    if (noise > 0) {
      u += noise * rnd.normal();
      v += noise * rnd.normal();
    }
    const [px, py] = uvPrimeToXy(u, v);
    x[p] = px;
    y[p] = py;
    ler[p] = xyz[3] > 0 ? (KM * xyz[1]) / xyz[3] : 0;
  }
  return { x, y, ler, draws };
}
