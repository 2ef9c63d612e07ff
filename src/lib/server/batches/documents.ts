/**
 * Batch papers from a stored batch: the weigh-out ticket and the batch record (PDF). Quality calls
 * `batchRecordPdf(id, { measurementSummary })` to add its measured-colour section.
 */
import { buildBatchTicket } from '../pdf/batch-ticket';
import { batchCautions } from './cautions';
import { buildBatchRecord } from '../pdf/batch-record';
import type { BatchDoc, MeasurementSummary } from '../pdf/batch-doc';
import type { PaperSize } from '../../batches/weighout/paper';
import { LOADING_BASIS_LABELS, type ToleranceSpec } from '../../batches/weighout/schema';
import { getBatch, type BatchDetail } from './read';
import { notFound } from './errors';
import { citedPackageModel } from '../package-models/choices';
import { chipBinSummary } from '../../batches/chip-bin-summary';
import { describeCondition } from '../../aim/condition';
import { coldCheckLabel } from '../../formulations/cold-check';

export type { MeasurementSummary } from '../pdf/batch-doc';

export const toleranceLabel = (t: ToleranceSpec) => (t.kind === 'pct' ? `±${t.value} %` : `±${t.value} g`);

export function loadingSummary(b: BatchDetail['batch']): string {
  return b.loadingBasis === 'phr'
    ? `${b.phosphorPhr.toFixed(4)} phr (${b.phosphorWtPct.toFixed(4)} wt % of slurry)`
    : `${b.phosphorWtPct.toFixed(4)} wt % of slurry (${b.phosphorPhr.toFixed(4)} phr)`;
}

export function toBatchDoc(d: BatchDetail): BatchDoc {
  const content = d.revision?.content;
  const b = d.batch;
  const unit = b.loadingBasis === 'phr' ? 'phr' : 'wt %';
  const chip = chipBinSummary(d.revision?.content ?? null, b);
  return {
    batchNumber: b.batchNumber,
    state: b.state,
    createdAt: b.createdAt,
    createdBy: b.createdByName,
    formulation: { code: b.formulationCode, name: b.formulationName, revisionNo: b.revisionNo },
    target: {
      description: b.target.description,
      xy: `x ${b.target.x.toFixed(4)}, y ${b.target.y.toFixed(4)}`,
      bin: b.target.ansiBin ? `${b.target.ansiBin} K quadrangle` : null,
      tolerance: b.target.tolerance,
      condition: content?.condition ? describeCondition(content.condition) : null,
      coldCheck: content?.condition && content.coldCheck ? coldCheckLabel(content.coldCheck) : null
    },
    chip: chip ? { lot: chip.lot, bin: chip.bin, predicted: chip.predictedText } : null,
    size: {
      batchMassG: b.batchMassG,
      sizingNote:
        b.sizingKind === 'parts'
          ? `${b.partCount} parts × ${b.dispenseMassG} g with ${b.yieldLossPct} % yield-loss allowance, rounded up to the balance step`
          : null,
      basisLabel: LOADING_BASIS_LABELS[b.loadingBasis],
      loadingSummary: loadingSummary(b)
    },
    balance: { resolutionG: b.resolutionG, minWeightG: b.minWeightG, balanceRef: b.balanceRef },
    silicone: {
      name: b.siliconeName,
      ratio: `${b.ratioA}:${b.ratioB}`,
      potLifeMin: b.potLifeMin,
      plantLimitMin: b.plantLimitMin,
      cure: d.silicone.cure,
      degasNotes: d.silicone.degasNotes,
      safetyNote: d.silicone.safetyNote
    },
    lines: d.lines.map((l) => ({
      seq: l.seq,
      role: l.role,
      code: l.code,
      name: l.name,
      loadingLabel: l.basisPct === null ? null : `${l.basisPct.toFixed(4)} ${unit}`,
      targetG: l.targetG,
      lowG: l.lowG,
      highG: l.highG,
      toleranceLabel: toleranceLabel(l.tolerance),
      actual:
        l.actualG === null
          ? null
          : {
              actualG: l.actualG,
              lotNumber: l.lotNumber,
              status: l.actualStatus,
              weighedBy: l.weighedByName,
              weighedAt: l.weighedAt,
              override: l.overrideAt ? { by: l.overrideByName ?? '', at: l.overrideAt, reason: l.overrideReason ?? '' } : null
            }
    })),
    process: { mixedAt: b.mixedAt, expiresAt: b.slurryExpiresAt, completedAt: b.completedAt, completedBy: b.completedByName },
    notes: b.notes
  };
}

/** The document with the package model the revision cites, named as "<name> v<version>". */
async function docWithPackageModel(d: BatchDetail): Promise<BatchDoc> {
  const doc = toBatchDoc(d);
  const ref = d.revision?.content.packageModelRef;
  const cited = ref ? await citedPackageModel(ref) : null;
  const cautions = await batchCautions(d.lines);
  return cited
    ? { ...doc, cautions, formulation: { ...doc.formulation, packageModel: `${cited.name} v${cited.version}` } }
    : { ...doc, cautions };
}

export async function batchTicketPdf(id: number, size: PaperSize = 'A4'): Promise<{ pdf: Buffer; batchNumber: string }> {
  const d = await getBatch(id);
  if (!d) throw notFound(`Batch ${id}`);
  return { pdf: await buildBatchTicket(await docWithPackageModel(d), size), batchNumber: d.batch.batchNumber };
}

/** The batch record as it stands now (with the quality section when given). */
export async function batchRecordPdf(
  id: number,
  opts: { size?: PaperSize; measurementSummary?: MeasurementSummary | null } = {}
): Promise<{ pdf: Buffer; batchNumber: string }> {
  const d = await getBatch(id);
  if (!d) throw notFound(`Batch ${id}`);
  return { pdf: await buildBatchRecord(await docWithPackageModel(d), opts), batchNumber: d.batch.batchNumber };
}
