/**
 * What a revision's production-spread runs share: its loading basis (library materials), pump peak on the
 * working grid, target centre, ANSI quadrangle, tolerance and chip bins. Refused with the reason when the
 * revision has no wt % on the loading model or a phosphor lacks an absorption coefficient.
 */
import type { Knex } from 'knex';
import { unprocessable } from '../../errors/domain-error';
import { prepareBasis } from '../../blend/basis';
import { pumpPeakNm } from '../../blend/spread/pump-peak';
import { resolveTarget } from '../../aim/target';
import { loadingOf, type RevisionContent } from '../../recipe';
import { loadRevisionComponents } from '../formulations/components';

export async function revisionSpreadSetup(knex: Knex, content: RevisionContent) {
  const wt = loadingOf(content);
  if (!wt || !content.loading) throw unprocessable('the revision has no wt % on the loading model; a yield prediction needs them');
  const { components } = await loadRevisionComponents(knex, content);
  const basis = prepareBasis(components).loading;
  if (!basis) throw unprocessable('every phosphor needs an absorption coefficient in the library for a yield prediction');
  const target = resolveTarget(content.target);
  const bins = (content.binRecipes ?? []).map((b) => ({
    code: b.bin.code,
    fromNm: b.bin.fromNm,
    toNm: b.bin.toNm,
    sharePct: b.bin.sharePct
  }));
  return {
    wt,
    bins,
    shared: {
      basis,
      pathLengthMm: content.loading.pathLengthMm,
      pumpPeakNm: pumpPeakNm(basis),
      centre: { x: target.x, y: target.y, cct: target.cct },
      quadrangle: target.ansiBin,
      tolerance: content.tolerance
    }
  };
}
