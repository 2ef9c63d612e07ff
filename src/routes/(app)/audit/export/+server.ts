import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { mayReadAudit } from '$lib/access/policies';
import { auditQuerySchema, MAX_EXPORT_ROWS } from '$lib/server/audit/search';
import { exportAuditCsv } from '$lib/server/audit/export';
import type { RequestHandler } from './$types';

/** The filtered audit trail as a CSV download (same filters as the page). */
export const GET: RequestHandler = async ({ locals, url }) => {
  const user = requireUser(locals, mayReadAudit);
  const parsed = auditQuerySchema.safeParse(Object.fromEntries([...url.searchParams].filter(([, v]) => v !== '')));
  if (!parsed.success) error(400, { message: `Invalid filter: ${parsed.error.issues.map((i) => i.message).join('; ')}` });
  const csv = await exportAuditCsv(user, parsed.data, url.search);
  if (csv === null) error(413, { message: `More than ${MAX_EXPORT_ROWS} events match: narrow the filter (e.g. a date range).` });
  const stamp = new Date().toISOString().slice(0, 16).replace(/[-:T]/g, '');
  return new Response(csv, {
    headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="phosforge-audit-${stamp}Z.csv"` }
  });
};
