import { redirect } from '@sveltejs/kit';
import { signOut } from '../../auth';
import { signOutEverywhere } from '$lib/server/auth/session-epoch';
import type { Actions, PageServerLoad } from './$types';

/** Signing out is a POST (CSRF-checked); a GET only asks for confirmation, or goes home when signed out. */
export const load: PageServerLoad = ({ locals }) => {
  if (!locals.user) redirect(303, '/');
  return { name: locals.user.name };
};

export const actions: Actions = {
  // Ends every session of the user on the server (a copied cookie stops working too), then clears this one.
  default: async (event) => {
    const user = event.locals.user;
    if (user && !event.locals.viaToken) await signOutEverywhere(user);
    return signOut(event);
  }
};
