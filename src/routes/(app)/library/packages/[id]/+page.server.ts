import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { ALL } from '$lib/access/routes/shared';
import * as records from '$lib/server/package-models/records';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params }) => {
  requireUser(locals, ALL);
  const id = Number(params.id);
  const model = Number.isInteger(id) && id > 0 ? await records.get(id) : null;
  if (!model) error(404, 'This package model was not found.');
  return { model };
};
