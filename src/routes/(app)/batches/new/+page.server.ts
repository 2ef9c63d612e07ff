import { fail, redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { LINE } from '$lib/access/routes/shared';
import { getRevision } from '$lib/server/formulations/read';
import { listApprovedRevisions } from '$lib/server/batches/revisions';
import { createBatch } from '$lib/server/batches/create';
import { BatchError } from '$lib/server/batches/errors';
import { describeIssues } from '$lib/server/api/body';
import { createBatchSchema } from '$lib/schemas/batches';
import { defaultFields, fieldsToRequest } from '$lib/batches/plan-form';
import { revisionLoadings } from '$lib/weighout/from-revision';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

export const load: PageServerLoad = async ({ locals, url }) => {
  requireUser(locals, LINE);
  const revisions = await listApprovedRevisions();
  const chosen = Number(url.searchParams.get('revision') ?? revisions[0]?.id ?? 0);
  const revision = chosen ? await getRevision(chosen) : null;
  const usable = revision && revision.state === 'approved' ? revision : null;
  return {
    revisions,
    revision: usable ? { id: usable.id, formulationCode: usable.formulationCode, formulationName: usable.formulationName, revisionNo: usable.revisionNo, content: usable.content } : null,
    defaults: usable ? defaultFields(usable.id, usable.content.phosphors.length, revisionLoadings(usable.content, 'wtPctOfSlurry')) : null,
    revisionLoadingsPhr: usable ? revisionLoadings(usable.content, 'phr') : null
  };
};

export const actions: Actions = {
  plan: async ({ locals, request }) => {
    const user = requireUser(locals, LINE);
    const values = Object.fromEntries([...(await readForm(request))].map(([k, v]) => [k, String(v)]));
    const revision = await getRevision(Number(values.revisionId));
    if (!revision) return fail(404, { values, error: 'Choose an approved formulation revision.', issues: [] });
    const parsed = createBatchSchema.safeParse(fieldsToRequest(values, revision.content.phosphors.length));
    if (!parsed.success) return fail(400, { values, error: 'Some fields need attention.', issues: describeIssues(parsed.error) });
    let id: number;
    try {
      id = (await createBatch(user, parsed.data)).id;
    } catch (err) {
      if (err instanceof BatchError) return fail(err.status, { values, error: err.message, issues: err.issues });
      throw err;
    }
    redirect(303, `/batches/${id}`);
  }
};
