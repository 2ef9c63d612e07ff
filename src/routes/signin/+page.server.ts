import { redirect } from '@sveltejs/kit';
import { AuthError } from '@auth/sveltekit';
import { signIn } from '../../auth';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';
import { safeRedirect } from '$lib/server/auth/safe-redirect';
import { takeWelcome } from '$lib/server/accounts/welcome';

export const load: PageServerLoad = ({ locals, url, cookies }) => {
  if (locals.user) redirect(303, safeRedirect(url.searchParams.get('redirectTo'), url.origin));
  return {
    failed: url.searchParams.has('error'),
    welcome: url.searchParams.has('welcome') ? (takeWelcome(cookies) ?? { name: null, email: '' }) : null,
    redirectTo: safeRedirect(url.searchParams.get('redirectTo'), url.origin)
  };
};

export const actions: Actions = {
  /** A refused sign-in (wrong password, unknown account, throttled, deactivated) shows one generic message. */
  default: async (event) => {
    // Auth.js reads the body itself: a body that is not a form is a 400 before it does.
    await readForm(event.request.clone());
    try {
      return await signIn(event);
    } catch (err) {
      if (err instanceof AuthError) {
        const back = safeRedirect(event.url.searchParams.get('redirectTo'), event.url.origin);
        redirect(303, `/signin?error=CredentialsSignin${back !== '/' ? `&redirectTo=${encodeURIComponent(back)}` : ''}`);
      }
      throw err;
    }
  }
};
