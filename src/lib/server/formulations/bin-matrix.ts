/**
 * Solves a draft revision's recipe matrix: one recipe per chip bin of its pump (the bins from the
 * library), each on the revision's target, written into the draft as content version 3 `binRecipes`
 * (an ordinary draft edit: stale versions and non-drafts are refused as for any edit).
 */
import { loadBlendComponents } from '../library/components';
import { getPumpBins } from '../library/pump-bins';
import { solveBinRecipes } from '../../blend/matrix/solveBinRecipes';
import { binRecipesFrom } from '../../formulations/bin-matrix';
import { revisionRecipe } from '../../measurements/correction';
import { resolveTarget } from '../../aim';
import { CONTENT_VERSION, materialIdsOf } from '../../recipe';
import { invalid, unprocessable } from '../../errors/domain-error';
import { getRevision } from './read';
import { updateDraft } from './save';
import type { Caller } from './guard';
import { isBenchCondition } from '../../aim/condition';
import { thermalByMaterialIds } from '../library/thermal';
import { BlendInputError } from '../../blend/errors';

export async function solveRevisionMatrix(caller: Caller, revisionId: number, version: number) {
  const rev = await getRevision(revisionId);
  if (!rev) throw invalid(`Revision ${revisionId} does not exist.`);
  const content = rev.content;
  const bins = await getPumpBins(content.pump.materialId);
  if (!bins.set)
    throw unprocessable(`The pump ${content.pump.code} has no chip bins: enter them on its library page, then solve the matrix.`);
  const ids = materialIdsOf(content);
  const components = await loadBlendComponents(ids.pump, ids.phosphors);
  // A revision aimed hot solves every bin at its condition, with the library's thermal data.
  const condition = content.condition && !isBenchCondition(content.condition) ? content.condition : null;
  const at = condition ? { condition, thermal: await thermalByMaterialIds([ids.pump, ...ids.phosphors]) } : null;
  let results;
  try {
    results = solveBinRecipes(
      components,
      revisionRecipe(content, components),
      resolveTarget(content.target),
      bins.set.bins,
      bins.set.basis,
      at
    );
  } catch (err) {
    if (err instanceof BlendInputError) throw unprocessable(`The recipe matrix cannot be solved, so nothing was saved: ${err.message}`);
    throw err;
  }
  let binRecipes;
  try {
    binRecipes = binRecipesFrom(content, bins.set, results);
  } catch (err) {
    throw unprocessable(`The recipe matrix cannot be solved, so nothing was saved: ${(err as Error).message}.`);
  }
  return updateDraft(caller, revisionId, version, { ...content, contentVersion: CONTENT_VERSION, binRecipes });
}
