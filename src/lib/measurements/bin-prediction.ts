/**
 * Which prediction a batch's parts are compared with: for a batch built from a revision with a
 * recipe per chip bin, the predicted point of the bin it weighed (recipe content version 3,
 * `binRecipes[].predicted`); otherwise the revision's own prediction. Steps are MacAdam-type steps of
 * the 1-step ellipse at the predicted point's CCT (aim/distance.ts, IEC 60081 ellipses).
 */
import { colourDistance } from '../aim/index';
import { binRecipeOf, type RecipeSource } from '../recipe/accessors';
import type { BinSnapshot } from '../recipe/schemaV3';
import { colourPoint, type ColourPoint } from './prediction';

export interface BatchPrediction {
  point: ColourPoint;
  source: 'bin' | 'revision';
  /** The chip bin whose prediction is used (source 'bin'). */
  bin: BinSnapshot | null;
  /** "chip bin B3 (452.5–455 nm peak) of revision 2" or "revision 2". */
  label: string;
}

export function batchPrediction(
  content: Pick<RecipeSource, 'binRecipes'>,
  revisionNo: number,
  revisionPredicted: { x: number; y: number } | null,
  chipBinCode: string | null
): BatchPrediction | null {
  const entry = chipBinCode !== null ? binRecipeOf(content, chipBinCode) : null;
  if (entry?.predicted) {
    const b = entry.bin;
    return {
      point: colourPoint(entry.predicted.x, entry.predicted.y),
      source: 'bin',
      bin: b,
      label: `chip bin ${b.code} (${b.fromNm}–${b.toNm} nm ${b.basis}) of revision ${revisionNo}`
    };
  }
  if (!revisionPredicted) return null;
  return { point: colourPoint(revisionPredicted.x, revisionPredicted.y), source: 'revision', bin: null, label: `revision ${revisionNo}` };
}

/** Steps of each part's measured point from the predicted point. */
export function stepsFromPrediction(parts: readonly { x: number; y: number }[], prediction: BatchPrediction): number[] {
  return parts.map((p) => colourDistance(p.x, p.y, prediction.point).steps);
}
