import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { apiHandler } from '$lib/server/http/api-handler';
import type { RequestHandler } from './$types';

/** The caller's identity and roles (session or token). */
export const GET: RequestHandler = ({ locals }) =>
  apiHandler(() => {
    const user = requireUser(locals);
    return json({ id: user.id, email: user.email, name: user.name, roles: user.roles, viaToken: locals.viaToken });
  });
