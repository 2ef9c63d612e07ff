import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { mayReadAudit } from '$lib/access/policies';
import { record } from '$lib/server/db/audit';
import { auditCsv, auditQuerySchema, MAX_EXPORT_ROWS } from '$lib/server/audit/search';
import type { RequestHandler } from './$types';

/** The filtered audit trail as a CSV download (same filters as the page). */
export const GET: RequestHandler = async ({ locals, url }) => {
  const user = requireUser(locals, mayReadAudit);
  const parsed = auditQuerySchema.safeParse(Object.fromEntries([...url.searchParams].filter(([, v]) => v !== '')));
  if (!parsed.success) error(400, { message: `Invalid filter: ${parsed.error.issues.map((i) => i.message).join('; ')}` });
  const csv = await auditCsv(parsed.data);
  if (csv === null) error(413, { message: `More than ${MAX_EXPORT_ROWS} events match: narrow the filter (e.g. a date range).` });
  await record({ actorId: user.id, actorEmail: user.email, entityType: 'audit_trail', action: 'export', after: { filter: url.search } });
  const stamp = new Date().toISOString().slice(0, 16).replace(/[-:T]/g, '');
  return new Response(csv, {
    headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="phosforge-audit-${stamp}Z.csv"` }
  });
};
