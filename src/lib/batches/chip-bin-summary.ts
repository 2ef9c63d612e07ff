/**
 * The chip lot and bin of a batch as its papers and pages print them: the lot (with its measured
 * wavelength), the bin (code, range, basis) and the bin's predicted colour point from the revision's
 * recipe matrix. Pure.
 */
import { binRecipeOf, type RecipeSource } from '../recipe/accessors';
import type { BinSnapshot, PredictedPoint } from '../recipe/schemaV3';
import { describeBin } from './chip-lot';

export interface ChipBinSummary {
  lot: string | null;
  /** "B3 · 452.5–455 nm peak"; null without a recipe matrix. */
  bin: string | null;
  binSnapshot: BinSnapshot | null;
  predicted: PredictedPoint | null;
  /** "x 0.4345, y 0.4025 · 3000 K, Duv 0.0000 · Ra 90, R9 20 · 0.4 steps from target". */
  predictedText: string | null;
}

export function describePredicted(p: PredictedPoint): string {
  const parts = [`x ${p.x.toFixed(4)}, y ${p.y.toFixed(4)}`];
  if (p.cct !== null) parts.push(`${Math.round(p.cct)} K${p.duv !== null ? `, Duv ${p.duv.toFixed(4)}` : ''}`);
  if (p.ra !== null) parts.push(`Ra ${p.ra.toFixed(0)}${p.r9 !== null ? `, R9 ${p.r9.toFixed(0)}` : ''}`);
  if (p.steps !== null) parts.push(`${p.steps.toFixed(1)} steps from target`);
  return parts.join(' · ');
}

/** Null when the batch records neither a chip lot nor a bin. */
export function chipBinSummary(
  content: Pick<RecipeSource, 'binRecipes'> | null,
  batch: { chipLot: string | null; chipBinCode: string | null; chipWavelengthNm: number | null }
): ChipBinSummary | null {
  if (batch.chipLot === null && batch.chipBinCode === null) return null;
  const entry = content && batch.chipBinCode !== null ? binRecipeOf(content, batch.chipBinCode) : null;
  const nm = batch.chipWavelengthNm !== null ? ` (measured ${batch.chipWavelengthNm} nm${entry ? ` ${entry.bin.basis}` : ''})` : '';
  return {
    lot: batch.chipLot === null ? null : `${batch.chipLot}${nm}`,
    bin: entry ? describeBin(entry.bin) : batch.chipBinCode,
    binSnapshot: entry?.bin ?? null,
    predicted: entry?.predicted ?? null,
    predictedText: entry?.predicted ? describePredicted(entry.predicted) : null
  };
}
