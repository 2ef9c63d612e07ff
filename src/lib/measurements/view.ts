/**
 * What the measurements page and API show for one batch (plain JSON; built on the server from the
 * database and the quality computations, read by the Svelte components).
 */
import type { Floors } from '../aim/index';
import type { LotStatistics } from './lot-statistics/types';
import type { OperatingCondition } from '../aim/condition';
import type { ConditionCheck } from './condition-groups';
import type { YieldComparison } from './yield-comparison';
import type { ChromaticityPlotModel } from './plotModel';
import type { ColourPoint, PredictionCheck } from './prediction';
import type { BatchSummary } from './summarise';
import type { PartMetrics, PartVerdict } from './types';

export interface BatchHeaderView {
  id: number;
  batchNumber: string;
  state: string;
  version: number;
  revisionId: number;
  formulationId: number;
  formulationCode: string;
  formulationName: string;
  revisionNo: number;
}

export interface AcceptanceView {
  mode: 'revision' | 'steps';
  steps: number | null;
  requireTargetBin: boolean;
  /** Readable rule in force, e.g. "3-step ellipse, inside the target ANSI bin". */
  label: string;
  revisionTolerance: string;
  version: number;
}

export interface UploadView {
  id: number;
  originalName: string;
  partsCount: number;
  storedFileId: number;
  uploadedByName: string;
  createdAt: string;
  withdrawnAt: string | null;
  withdrawnByName: string | null;
  withdrawReason: string | null;
  /** The condition the file was measured at; null = the bench (25 °C). */
  condition: OperatingCondition | null;
}

export interface PartView {
  id: number;
  uploadId: number;
  label: string;
  metrics: PartMetrics;
  verdict: PartVerdict;
  /** Steps from the batch's prediction (its chip bin's predicted point with a recipe matrix); null without one. */
  stepsFromPrediction: number | null;
  /** The test condition of the part's file, e.g. "bench (25 °C)" or "Tj 85 °C, 350 mA". */
  conditionLabel: string;
}

export interface CorrectionView {
  id: number;
  revisionId: number;
  revisionNo: number;
  revisionState: string | null;
  stepFraction: number;
  measuredMean: { x: number; y: number };
  predicted: ColourPoint;
  createdByName: string;
  createdAt: string;
}

export interface DispositionView {
  decision: 'released' | 'rejected';
  signerName: string;
  signerEmail: string;
  meaning: string;
  comment: string;
  signedAt: string;
  contentSha256: string;
  recordFileId: number | null;
}

export interface BatchResultsView {
  batch: BatchHeaderView;
  target: { label: string; x: number; y: number; cct: number; duv: number; ansiBin: number | null };
  floors: Floors;
  acceptance: AcceptanceView;
  uploads: UploadView[];
  parts: PartView[];
  summary: BatchSummary;
  prediction: PredictionCheck | null;
  /** Which prediction the parts are compared with: the batch's chip bin's, or the revision's. */
  predictionSource: { kind: 'bin' | 'revision'; label: string; binCode: string | null } | null;
  /** Measured share inside the tolerance (Wilson interval) against the revision's latest yield forecast. */
  yieldCheck: YieldComparison | null;
  plot: ChromaticityPlotModel;
  corrections: CorrectionView[];
  disposition: DispositionView | null;
  /** The condition the summary, plot and yield above describe (the bench when bench parts exist); null = bench. */
  summaryCondition: string;
  /** Measured mean against the prediction for each test condition with parts (bench first). */
  conditionChecks: ConditionCheck[];
  /** Counts per bin and verdict, capability, the mean's confidence ellipse and the run trend of the summary's parts. */
  lotStatistics: LotStatistics | null;
}
