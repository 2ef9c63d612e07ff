import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { mayAdminister } from '$lib/access/policies';
import { actionFailure } from '$lib/server/http/action-failure';
import { listOpenInvites, listPeople } from '$lib/server/accounts/directory';
import * as accounts from '$lib/server/accounts/service';
import { inviteSchema, rolesSchema, activeSchema } from '$lib/accounts/schema';
import { ROLE_LABELS } from '$lib/roles';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

export const load: PageServerLoad = async ({ locals }) => {
  requireUser(locals, mayAdminister);
  return { people: await listPeople(), openInvites: await listOpenInvites() };
};

async function nameOf(userId: number): Promise<string> {
  return (await listPeople()).find((p) => p.id === userId)?.name ?? `user ${userId}`;
}

async function guarded<T>(fn: () => Promise<T>) {
  try {
    return await fn();
  } catch (err) {
    return actionFailure(err, {});
  }
}

export const actions: Actions = {
  invite: async ({ locals, request, url }) => {
    const admin = requireUser(locals, mayAdminister);
    const fd = await readForm(request);
    const raw = { email: String(fd.get('email') ?? ''), roles: fd.getAll('roles').map(String) };
    const parsed = inviteSchema.safeParse(raw);
    if (!parsed.success) return actionFailure(400, { values: raw, errors: z.flattenError(parsed.error).fieldErrors });
    return guarded(async () => {
      const { link, mailed } = await accounts.invite(admin, parsed.data.email, parsed.data.roles, url.origin);
      // The one-time link goes to the invitee by mail; the admin sees it only when mail failed.
      return { invited: { email: parsed.data.email, mailed, link: mailed ? null : link } };
    });
  },
  setRoles: async ({ locals, request }) => {
    const admin = requireUser(locals, mayAdminister);
    const fd = await readForm(request);
    const parsed = rolesSchema.safeParse({ userId: fd.get('userId'), roles: fd.getAll('roles').map(String) });
    if (!parsed.success) return actionFailure(400, { error: z.flattenError(parsed.error).fieldErrors.roles?.[0] ?? 'Invalid roles' });
    return guarded(async () => {
      await accounts.changeRoles(admin, parsed.data.userId, parsed.data.roles);
      const roles = parsed.data.roles.map((r) => ROLE_LABELS[r]).join(', ') || 'none';
      return { saved: parsed.data.userId, done: `Roles of ${await nameOf(parsed.data.userId)} saved: ${roles}.` };
    });
  },
  setActive: async ({ locals, request }) => {
    const admin = requireUser(locals, mayAdminister);
    const parsed = activeSchema.safeParse(Object.fromEntries(await readForm(request)));
    if (!parsed.success) return actionFailure(400, { error: 'Invalid request' });
    return guarded(async () => {
      const active = parsed.data.active === 'true';
      await accounts.setActive(admin, parsed.data.userId, active);
      const name = await nameOf(parsed.data.userId);
      return {
        saved: parsed.data.userId,
        done: active
          ? `${name} is active again and can sign in with their password.`
          : `${name} is deactivated: signed out, and told only "Sign-in failed" when they try to sign in.`
      };
    });
  }
};
