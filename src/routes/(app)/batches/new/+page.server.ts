import { redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { mayPlanBatch } from '$lib/access/policies';
import { actionFailure } from '$lib/server/http/action-failure';
import { parseId } from '$lib/server/http/id-param';
import { getRevision } from '$lib/server/formulations/read';
import { listApprovedRevisions } from '$lib/server/batches/revisions';
import { createBatch } from '$lib/server/batches/create';
import { describeIssues } from '$lib/server/http/issues';
import { createBatchSchema } from '$lib/batches/schema';
import { defaultFields, fieldsToRequest } from '$lib/batches/plan-form';
import { revisionLoadings } from '$lib/batches/weighout/from-revision';
import { hasRecipeMatrix } from '$lib/recipe';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

export const load: PageServerLoad = async ({ locals, url }) => {
  requireUser(locals, mayPlanBatch);
  const revisions = await listApprovedRevisions();
  const asked = url.searchParams.get('revision');
  const chosen = asked === null ? (revisions[0]?.id ?? null) : parseId(asked);
  const revision = chosen ? await getRevision(chosen) : null;
  const usable = revision && revision.state === 'approved' ? revision : null;
  return {
    revisions,
    revision: usable
      ? {
          id: usable.id,
          formulationCode: usable.formulationCode,
          formulationName: usable.formulationName,
          revisionNo: usable.revisionNo,
          content: usable.content
        }
      : null,
    // With a recipe per chip bin the loadings stay empty: the chosen bin's recipe is weighed.
    defaults: usable
      ? defaultFields(
          usable.id,
          usable.content.phosphors.length,
          hasRecipeMatrix(usable.content) ? null : revisionLoadings(usable.content, 'wtPctOfSlurry')
        )
      : null,
    revisionLoadingsPhr: usable ? revisionLoadings(usable.content, 'phr') : null
  };
};

export const actions: Actions = {
  plan: async ({ locals, request }) => {
    const user = requireUser(locals, mayPlanBatch);
    const values = Object.fromEntries([...(await readForm(request))].map(([k, v]) => [k, String(v)]));
    const revisionId = parseId(values.revisionId);
    const revision = revisionId === null ? null : await getRevision(revisionId);
    if (!revision) return actionFailure(404, { values, error: 'Choose an approved formulation revision.', issues: [] });
    const parsed = createBatchSchema.safeParse(fieldsToRequest(values, revision.content.phosphors.length));
    if (!parsed.success) return actionFailure(400, { values, error: 'Some fields need attention.', issues: describeIssues(parsed.error) });
    let id: number;
    try {
      id = (await createBatch(user, parsed.data)).id;
    } catch (err) {
      return actionFailure(err, { values });
    }
    redirect(303, `/batches/${id}`);
  }
};
