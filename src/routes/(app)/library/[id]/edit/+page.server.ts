import { error, redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { mayEditLibrary } from '$lib/access/policies';
import * as editing from '$lib/server/library/editing';
import * as records from '$lib/server/library/records';
import { readMaterialForm, readVersion, valuesOf } from '$lib/server/library/form';
import { actionFailure, tryAction } from '$lib/server/http/action-failure';
import { idParam } from '$lib/server/http/id-param';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

export const load: PageServerLoad = async ({ locals, params }) => {
  requireUser(locals, mayEditLibrary);
  const m = await records.get(idParam(params.id, 'No such material.'));
  if (!m) error(404, 'No such material.');
  return {
    material: { id: m.id, kind: m.kind, code: m.code, version: m.version, archived: m.archivedAt !== null, safetyNote: m.safetyNote },
    values: valuesOf(m)
  };
};

export const actions: Actions = {
  default: async ({ locals, request, params }) => {
    const user = requireUser(locals, mayEditLibrary);
    const fd = await readForm(request);
    const form = readMaterialForm(fd);
    const version = readVersion(fd);
    if (!form.ok)
      return actionFailure(400, {
        values: form.values,
        errors: form.errors,
        error: 'Please correct the marked fields. Nothing was saved.'
      });
    if (version === null)
      return actionFailure(400, { values: form.values, errors: {}, error: 'The form lost its version number; reload the page.' });
    const id = idParam(params.id, 'No such material.');
    const saved = await tryAction({ values: form.values, errors: {} }, () => editing.update(user, id, version, form.data));
    if (typeof saved !== 'number') return saved;
    redirect(303, `/library/${id}?saved=1`);
  }
};
