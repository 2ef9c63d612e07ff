import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { mayRead } from '$lib/access/policies';
import { idParam } from '$lib/server/http/id-param';
import * as records from '$lib/server/package-models/records';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params }) => {
  requireUser(locals, mayRead);
  const model = await records.get(idParam(params.id, 'This package model was not found.'));
  if (!model) error(404, 'This package model was not found.');
  return { model };
};
