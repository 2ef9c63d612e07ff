/**
 * A batch judged against its revision: target resolved once, every part judged, summary built.
 * `defaultAcceptance` takes the revision's own tolerance and floors and requires the ANSI bin when
 * the revision targets a bin; quality may instead choose a step ellipse for the batch.
 */
import type { ResolvedTarget, Target, Tolerance } from '../aim/index';
import type { RevisionContent } from '../recipe';
import { describeTolerance, judgePart } from './acceptance';
import { summariseBatch, type BatchSummary } from './summarise';
import { qualityTarget } from './target';
import type { Acceptance, JudgedPart, MeasuredPart } from './types';

export interface JudgedBatch {
  target: ResolvedTarget;
  acceptance: Acceptance;
  parts: JudgedPart[];
  summary: BatchSummary;
}

export function defaultAcceptance(content: Pick<RevisionContent, 'tolerance' | 'floors' | 'target'>, override?: Tolerance): Acceptance {
  return { tolerance: override ?? content.tolerance, floors: content.floors, requireTargetBin: content.target.kind === 'ansiBin' };
}

/** Quality's choice for a batch: the revision's tolerance or an n-step ellipse, and the bin rule. */
export interface AcceptanceChoice {
  mode: 'revision' | 'steps';
  steps: number | null;
  requireTargetBin: boolean;
}

/** The acceptance in force: the revision's defaults unless quality chose otherwise for the batch. */
export function batchAcceptance(
  content: Pick<RevisionContent, 'tolerance' | 'floors' | 'target'>,
  choice: AcceptanceChoice | null
): Acceptance {
  if (!choice) return defaultAcceptance(content);
  const tolerance: Tolerance = choice.mode === 'steps' && choice.steps !== null ? { kind: 'sdcm', steps: choice.steps } : content.tolerance;
  return { tolerance, floors: content.floors, requireTargetBin: choice.requireTargetBin };
}

export function describeAcceptance(a: Acceptance): string {
  return `${describeTolerance(a.tolerance)}${a.requireTargetBin ? ', inside the target ANSI bin' : ''}`;
}

export function judgeBatch(parts: readonly MeasuredPart[], target: Target, acceptance: Acceptance): JudgedBatch {
  const t = qualityTarget(target);
  const judged = parts.map((p) => ({ ...p, verdict: judgePart(p.metrics, t, acceptance) }));
  return { target: t, acceptance, parts: judged, summary: summariseBatch(judged, t) };
}
