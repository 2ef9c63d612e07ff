/**
 * How a revision's predicted blend misses its aim, in words for the filing, submission and review:
 * the colour distance when it lies outside the tolerance, and every floor missed. Empty when the
 * prediction meets the aim. Submitting a revision that misses needs a stated reason.
 */
import type { RevisionPrediction } from './prediction';

/** Shortest reason accepted for submitting outside the aim. */
export const OFF_AIM_REASON_MIN = 10;

export function aimMiss(p: Pick<RevisionPrediction, 'sdcm' | 'deltaUvPrime' | 'withinTolerance' | 'floorsMissed' | 'target'>): string[] {
  const colour = p.withinTolerance
    ? []
    : [`${p.sdcm.toFixed(1)} steps (Δu′v′ ${p.deltaUvPrime.toFixed(4)}) from the target ${p.target.label}, outside the tolerance`];
  return [...colour, ...p.floorsMissed.map((f) => `floor missed: ${f}`)];
}
