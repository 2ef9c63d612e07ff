import { fail, redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { ALL, FORMULATION_EDITORS } from '$lib/access/routes/shared';
import { ApiError } from '$lib/server/api/body';
import { BlendInputError } from '$lib/blend/errors';
import { SpectrumInputError } from '$lib/spectral/errors';
import { listMaterialOptions } from '$lib/server/materials/components';
import * as records from '$lib/server/package-models/records';
import { createByFit } from '$lib/server/package-models/fit';
import { readFitForm } from '$lib/server/package-models/form';
import { readForm } from '$lib/server/forms/read-form';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals }) => {
  const user = requireUser(locals, ALL);
  const canFit = FORMULATION_EDITORS.some((r) => user.roles.includes(r));
  return {
    models: await records.list(),
    canFit,
    pumps: canFit ? await listMaterialOptions('pump') : [],
    phosphors: canFit ? await listMaterialOptions('phosphor') : []
  };
};

export const actions: Actions = {
  default: async ({ locals, request }) => {
    const user = requireUser(locals, FORMULATION_EDITORS);
    const form = await readFitForm(await readForm(request));
    if (!form.ok) return fail(400, { values: form.values, errors: form.errors });
    let id: number;
    try {
      id = await createByFit(user, form.data);
    } catch (err) {
      if (err instanceof ApiError) return fail(err.status === 409 ? 409 : 422, { values: form.values, errors: [err.message] });
      if (err instanceof BlendInputError || err instanceof SpectrumInputError) {
        return fail(422, { values: form.values, errors: [`The fit was refused: ${err.message}. Nothing was saved.`] });
      }
      throw err;
    }
    redirect(303, `/library/packages/${id}`);
  }
};
