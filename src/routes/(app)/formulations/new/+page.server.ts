import { redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { formDataToValues } from '$lib/formulations/form-values';
import { contentFromForm, editorOptions, formRefusal } from '$lib/server/formulations/page-support';
import { createFormulationWithDraft } from '$lib/server/formulations/save';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

const EDITORS = ['formulator', 'admin'] as const;

export const load: PageServerLoad = async ({ locals }) => {
  requireUser(locals, EDITORS);
  return { options: await editorOptions() };
};

export const actions: Actions = {
  create: async ({ locals, request }) => {
    const user = requireUser(locals, EDITORS);
    const values = formDataToValues(await readForm(request));
    let created;
    try {
      created = await createFormulationWithDraft(user, { code: values.code || undefined, name: values.name ?? '', description: values.description ?? '', content: contentFromForm(values) });
    } catch (err) {
      return formRefusal(err, values, 'create');
    }
    redirect(303, `/formulations/${created.formulationId}/revisions/${created.revisionId}`);
  }
};
