import { redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { mayEditLibrary, mayRead } from '$lib/access/policies';
import { actionFailure } from '$lib/server/http/action-failure';
import { listMaterialOptions } from '$lib/server/library/components';
import * as records from '$lib/server/package-models/records';
import { createByFit } from '$lib/server/package-models/fit';
import { readFitForm } from '$lib/server/package-models/form';
import { readForm } from '$lib/server/forms/read-form';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals }) => {
  const user = requireUser(locals, mayRead);
  const canFit = mayEditLibrary(user);
  return {
    models: await records.list(),
    canFit,
    pumps: canFit ? await listMaterialOptions('pump') : [],
    phosphors: canFit ? await listMaterialOptions('phosphor') : []
  };
};

export const actions: Actions = {
  default: async ({ locals, request }) => {
    const user = requireUser(locals, mayEditLibrary);
    const form = await readFitForm(await readForm(request));
    if (!form.ok) return actionFailure(400, { values: form.values, errors: form.errors });
    let id: number;
    try {
      id = await createByFit(user, form.data);
    } catch (err) {
      return actionFailure(err, (r) => ({ values: form.values, errors: [`The fit was refused: ${r.error} Nothing was saved.`] }));
    }
    redirect(303, `/library/packages/${id}`);
  }
};
