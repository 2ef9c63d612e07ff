import { actionFailure } from '$lib/server/http/action-failure';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { parseId } from '$lib/server/http/id-param';
import * as tokens from '$lib/server/auth/tokens';
import { issueToken, revokeToken } from '$lib/server/auth/token-commands';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';
import { plainText } from '$lib/errors/hidden-characters';

const createSchema = z.object({
  name: z.string().trim().min(1, 'Give the token a name').max(80, 'At most 80 characters').superRefine(plainText('Token name')),
  days: z.coerce.number().int('Whole days').min(1, 'At least 1 day').max(365, 'At most 365 days')
});

export const load: PageServerLoad = async ({ locals }) => {
  const user = requireUser(locals);
  return { tokens: await tokens.listFor(user.id) };
};

export const actions: Actions = {
  createToken: async ({ locals, request }) => {
    const user = requireUser(locals);
    const form = Object.fromEntries(await readForm(request));
    const parsed = createSchema.safeParse(form);
    if (!parsed.success)
      return actionFailure(400, {
        values: { name: String(form.name ?? ''), days: String(form.days ?? '') },
        errors: z.flattenError(parsed.error).fieldErrors
      });
    const { token } = await issueToken(user, parsed.data.name, parsed.data.days);
    return { created: { name: parsed.data.name, token } };
  },
  revokeToken: async ({ locals, request }) => {
    const user = requireUser(locals);
    const id = parseId(String((await readForm(request)).get('id') ?? ''));
    if (id === null || !(await revokeToken(user, id))) return actionFailure(404, { revokeError: 'No such active token.' });
    return { revoked: id };
  }
};
