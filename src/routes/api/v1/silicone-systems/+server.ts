import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { apiHandler } from '$lib/server/http/api-handler';
import { listSiliconeSystems } from '$lib/server/formulations/silicone';
import type { RequestHandler } from './$types';

/** The two-part silicone systems a revision can name, with pot life, cure and handling caution. */
export const GET: RequestHandler = ({ locals }) =>
  apiHandler(async () => {
    requireUser(locals);
    return json(await listSiliconeSystems());
  });
