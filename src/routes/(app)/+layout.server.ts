import { error } from '@sveltejs/kit';
import type { LayoutServerLoad } from './$types';

/** Pages the guard refused for the user's roles render the 403 panel inside the app shell. */
export const load: LayoutServerLoad = ({ locals }) => {
  if (locals.denied) error(403, { message: 'Forbidden', reason: locals.denied });
};
