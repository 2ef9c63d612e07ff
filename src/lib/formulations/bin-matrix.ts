/**
 * The recipe matrix as revision content: each bin's solved recipe (../blend/matrix/solveBinRecipes.ts)
 * written as a `binRecipes` entry with a snapshot of its bin and its predicted point, rounded as the
 * draft form rounds recipes (4 decimals). Refused as a whole when any bin cannot be hit.
 */
import type { BinRecipeResult } from '../blend/matrix/solveBinRecipes';
import type { PumpBinSet } from '../pump-bins/schema';
import type { BinRecipe, RevisionContent } from '../recipe';

const r4 = (v: number) => Math.round(v * 1e4) / 1e4;
const r1 = (v: number | null) => (v === null || !Number.isFinite(v) ? null : Math.round(v * 10) / 10);

export function binRecipesFrom(
  content: Pick<RevisionContent, 'phosphors'>,
  set: PumpBinSet,
  results: readonly BinRecipeResult[]
): BinRecipe[] {
  const refused = results.filter((r) => r.refusal);
  if (refused.length) throw new RangeError(refused.map((r) => `bin ${r.code}: ${r.refusal}`).join('; '));
  return results.map((r, k) => {
    const bin = set.bins[k];
    return {
      bin: { code: bin.code, basis: set.basis, fromNm: bin.fromNm, toNm: bin.toNm, sharePct: bin.sharePct },
      pumpLeakFraction: r4(r.opticalFractions[0]),
      phosphors: content.phosphors.map((p, i) => ({
        ...p,
        opticalFraction: r4(r.opticalFractions[i + 1]),
        wtPct: r.wtPct ? r4(r.wtPct[i]) : null
      })),
      predicted: {
        x: r.predicted.x,
        y: r.predicted.y,
        cct: Math.round(r.predicted.cct),
        duv: Math.round(r.predicted.duv * 1e5) / 1e5,
        ra: r1(r.predicted.ra),
        r9: r1(r.predicted.r9),
        steps: Math.round(r.predicted.steps * 100) / 100
      }
    };
  });
}
