/**
 * What a trim may do: when the correction is refused, and how a trim is capped.
 *
 * Refusals (nothing is handed over; the caller saves nothing):
 *   not converged — the damped Gauss–Newton iteration (correction.ts) ends without reaching the
 *     target; the closest point found is reported;
 *   below zero — the knobs are log-amounts, so every amount stays positive; a target that needs a
 *     component at or below zero shows as its knob running away towards −∞. A full correction that
 *     leaves a component at less than 1 % of its amount (RUNAWAY_MULTIPLIER) is read as that;
 *   over-loaded — on the loading recipe, phosphors at ≥ 100 wt % of the slurry in total.
 * Cap (the draft says by how much): the applied share of the full correction (in log-amounts) is
 *   the requested step fraction (0.5–0.8 is the cautious first trim practised on lines [common
 *   practice]), lowered further when any component would change by more than `maxTrimFactor`
 *   (default ×2 up or down in one trim: product limit; a larger change is a reformulation, not a trim).
 */
import { BlendInputError } from './errors';

/** A correction the model cannot make (API → 422); the message says why in plain words. */
export class CorrectionRefusedError extends BlendInputError {
  readonly reason: CorrectionRefusal['reason'];
  constructor(refusal: CorrectionRefusal) {
    super(refusal.message);
    this.reason = refusal.reason;
  }
}

export interface CorrectionRefusal {
  reason: 'notConverged' | 'belowZero' | 'overLoaded';
  message: string;
}

export interface TrimCap {
  /** Share of the full correction asked for (the step fraction). */
  requestedShare: number;
  /** Share actually applied: the requested share, or less when the change limit caps it. */
  appliedShare: number;
  /** What set the applied share: nothing (full correction), the step fraction, or the change limit. */
  limitedBy: 'none' | 'stepFraction' | 'maxChange';
  /** Largest change of any one component allowed in one trim (factor, up or down). */
  maxTrimFactor: number;
}

export const RUNAWAY_MULTIPLIER = 0.01;
export const DEFAULT_MAX_TRIM_FACTOR = 2;

/** The share of the full log-amount correction `s` to apply, and why. */
export function trimCap(sFull: number[], stepFraction: number, maxTrimFactor = DEFAULT_MAX_TRIM_FACTOR): TrimCap {
  const requestedShare = Math.max(0, Math.min(1, stepFraction));
  const largest = sFull.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  const limit = Math.log(maxTrimFactor);
  if (largest * requestedShare > limit) {
    return { requestedShare, appliedShare: limit / largest, limitedBy: 'maxChange', maxTrimFactor };
  }
  return { requestedShare, appliedShare: requestedShare, limitedBy: requestedShare < 1 ? 'stepFraction' : 'none', maxTrimFactor };
}

export interface RefusalCheck {
  converged: boolean;
  iterations: number;
  /** Multipliers of the full correction, one per knob. */
  fullMultipliers: number[];
  knobNames: string[];
  /** Steps (SDCM) from target of the closest point the iteration reached. */
  closestSteps: number;
  /** Loading recipe: total phosphor wt % of the trim that would be applied; null for optical recipes. */
  appliedTotalWtPct: number | null;
}

/** How far a component is run down, in words ("0.76 % of its amount", or "practically nothing"). */
const rundown = (m: number) => (m < 1e-4 ? 'practically nothing' : `${(m * 100).toPrecision(2)} % of its amount`);
const CHECK_BUILD = 'Check the build (weighing, lots, measurement) before correcting.';

/** Why the correction must be refused, or null when it may be handed over. */
export function refusalOf(c: RefusalCheck): CorrectionRefusal | null {
  const m = c.fullMultipliers;
  const lowest = m.reduce((k, v, i) => (v < m[k] || Number.isNaN(v) ? i : k), 0);
  if (m[lowest] < RUNAWAY_MULTIPLIER) {
    return {
      reason: 'belowZero',
      message:
        `the target cannot be reached without taking ${c.knobNames[lowest]} to zero or below: ` +
        `the trim runs it down to ${rundown(m[lowest])}${c.converged ? '' : ' and still does not land'}. ` +
        `The measured offset is beyond what these phosphors can trim. ${CHECK_BUILD}`
    };
  }
  if (!c.converged || m.some((v) => !Number.isFinite(v))) {
    const left = Number.isFinite(c.closestSteps)
      ? `the model is still ${c.closestSteps.toFixed(1)} steps from target`
      : 'the model has not reached the target';
    return { reason: 'notConverged', message: `the trim does not converge: after ${c.iterations} iterations ${left}. ${CHECK_BUILD}` };
  }
  if (c.appliedTotalWtPct !== null && c.appliedTotalWtPct >= 100) {
    return {
      reason: 'overLoaded',
      message:
        `the trim needs ${c.appliedTotalWtPct.toFixed(1)} wt % phosphor in total, which leaves no silicone; ` +
        'the target cannot be reached by trimming this recipe.'
    };
  }
  return null;
}
