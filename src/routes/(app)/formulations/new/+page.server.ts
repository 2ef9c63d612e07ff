import { redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { formDataToValues } from '$lib/formulations/form-values';
import { contentFromForm, editorOptions } from '$lib/server/formulations/page-support';
import { mayAuthorFormulations } from '$lib/access/policies';
import { actionFailure } from '$lib/server/http/action-failure';
import { createFormulationWithDraft } from '$lib/server/formulations/save';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

export const load: PageServerLoad = async ({ locals }) => {
  requireUser(locals, mayAuthorFormulations);
  return { options: await editorOptions() };
};

export const actions: Actions = {
  create: async ({ locals, request }) => {
    const user = requireUser(locals, mayAuthorFormulations);
    const values = formDataToValues(await readForm(request));
    let created;
    try {
      created = await createFormulationWithDraft(user, {
        code: values.code || undefined,
        name: values.name ?? '',
        description: values.description ?? '',
        content: contentFromForm(values)
      });
    } catch (err) {
      return actionFailure(err, { action: 'create', values });
    }
    redirect(303, `/formulations/${created.formulationId}/revisions/${created.revisionId}`);
  }
};
