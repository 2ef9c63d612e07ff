import { redirect } from '@sveltejs/kit';
import { signOut } from '../../auth';
import type { Actions, PageServerLoad } from './$types';

/** Signing out is a POST (CSRF-checked); a GET only asks for confirmation, or goes home when signed out. */
export const load: PageServerLoad = ({ locals }) => {
  if (!locals.user) redirect(303, '/');
  return { name: locals.user.name };
};

export const actions: Actions = { default: signOut };
