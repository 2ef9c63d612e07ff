import { requireUser } from '$lib/server/auth/require';
import { traceLot } from '$lib/server/batches/read';
import type { PageServerLoad } from './$types';

/** From a lot number to every batch that used it (and, on each batch page, from the batch to its lots). */
export const load: PageServerLoad = async ({ locals, url }) => {
  requireUser(locals);
  const lot = (url.searchParams.get('lot') ?? '').trim().slice(0, 80);
  return { lot, trace: lot ? await traceLot(lot) : null };
};
