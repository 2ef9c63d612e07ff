import { navFor } from '$lib/access/route-table';
import { config } from '$lib/server/config';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = ({ locals }) => {
  const user = locals.user;
  return {
    user: user ? { id: user.id, name: user.name, email: user.email, roles: user.roles } : null,
    nav: user ? navFor(user.roles) : [],
    priceCurrency: config().priceCurrency
  };
};
