/**
 * The designer's production-spread cloud: one job = the blend on the desk (optical shares, or the wt %
 * already estimated for them) through the loading model, N seeded parts of the variation model, the
 * yield figures against the aim. Pure; the designer runs it in a web worker (`spread.worker.ts`) so the
 * sliders never wait for it. Without ready wt % the shares are turned into wt % first (Beer–Lambert
 * loading model, `concentrationsForFractions`), as the filed revision's forecast will use them.
 */
import type { LoadingBasis } from '../blend/loading/beerLambertPhotonBudget';
import { concentrationsForFractions } from '../blend/loading/concentrationsForFractions';
import { predictYield, pumpPeakNm, type YieldFigures, type YieldPredictionInput } from '../blend/spread';

/** Parts while the desk is moving, and once it rests (seeded, so a resting blend always shows the same cloud). */
export const MOVING_PARTS = 2000;
export const RESTING_PARTS = 10_000;
export const CLOUD_SEED = 1;

export interface SpreadJob extends Pick<
  YieldPredictionInput,
  'pathLengthMm' | 'centre' | 'quadrangle' | 'tolerance' | 'model' | 'parts' | 'seed'
> {
  id: number;
  /** Shares on the desk, pump leak first. */
  fractions: number[];
  /** wt % estimated for these shares, when ready; else computed here. */
  wtPct: number[] | null;
}

export type SpreadJobResult =
  | { id: number; ok: true; parts: number; figures: YieldFigures; x: Float32Array; y: Float32Array; wtPct: number[]; elapsedMs: number }
  | { id: number; ok: false; error: string };

export function runSpreadJob(basis: LoadingBasis, job: SpreadJob, now: () => number = () => performance.now()): SpreadJobResult {
  const t0 = now();
  try {
    let wt = job.wtPct;
    if (!wt) {
      const sol = concentrationsForFractions(basis, job.fractions, { pathLengthMm: job.pathLengthMm });
      if (!sol.converged) return { id: job.id, ok: false, error: sol.refusal ?? 'no wt % reproduce these shares' };
      wt = sol.concentrationsWtPct;
    }
    const p = predictYield({
      basis,
      concentrationsWtPct: wt,
      pathLengthMm: job.pathLengthMm,
      pumpPeakNm: pumpPeakNm(basis),
      centre: job.centre,
      quadrangle: job.quadrangle,
      tolerance: job.tolerance,
      model: job.model,
      parts: job.parts,
      seed: job.seed,
      renderingSubsample: 0,
      breakdown: false
    });
    return {
      id: job.id,
      ok: true,
      parts: job.parts,
      figures: p.figures,
      x: Float32Array.from(p.cloud.x),
      y: Float32Array.from(p.cloud.y),
      wtPct: wt,
      elapsedMs: now() - t0
    };
  } catch (err) {
    return { id: job.id, ok: false, error: err instanceof Error ? err.message : String(err) };
  }
}
