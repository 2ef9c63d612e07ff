import { requireUser } from '$lib/server/auth/require';
import { mayReadAudit } from '$lib/access/policies';
import { auditFilterChoices, auditQuerySchema, searchAudit } from '$lib/server/audit/search';
import { parseListQuery } from '$lib/server/formulations/lists';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
  requireUser(locals, mayReadAudit);
  const { query, error } = parseListQuery(auditQuerySchema, url.searchParams);
  return { query, queryError: error, result: await searchAudit(query), choices: await auditFilterChoices() };
};
