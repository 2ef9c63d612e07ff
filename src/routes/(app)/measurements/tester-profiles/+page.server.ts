import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { mayJudgeBatches } from '$lib/access/policies';
import { actionFailure } from '$lib/server/http/action-failure';
import { readForm } from '$lib/server/forms/read-form';
import { profileFromForm } from '$lib/tester-table/form';
import { createTesterProfile, listTesterProfiles, updateTesterProfile } from '$lib/server/measurements/tester-profiles';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals }) => {
  const user = requireUser(locals);
  return { profiles: await listTesterProfiles(), canEdit: mayJudgeBatches(user) };
};

const idAndVersion = z.object({ id: z.coerce.number().int().min(0).default(0), version: z.coerce.number().int().min(0).default(0) });

export const actions: Actions = {
  save: async ({ locals, request }) => {
    const user = requireUser(locals, mayJudgeBatches);
    const form = await readForm(request);
    const values = Object.fromEntries([...form.entries()].map(([k, v]) => [k, String(v)]));
    const ids = idAndVersion.safeParse(values);
    if (!ids.success) return actionFailure(400, { values, error: 'reload the page: the profile id or version is missing' });
    const parsed = profileFromForm(values);
    if (!parsed.ok) return actionFailure(400, { values, error: parsed.message, field: parsed.field });
    try {
      if (ids.data.id > 0) {
        await updateTesterProfile(user, ids.data.id, ids.data.version, parsed.profile);
        return { done: `Profile "${parsed.profile.name}" saved.` };
      }
      await createTesterProfile(user, parsed.profile);
      return { done: `Profile "${parsed.profile.name}" created; choose it when uploading a tester table.` };
    } catch (err) {
      return actionFailure(err, { values });
    }
  }
};
