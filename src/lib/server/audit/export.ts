/** The audit-trail CSV download, itself recorded in the trail. */
import { record } from '../db/audit';
import { auditCsv, type AuditQuery } from './search';
import type { User } from '../accounts/users';

/** The CSV of the filtered events, or null when more than MAX_EXPORT_ROWS match (nothing is recorded then). */
export async function exportAuditCsv(user: User, q: AuditQuery, filter: string): Promise<string | null> {
  const csv = await auditCsv(q);
  if (csv === null) return null;
  await record({ actorId: user.id, actorEmail: user.email, entityType: 'audit_trail', action: 'export', after: { filter } });
  return csv;
}
