/**
 * A batch's parts judged by the condition their files were measured at: each group against the
 * prediction for its condition (./test-condition.ts — a hot-aimed revision's bench parts against its
 * cold check, without the bin rule; parts at the revision's own condition against its target), and
 * each group's measured mean against that prediction (./condition-groups.ts). Pure.
 */
import type { OperatingCondition } from '../aim/condition';
import type { RevisionContent } from '../recipe';
import { groupByCondition, type ConditionCheck, type ConditionGroup } from './condition-groups';
import { judgeBatch, type JudgedBatch } from './judgeBatch';
import { predictedVsMeasured } from './prediction';
import { judgingBasis, type JudgingBasis } from './test-condition';
import type { Acceptance, MeasuredPart } from './types';

type OkBasis = Extract<JudgingBasis, { status: 'ok' }>;

export interface JudgedGroup<P> {
  group: ConditionGroup<P>;
  basis: OkBasis | null;
  refusal: string | null;
  acceptance: Acceptance;
  judged: JudgedBatch;
}

export function judgeByCondition<P extends MeasuredPart & { condition: OperatingCondition | null }>(
  content: Pick<RevisionContent, 'target' | 'condition' | 'coldCheck'>,
  revisionPredicted: { x: number; y: number } | null,
  parts: P[],
  chosen: Acceptance
): { groups: JudgedGroup<P>[]; checks: ConditionCheck[] } {
  const groups = groupByCondition(parts).map((g) => {
    const basis = judgingBasis(content, revisionPredicted, g.condition);
    const ok = basis.status === 'ok' ? basis : null;
    const acceptance = ok?.dropBinRule ? { ...chosen, requireTargetBin: false } : chosen;
    const judged = judgeBatch(g.parts, ok ? ok.target : content.target, acceptance);
    return { group: g, basis: ok, refusal: basis.status === 'refused' ? basis.reason : null, acceptance, judged };
  });
  const checks = groups.map(({ group, basis, refusal, judged }) => {
    const m = judged.summary.meanPoint;
    const check = m && basis?.predicted ? predictedVsMeasured(basis.predicted, m) : null;
    return {
      label: group.label,
      judgedAgainst: basis ? basis.label : (refusal ?? 'the revision target'),
      parts: group.parts.length,
      passed: judged.parts.filter((p) => p.verdict.pass).length,
      measured: m ? { x: m.x, y: m.y } : null,
      predicted: basis?.predicted ?? null,
      steps: check?.offset.steps ?? null,
      deltaUvPrime: check?.offset.deltaUvPrime ?? null
    };
  });
  return { groups, checks };
}
