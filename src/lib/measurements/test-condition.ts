/**
 * What a measurement is judged against, by the condition it was taken at. A revision aimed at a hot
 * condition carries the cold check (the bench point its recipe should measure, recipe content v3):
 * bench measurements are judged against that point, measurements at the revision's own condition
 * against the target. The ANSI bin belongs to the hot point, so it is not required of a cold check.
 * A condition the revision has no prediction for is refused with the reason.
 */
import { describeCondition, isBenchCondition, type OperatingCondition } from '../aim/condition';
import type { Target } from '../aim/index';
import type { RevisionContent } from '../recipe';

export type JudgingBasis =
  | { status: 'ok'; target: Target; predicted: { x: number; y: number } | null; dropBinRule: boolean; label: string }
  | { status: 'refused'; reason: string };

const sameCondition = (a: OperatingCondition, b: OperatingCondition) =>
  a.temperatureC === b.temperatureC && (a.driveCurrentMa === null || b.driveCurrentMa === null || a.driveCurrentMa === b.driveCurrentMa);

export function judgingBasis(
  content: Pick<RevisionContent, 'target' | 'condition' | 'coldCheck'>,
  revisionPredicted: { x: number; y: number } | null,
  tested: OperatingCondition | null
): JudgingBasis {
  const aimedAt = content.condition && !isBenchCondition(content.condition) ? content.condition : null;
  const benchTest = !tested || isBenchCondition(tested);
  const asTargeted = { status: 'ok' as const, target: content.target, predicted: revisionPredicted, dropBinRule: false };
  if (!aimedAt) {
    if (benchTest) return { ...asTargeted, label: 'the revision target' };
    return { status: 'refused', reason: `The revision is aimed at the bench; it has no prediction at ${describeCondition(tested)}.` };
  }
  if (benchTest) {
    const c = content.coldCheck;
    if (!c)
      return {
        status: 'refused',
        reason: `The revision is aimed at ${describeCondition(aimedAt)} and has no cold check target for bench measurements.`
      };
    return {
      status: 'ok',
      target: { kind: 'xy', x: c.x, y: c.y },
      predicted: { x: c.x, y: c.y },
      dropBinRule: true,
      label: `the cold check target (revision aimed at ${describeCondition(aimedAt)})`
    };
  }
  if (sameCondition(tested!, aimedAt)) return { ...asTargeted, label: `the revision target at ${describeCondition(aimedAt)}` };
  return {
    status: 'refused',
    reason: `The revision is aimed at ${describeCondition(aimedAt)}; it has no prediction at ${describeCondition(tested)}.`
  };
}
