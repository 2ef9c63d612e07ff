/**
 * Correction of one chip bin's recipe from a batch weighed for that bin (a revision with a recipe
 * matrix): the correction starts from that bin's wt % on the pump moved to the bin's centre — what the
 * line actually built — not from the nominal recipe. Same correction method as any batch
 * (`correctFromBatch`, or `correctFromBatchAtCondition` for a revision aimed hot); only the bin's entry
 * of the matrix changes in the draft, with its new predicted point (the model's, without the bias, as
 * the matrix states every bin). The nominal recipe and the other bins stay as signed.
 */
import { binPump } from '../blend/matrix/binPump';
import { mix } from '../blend/mix';
import type { BlendComponents } from '../blend/types';
import { binRecipeOf, binCodesOf, type RevisionContent } from '../recipe';
import { colourDistance } from '../aim/distance';
import { resolveTarget } from '../aim/target';
import { correctFromBatch, correctFromBatchAtCondition, DEFAULT_STEP_FRACTION, type BatchCorrection } from './correction';

export interface HotAt {
  /** Components at the revision's condition for the given bench components. */
  of: (bench: BlendComponents) => { components: BlendComponents; quench: number[] };
  measuredAt: 'bench' | 'condition';
}

export interface BinCorrection extends BatchCorrection {
  binCode: string;
}

const finiteOrNull = (v: number) => (Number.isFinite(v) ? v : null);

export function correctBinFromBatch(
  content: RevisionContent,
  components: BlendComponents,
  binCode: string,
  measuredMean: { x: number; y: number },
  note: string,
  stepFraction = DEFAULT_STEP_FRACTION,
  hot: HotAt | null = null
): BinCorrection {
  const entry = binRecipeOf(content, binCode);
  if (!entry) throw new RangeError(`the recipe matrix has no bin ${binCode} (it holds ${binCodesOf(content).join(', ')})`);
  const code = entry.bin.code;
  const moved = binPump(components.pump, (entry.bin.fromNm + entry.bin.toNm) / 2, entry.bin.basis);
  const binComponents: BlendComponents = { ...components, pump: moved.pump };
  const binView: RevisionContent = { ...content, pumpLeakFraction: entry.pumpLeakFraction, phosphors: entry.phosphors, binRecipes: [] };
  const binNote = `${note} Chip bin ${code}: its recipe is corrected; the nominal recipe and the other bins are unchanged.`;
  const hotComponents = hot ? hot.of(binComponents) : null;
  const corrected =
    hot && hotComponents
      ? correctFromBatchAtCondition(binView, binComponents, hotComponents, measuredMean, hot.measuredAt, binNote, stepFraction)
      : correctFromBatch(binView, binComponents, measuredMean, binNote, stepFraction);
  const e = mix(hotComponents ? hotComponents.components : binComponents, corrected.response.recipe).evaluation;
  const c = corrected.content;
  return {
    binCode: code,
    response: corrected.response,
    content: {
      ...content,
      notes: c.notes,
      binRecipes: (content.binRecipes ?? []).map((b) =>
        b.bin.code !== code
          ? b
          : {
              ...b,
              pumpLeakFraction: c.pumpLeakFraction,
              phosphors: c.phosphors,
              predicted: {
                x: e.x,
                y: e.y,
                cct: finiteOrNull(e.cct),
                duv: finiteOrNull(e.duv),
                ra: e.cri.valid ? finiteOrNull(e.cri.ra) : null,
                r9: e.cri.valid ? finiteOrNull(e.cri.ri[8]) : null,
                steps: colourDistance(e.x, e.y, resolveTarget(content.target)).steps
              }
            }
      )
    }
  };
}
