/**
 * Everything the measurements page and API show for a batch: the batch and its revision, the
 * acceptance in force, uploads, every active part judged, the summary, predicted vs measured,
 * the plot model, correction drafts and the disposition. Computed on read from stored metrics.
 */
import { getBatch, type BatchDetail } from '../batches/read';
import { listYieldPredictions } from '../yield-predictions/store';
import { yieldComparison } from '../../measurements/yield-comparison';
import { samplePointsOf, type CloudSample } from '../../blend/spread/cloud-sample';
import type { RevisionRecord } from '../formulations/read';
import {
  batchAcceptance,
  batchPrediction,
  stepsFromPrediction,
  chromaticityPlotModel,
  describeAcceptance,
  describeTolerance,
  judgeBatch,
  predictedVsMeasured,
  type JudgedBatch,
  type PlotMarker,
  type PredictionCheck
} from '../../measurements/index';
import type { BatchResultsView } from '../../measurements/view';
import { judgeByCondition } from '../../measurements/judge-by-condition';
import { lotStatistics } from '../../measurements/lot-statistics/index';
import { describeCondition } from '../../aim/condition';
import { conflict } from './errors';
import * as records from './records';

export interface BatchQualityContext {
  detail: BatchDetail;
  revision: RevisionRecord;
}

export async function loadContext(batchId: number): Promise<BatchQualityContext | null> {
  const detail = await getBatch(batchId);
  if (!detail) return null;
  if (!detail.revision) throw conflict(`Batch ${detail.batch.batchNumber} has no readable formulation revision.`);
  return { detail, revision: detail.revision };
}

/** The revision's predicted colour point, when the stored prediction has one. */
export function predictedPoint(rev: RevisionRecord): { x: number; y: number } | null {
  const p = rev.predicted as { x?: unknown; y?: unknown } | null;
  return p && typeof p.x === 'number' && typeof p.y === 'number' ? { x: p.x, y: p.y } : null;
}

export interface ComputedResults {
  view: BatchResultsView;
  judged: JudgedBatch;
}

export async function computeResults(ctx: BatchQualityContext): Promise<ComputedResults> {
  const { detail, revision } = ctx;
  const b = detail.batch;
  const [choice, parts, uploads, corrections, disposition] = await Promise.all([
    records.getAcceptance(b.id),
    records.activeParts(b.id),
    records.listUploads(b.id),
    records.listCorrections(b.id),
    records.getDisposition(b.id)
  ]);
  // Each file is judged against the prediction for the condition it was measured at (../../measurements/test-condition.ts):
  // bench parts of a hot-aimed revision against its cold check, parts at the revision's own condition against its target.
  const chosen = batchAcceptance(revision.content, choice);
  const { groups: judgedGroups, checks: conditionChecks } = judgeByCondition(revision.content, predictedPoint(revision), parts, chosen);
  // The summary, plot and yield describe one condition: the bench when bench parts exist, else the first measured.
  const main = judgedGroups[0] ?? null;
  const acceptance = main?.acceptance ?? chosen;
  const judged = main ? main.judged : judgeBatch([], revision.content.target, acceptance);
  const mean = judged.summary.meanPoint;
  // A batch of a chip bin compares with that bin's prediction; otherwise with the prediction for the summary's condition.
  const revisionPoint = main?.basis ? main.basis.predicted : predictedPoint(revision);
  const forBatch = batchPrediction(revision.content, revision.revisionNo, revisionPoint, b.chipBinCode);
  const predicted = forBatch?.point ?? null;
  const prediction: PredictionCheck | null = mean && predicted ? predictedVsMeasured(predicted, mean) : null;
  const partSteps = forBatch
    ? stepsFromPrediction(
        judged.parts.map((p) => p.metrics),
        forBatch
      )
    : null;
  const markers: PlotMarker[] = [];
  if (mean) markers.push({ kind: 'mean', label: 'Measured mean', x: mean.x, y: mean.y });
  if (forBatch) markers.push({ kind: 'predicted', label: `Predicted (${forBatch.label})`, x: forBatch.point.x, y: forBatch.point.y });
  const last = corrections.at(-1);
  if (last)
    markers.push({
      kind: 'corrected',
      label: `Predicted after correction (revision ${last.revisionNo})`,
      x: last.predicted.x,
      y: last.predicted.y
    });
  const t = judged.target;
  const latest = (await listYieldPredictions(revision.id))[0] ?? null;
  const latestFigures = latest ? (latest.figures as { inTolerance?: number | null }) : null;
  const yieldCheck = yieldComparison(
    judged.parts.map((p) => p.metrics),
    t,
    revision.content.tolerance,
    latest ? { inTolerance: latestFigures?.inTolerance ?? null, parts: latest.parts, computedAt: latest.computedAt } : null
  );
  // The forecast cloud under the parts: this batch's chip bin's share of it when the forecast went bin by bin.
  const sample = latest ? (latest.figures as { cloudSample?: CloudSample }).cloudSample : undefined;
  const forecastPoints = sample ? samplePointsOf(sample, b.chipBinCode) : [];
  const forecast = forecastPoints.length
    ? {
        label: `Forecast: ${forecastPoints.length} simulated parts${sample?.bins && b.chipBinCode ? ` of chip bin ${b.chipBinCode}` : ''}`,
        points: forecastPoints
      }
    : null;
  const stats = lotStatistics(judged.parts, t, acceptance.tolerance);
  const view: BatchResultsView = {
    batch: {
      id: b.id,
      batchNumber: b.batchNumber,
      state: b.state,
      version: b.version,
      revisionId: revision.id,
      formulationId: revision.formulationId,
      formulationCode: b.formulationCode,
      formulationName: b.formulationName,
      revisionNo: b.revisionNo
    },
    target: { label: t.label, x: t.x, y: t.y, cct: t.cct, duv: t.duv, ansiBin: t.ansiBin?.nominalCct ?? null },
    floors: revision.content.floors,
    acceptance: {
      mode: choice?.mode ?? 'revision',
      steps: choice?.steps ?? null,
      requireTargetBin: acceptance.requireTargetBin,
      label: describeAcceptance(acceptance),
      revisionTolerance: describeTolerance(revision.content.tolerance),
      version: choice?.version ?? 0
    },
    uploads,
    parts: judgedGroups.flatMap(({ group, judged: jg }, gi) =>
      jg.parts.map((p, i) => ({
        id: group.parts[i].id,
        uploadId: group.parts[i].uploadId,
        label: p.label,
        metrics: p.metrics,
        verdict: p.verdict,
        stepsFromPrediction: gi === 0 ? (partSteps?.[i] ?? null) : null,
        conditionLabel: group.label
      }))
    ),
    summary: judged.summary,
    prediction,
    yieldCheck,
    predictionSource: forBatch ? { kind: forBatch.source, label: forBatch.label, binCode: forBatch.bin?.code ?? null } : null,
    plot: chromaticityPlotModel(judged, markers, forecast, stats?.ellipse ?? null),
    corrections,
    disposition,
    summaryCondition: main?.group.label ?? describeCondition(null),
    conditionChecks,
    lotStatistics: stats
  };
  return { view, judged };
}

export async function batchResults(batchId: number): Promise<BatchResultsView | null> {
  const ctx = await loadContext(batchId);
  return ctx ? (await computeResults(ctx)).view : null;
}
