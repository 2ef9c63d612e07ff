import { redirect } from '@sveltejs/kit';
import { signIn } from '../../auth';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = ({ locals, url }) => {
  if (locals.user) redirect(303, safeRedirect(url.searchParams.get('redirectTo')));
  return {
    failed: url.searchParams.has('error'),
    redirectTo: safeRedirect(url.searchParams.get('redirectTo'))
  };
};

/** Only same-site paths are followed after sign-in. */
function safeRedirect(target: string | null): string {
  return target && target.startsWith('/') && !target.startsWith('//') ? target : '/';
}

export const actions: Actions = { default: signIn };
