import { redirect } from '@sveltejs/kit';
import { actionFailure } from '$lib/server/http/action-failure';
import { z } from 'zod';
import { findOpenInvite } from '$lib/server/accounts/directory';
import * as accounts from '$lib/server/accounts/service';
import { acceptSchema } from '$lib/accounts/schema';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';
import { setWelcome } from '$lib/server/accounts/welcome';

export const load: PageServerLoad = async ({ params }) => {
  const open = await findOpenInvite(params.token);
  return { invite: open ? { email: open.email, roles: open.roles } : null };
};

export const actions: Actions = {
  accept: async ({ params, request, cookies, url }) => {
    const form = Object.fromEntries(await readForm(request));
    const parsed = acceptSchema.safeParse(form);
    if (!parsed.success) return actionFailure(400, { name: String(form.name ?? ''), errors: z.flattenError(parsed.error).fieldErrors });
    const open = await findOpenInvite(params.token);
    try {
      await accounts.acceptInvite(params.token, parsed.data.name, parsed.data.password);
    } catch (err) {
      return actionFailure(err, { name: parsed.data.name });
    }
    if (open) setWelcome(cookies, url, { name: parsed.data.name, email: open.email });
    redirect(303, '/signin?welcome=1');
  }
};
