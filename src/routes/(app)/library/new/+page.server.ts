import { redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { mayEditLibrary } from '$lib/access/policies';
import * as editing from '$lib/server/library/editing';
import { readMaterialForm } from '$lib/server/library/form';
import { actionFailure, tryAction } from '$lib/server/http/action-failure';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

const kindOf = (url: URL): 'pump' | 'phosphor' => (url.searchParams.get('kind') === 'pump' ? 'pump' : 'phosphor');

export const load: PageServerLoad = ({ locals, url }) => {
  requireUser(locals, mayEditLibrary);
  return { kind: kindOf(url) };
};

export const actions: Actions = {
  default: async ({ locals, request, url }) => {
    const user = requireUser(locals, mayEditLibrary);
    const kind = kindOf(url);
    const form = readMaterialForm(await readForm(request));
    if (!form.ok)
      return actionFailure(400, {
        values: form.values,
        errors: form.errors,
        error: 'Please correct the marked fields. Nothing was saved.'
      });
    const id = await tryAction({ values: form.values, errors: {} }, () => editing.create(user, kind, form.data));
    if (typeof id !== 'number') return id;
    redirect(303, `/library/${id}/spectrum?created=1`);
  }
};
