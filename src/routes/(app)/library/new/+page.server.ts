import { fail, redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { FORMULATION_EDITORS } from '$lib/access/routes/shared';
import * as editing from '$lib/server/materials/editing';
import { readMaterialForm } from '$lib/server/materials/form';
import { formGuard } from '$lib/server/materials/page-errors';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

const kindOf = (url: URL): 'pump' | 'phosphor' => (url.searchParams.get('kind') === 'pump' ? 'pump' : 'phosphor');

export const load: PageServerLoad = ({ locals, url }) => {
  requireUser(locals, FORMULATION_EDITORS);
  return { kind: kindOf(url) };
};

export const actions: Actions = {
  default: async ({ locals, request, url }) => {
    const user = requireUser(locals, FORMULATION_EDITORS);
    const kind = kindOf(url);
    const form = readMaterialForm(await readForm(request));
    if (!form.ok) return fail(400, { values: form.values, errors: form.errors, error: 'Please correct the marked fields. Nothing was saved.' });
    const id = await formGuard({ values: form.values, errors: {} }, () => editing.create(user, kind, form.data));
    if (typeof id !== 'number') return id;
    redirect(303, `/library/${id}/spectrum?created=1`);
  }
};
